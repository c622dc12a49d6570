import { NextResponse } from "next/server";
import { phrasesOfShow, setAssignments } from "@/db/queries/music-edit";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { badRequest } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { assignmentsPatchSchema } from "@/lib/validation/music";

/** Bulk change: the selected (phrase, section) rows all get the given voice and/or written dynamic. */
export const PATCH = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "edit-music");
  const body = await readJson(req, assignmentsPatchSchema);
  const known = await phrasesOfShow(showId, [...new Set(body.rows.map((r) => r.phraseId))]);
  const unknown = body.rows.filter((r) => !known.has(r.phraseId));
  if (unknown.length) throw badRequest("Some rows name a phrase that is not in this show.", { rows: [`Unknown phrase ${unknown[0]!.phraseId}.`] });
  const changed = await setAssignments(body.rows, { voice: body.voice, writtenDynamic: body.writtenDynamic });
  return NextResponse.json({ changed });
});
