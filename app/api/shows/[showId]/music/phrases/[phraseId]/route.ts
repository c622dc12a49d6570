import { NextResponse } from "next/server";
import { deletePhrase, findPhrase, updatePhrase } from "@/db/queries/music-edit";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { idSchema, route } from "@/lib/http/handler";
import { phrasePatchSchema } from "@/lib/validation/music";
import { checkSpan } from "../../phrase-span";

type Params = { showId: string; phraseId: string };

async function phraseOf(showId: string, phraseId: string) {
  const phrase = idSchema.safeParse(phraseId).success ? await findPhrase(showId, phraseId) : null;
  if (!phrase) throw notFound("No such phrase.");
  return phrase;
}

export const PATCH = route<Params>(async (req, { showId, phraseId }) => {
  await requireShow(showId, "edit-music");
  const phrase = await phraseOf(showId, phraseId);
  const patch = await readJson(req, phrasePatchSchema);
  if (patch.firstSetId || patch.lastSetId) await checkSpan(showId, patch.firstSetId ?? phrase.firstSetId, patch.lastSetId ?? phrase.lastSetId);
  return NextResponse.json({ phrase: await updatePhrase(phrase.id, patch) });
});

export const DELETE = route<Params>(async (_req, { showId, phraseId }) => {
  await requireShow(showId, "edit-music");
  const phrase = await phraseOf(showId, phraseId);
  await deletePhrase(phrase.id);
  return new NextResponse(null, { status: 204 });
});
