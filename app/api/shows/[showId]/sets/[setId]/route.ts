import { NextResponse } from "next/server";
import { deleteSet, listPositions, updateSet } from "@/db/queries/sets";
import { requireSet } from "@/lib/auth/access";
import { conflict } from "@/lib/http/errors";
import { parseWith, readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { deleteSetQuery, updateSetSchema } from "@/lib/validation/sets";

export const GET = route<{ showId: string; setId: string }>(async (_req, { showId, setId }) => {
  const { set } = await requireSet(showId, setId, "read");
  return NextResponse.json({
    set: { id: set.id, number: set.number, counts: set.counts, version: set.version },
    positions: await listPositions(setId),
  });
});

const stale = (currentVersion: number) => conflict("Someone else changed this set since you opened it.", { currentVersion });

/** Renumbers the set or changes its counts, with the set's version (409 when stale). */
export const PATCH = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { set } = await requireSet(showId, setId, "edit-drill");
  const body = await readJson(req, updateSetSchema);
  const result = await updateSet(setId, body.version, { number: body.number, counts: body.counts });
  if (result.ok) {
    return NextResponse.json({ set: { id: set.id, number: body.number ?? set.number, counts: body.counts ?? set.counts, version: result.version } });
  }
  if (result.reason === "stale") throw stale(result.currentVersion);
  throw conflict(`A set numbered ${body.number} already exists in this show.`);
});

/** Deletes the set (?version=N, 409 when stale); its positions go with it, phrases are kept. */
export const DELETE = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { set } = await requireSet(showId, setId, "edit-drill");
  const { version } = parseWith(deleteSetQuery, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const result = await deleteSet(showId, set, version);
  if (result.ok) return new NextResponse(null, { status: 204 });
  if (result.reason === "stale") throw stale(result.currentVersion);
  throw conflict(`Set ${set.number} is the only set of the phrase "${result.phrase}". Change the phrase first.`);
});
