import { asc, eq, inArray } from "drizzle-orm";
import { db } from "../client";
import { performerOverrides, phrases, sets, voiceAssignments } from "../schema";

/** The show's phrases with the order of their first and last sets, and every assignment and override. */
export async function loadMusic(showId: string) {
  const [phraseRows, setRows] = await Promise.all([
    db.select().from(phrases).where(eq(phrases.showId, showId)).orderBy(asc(phrases.order)),
    db.select({ id: sets.id, order: sets.order }).from(sets).where(eq(sets.showId, showId)),
  ]);
  const orderOf = new Map(setRows.map((s) => [s.id, s.order]));
  const ids = phraseRows.map((p) => p.id);
  const [assignments, overrides] = ids.length
    ? await Promise.all([
        db.select().from(voiceAssignments).where(inArray(voiceAssignments.phraseId, ids)),
        db.select().from(performerOverrides).where(inArray(performerOverrides.phraseId, ids)),
      ])
    : [[], []];
  return {
    phrases: phraseRows.map((p) => ({
      ...p,
      firstOrder: orderOf.get(p.firstSetId) ?? 0,
      lastOrder: orderOf.get(p.lastSetId) ?? 0,
    })),
    assignments,
    overrides,
  };
}

export type Music = Awaited<ReturnType<typeof loadMusic>>;
