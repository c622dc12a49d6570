import { NextResponse } from "next/server";
import { loadMusic } from "@/db/queries/music";
import { listPerformers, listSets } from "@/db/queries/shows";
import { requireShow } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { route } from "@/lib/http/handler";
import { sectionsInScoreOrder } from "@/lib/show/score-order";

/** The show's music: phrases over the sets, each section's voice and dynamics per phrase, and overrides. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { role } = await requireShow(showId, "read");
  const [music, roster, sets] = await Promise.all([loadMusic(showId), listPerformers(showId), listSets(showId)]);
  const numberOf = new Map(sets.map((s) => [s.id, s.number]));
  const sections = sectionsInScoreOrder(roster);
  return NextResponse.json({
    phrases: music.phrases.map((p) => ({
      id: p.id,
      name: p.name,
      order: p.order,
      firstSetId: p.firstSetId,
      lastSetId: p.lastSetId,
      firstSetNumber: numberOf.get(p.firstSetId) ?? null,
      lastSetNumber: numberOf.get(p.lastSetId) ?? null,
    })),
    sets: sets.map((s) => ({ id: s.id, number: s.number, order: s.order })),
    sections,
    performers: roster.map((p) => ({ id: p.id, label: p.label, section: p.section, instrument: p.instrument })),
    assignments: music.assignments.map(({ phraseId, section, voice, writtenDynamic, playedDynamic }) => ({ phraseId, section, voice, writtenDynamic, playedDynamic })),
    overrides: music.overrides.map(({ phraseId, performerId, voice, writtenDynamic, playedDynamic, note }) => ({ phraseId, performerId, voice, writtenDynamic, playedDynamic, note })),
    canEdit: can(role, "edit-music"),
    canAdopt: can(role, "adopt-plan"),
  });
});
