import { NextResponse } from "next/server";
import { applyScoreImport, ScoreAlreadyConfirmed } from "@/db/queries/score-import";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { conflict } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { scoreChoicesSchema } from "@/lib/validation/score";
import { loadScoreUpload } from "../../load";
import { planScoreImport } from "../../preview";

/**
 * Writes the import (`{ mapping?, anchors? }`), planned again against the show as it is now: the new
 * phrases with their written dynamics, and the score's link to the show, in one transaction; 409 when
 * this file was already imported.
 */
export const POST = route<{ showId: string; uploadId: string }>(async (req, { showId, uploadId }) => {
  const { user } = await requireShow(showId, "edit-music");
  const choices = await readJson(req, scoreChoicesSchema);
  const { upload, score } = await loadScoreUpload(showId, uploadId);
  if (upload.confirmedAt) throw conflict("This score was already imported; upload it again to import it with other choices.");
  const { preview, proposal, partMap, anchors } = await planScoreImport(showId, score, choices);
  const summary = { phrases: proposal.phrases.length, replacedPhrases: proposal.replaces.phrases.length, sets: proposal.sets.filter((s) => s.at).length };
  try {
    await applyScoreImport(showId, { uploadId, partMap, anchors, userId: user.id }, proposal.phrases, summary);
  } catch (err) {
    if (err instanceof ScoreAlreadyConfirmed) throw conflict("This score was already imported; upload it again to import it with other choices.");
    throw err;
  }
  return NextResponse.json({ summary, preview });
});
