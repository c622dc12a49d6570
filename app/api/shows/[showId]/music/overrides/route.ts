import { NextResponse } from "next/server";
import { deleteOverride, performersOfShow, phrasesOfShow, upsertOverrides } from "@/db/queries/music-edit";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { badRequest, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { overrideDeleteSchema, overridesPutSchema } from "@/lib/validation/music";

/** Sets per-performer overrides (a solo, a player laying out); each replaces any earlier one for that phrase and player. */
export const PUT = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "edit-music");
  const { overrides } = await readJson(req, overridesPutSchema);
  const phrases = await phrasesOfShow(showId, [...new Set(overrides.map((o) => o.phraseId))]);
  const players = await performersOfShow(showId, [...new Set(overrides.map((o) => o.performerId))]);
  const bad = overrides.findIndex((o) => !phrases.has(o.phraseId) || !players.has(o.performerId));
  if (bad >= 0) throw badRequest("An override names a phrase or performer that is not in this show.", { [`overrides.${bad}`]: ["Unknown phrase or performer."] });
  await upsertOverrides(overrides);
  return NextResponse.json({ saved: overrides.length });
});

export const DELETE = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "edit-music");
  const { phraseId, performerId } = await readJson(req, overrideDeleteSchema);
  if (!(await phrasesOfShow(showId, [phraseId])).has(phraseId)) throw notFound("No such phrase.");
  if (!(await deleteOverride(phraseId, performerId))) throw notFound("No such override.");
  return new NextResponse(null, { status: 204 });
});
