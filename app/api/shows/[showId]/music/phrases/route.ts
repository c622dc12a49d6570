import { NextResponse } from "next/server";
import { createPhrase } from "@/db/queries/music-edit";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { phraseSchema } from "@/lib/validation/music";
import { checkSpan } from "../phrase-span";

export const POST = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "edit-music");
  const body = await readJson(req, phraseSchema);
  await checkSpan(showId, body.firstSetId, body.lastSetId);
  const phrase = await createPhrase(showId, body);
  return NextResponse.json({ phrase }, { status: 201 });
});
