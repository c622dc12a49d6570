// What a score import is planned against (sets, sections, music) and its one-transaction write.
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import type { Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";
import type { PartMap, ScoreAnchor } from "@/lib/score/anchors";
import type { ProposedPhrase } from "@/lib/score/proposal";
import { db } from "../client";
import { performerOverrides, performers, phrases, sets, voiceAssignments } from "../schema";
import { showScores } from "../schema-score";
import { uploads } from "../schema-team";
import { loadMusic } from "./music";

/** The show's sets in order, its sections with their players' instruments, and its music. */
export async function loadScoreContext(showId: string) {
  const [setRows, roster, music] = await Promise.all([
    db.select({ id: sets.id, number: sets.number, counts: sets.counts, order: sets.order }).from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order)),
    db.select({ section: performers.section, instrument: performers.instrument }).from(performers).where(eq(performers.showId, showId)),
    loadMusic(showId),
  ]);
  const sections = new Map<string, Set<string>>();
  for (const p of roster) (sections.get(p.section) ?? sections.set(p.section, new Set()).get(p.section)!).add(p.instrument);
  return { sets: setRows, sections: [...sections].map(([name, instruments]) => ({ name, instruments: [...instruments] })), music };
}

export class ScoreAlreadyConfirmed extends Error {}

/**
 * Replaces the show's phrases with the proposed ones (each keeping the musical limits and overrides of
 * the old phrase it lies in), marks the upload confirmed and links the score to the show, all at once.
 */
export async function applyScoreImport(
  showId: string,
  link: { uploadId: string; partMap: PartMap; anchors: ScoreAnchor[]; userId: string },
  proposed: ProposedPhrase[],
  summary: Record<string, number>,
) {
  await db.transaction(async (tx) => {
    const claimed = await tx
      .update(uploads)
      .set({ confirmedAt: new Date(), summary })
      .where(and(eq(uploads.id, link.uploadId), isNull(uploads.confirmedAt)))
      .returning({ id: uploads.id });
    if (!claimed.length) throw new ScoreAlreadyConfirmed();
    // One music write per show at a time: a row lock on the show orders concurrent confirms.
    await tx.execute(sql`select 1 from shows where id = ${showId} for update`);
    const old = await tx.select({ id: phrases.id, planLimits: phrases.planLimits }).from(phrases).where(eq(phrases.showId, showId));
    const limitsOf = new Map(old.map((p) => [p.id, p.planLimits]));
    const keptOverrides = old.length ? await tx.select().from(performerOverrides).innerJoin(phrases, eq(phrases.id, performerOverrides.phraseId)).where(eq(phrases.showId, showId)) : [];
    await tx.delete(phrases).where(eq(phrases.showId, showId));
    for (const [order, p] of proposed.entries()) {
      const [row] = await tx
        .insert(phrases)
        .values({ showId, name: p.name, order, firstSetId: p.firstSetId, lastSetId: p.lastSetId, planLimits: p.keepsFrom ? (limitsOf.get(p.keepsFrom) ?? null) : null })
        .returning({ id: phrases.id });
      const rows = Object.entries(p.rows).map(([section, r]) => ({
        phraseId: row!.id,
        section,
        voice: r.voice as VoiceOrTacet,
        writtenDynamic: r.writtenDynamic as Dynamic,
        playedDynamic: r.playedDynamic as Dynamic | null,
      }));
      if (rows.length) await tx.insert(voiceAssignments).values(rows);
      const overrides = keptOverrides.filter((o) => o.performer_overrides.phraseId === p.keepsFrom).map((o) => ({ ...o.performer_overrides, phraseId: row!.id }));
      if (overrides.length) await tx.insert(performerOverrides).values(overrides);
    }
    const values = { uploadId: link.uploadId, partMap: link.partMap, anchors: link.anchors, confirmedBy: link.userId, confirmedAt: new Date() };
    await tx.insert(showScores).values({ showId, ...values }).onConflictDoUpdate({ target: showScores.showId, set: values });
  });
}
