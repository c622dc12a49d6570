import { NextResponse } from "next/server";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { scoreChoicesSchema } from "@/lib/validation/score";
import { loadScoreUpload } from "../../load";
import { planScoreImport } from "../../preview";

/** The preview again with a new part map and/or anchors (`{ mapping?, anchors? }`); nothing is written. */
export const POST = route<{ showId: string; uploadId: string }>(async (req, { showId, uploadId }) => {
  await requireShow(showId, "edit-music");
  const choices = await readJson(req, scoreChoicesSchema);
  const { score } = await loadScoreUpload(showId, uploadId);
  return NextResponse.json({ preview: (await planScoreImport(showId, score, choices)).preview });
});
