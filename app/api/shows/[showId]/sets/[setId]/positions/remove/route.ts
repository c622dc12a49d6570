import { NextResponse } from "next/server";
import { removeFromSet } from "@/db/queries/sets";
import { requireSet } from "@/lib/auth/access";
import { conflict } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { removeFromSetSchema } from "@/lib/validation/sets";

/** Takes performers off this set (they stay on the roster), with the set's version (409 when stale). */
export const POST = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  await requireSet(showId, setId, "edit-drill");
  const body = await readJson(req, removeFromSetSchema);
  const version = await removeFromSet(setId, body.version, body.performerIds);
  if (version === null) {
    const { set } = await requireSet(showId, setId, "read");
    throw conflict("Someone else changed this set since you opened it.", { currentVersion: set.version });
  }
  return NextResponse.json({ version });
});
