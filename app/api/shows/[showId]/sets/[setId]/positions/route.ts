import { NextResponse } from "next/server";
import { savePositions } from "@/db/queries/sets";
import { requireSet } from "@/lib/auth/access";
import { badRequest, conflict } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { savePositionsSchema } from "@/lib/validation/positions";

/** Saves the listed performers' positions if the set's version is unchanged (409 otherwise). */
export const PUT = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  await requireSet(showId, setId, "edit-drill");
  const body = await readJson(req, savePositionsSchema);
  const result = await savePositions(showId, setId, body.version, body.positions);
  if (result.ok) return NextResponse.json({ version: result.version });
  if (result.reason === "stale") {
    throw conflict("Someone else changed this set since you opened it.", { currentVersion: result.currentVersion });
  }
  throw badRequest("Some performers are not on this show's roster.", { performerId: result.performerIds.map((id) => `unknown performer ${id}`) });
});
