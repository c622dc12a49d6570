// Writes to a show's music: phrases, section rows (voice, written dynamic) and performer overrides.
import { and, eq, inArray, max, sql } from "drizzle-orm";
import type { Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";
import { db } from "../client";
import { performerOverrides, performers, phrases, sets, voiceAssignments } from "../schema";

/** Ids among `setIds` that are sets of the show. */
export async function setsOfShow(showId: string, setIds: string[]) {
  if (setIds.length === 0) return [];
  return db.select({ id: sets.id, order: sets.order }).from(sets).where(and(eq(sets.showId, showId), inArray(sets.id, setIds)));
}

export async function findPhrase(showId: string, phraseId: string) {
  const rows = await db.select().from(phrases).where(and(eq(phrases.id, phraseId), eq(phrases.showId, showId))).limit(1);
  return rows[0] ?? null;
}

export async function createPhrase(showId: string, row: { name: string; firstSetId: string; lastSetId: string }) {
  return db.transaction(async (tx) => {
    const [{ top }] = await tx.select({ top: max(phrases.order) }).from(phrases).where(eq(phrases.showId, showId));
    const [created] = await tx.insert(phrases).values({ showId, ...row, order: (top ?? -1) + 1 }).returning();
    return created!;
  });
}

export async function updatePhrase(phraseId: string, patch: Partial<{ name: string; firstSetId: string; lastSetId: string }>) {
  const [row] = await db.update(phrases).set(patch).where(eq(phrases.id, phraseId)).returning();
  return row ?? null;
}

export async function deletePhrase(phraseId: string) {
  await db.delete(phrases).where(eq(phrases.id, phraseId));
}

/** Phrase ids among `phraseIds` that belong to the show. */
export async function phrasesOfShow(showId: string, phraseIds: string[]) {
  if (phraseIds.length === 0) return new Set<string>();
  const rows = await db.select({ id: phrases.id }).from(phrases).where(and(eq(phrases.showId, showId), inArray(phrases.id, phraseIds)));
  return new Set(rows.map((r) => r.id));
}

/**
 * Sets voice and/or written dynamic on the listed (phrase, section) rows in one transaction, creating
 * missing rows (tacet at mf until given). A new written dynamic clears an adopted played one:
 * the plan was made for the old one.
 */
export async function setAssignments(rows: { phraseId: string; section: string }[], change: { voice?: VoiceOrTacet; writtenDynamic?: Dynamic }) {
  return db.transaction(async (tx) => {
    const set: Record<string, unknown> = {};
    if (change.voice) set.voice = change.voice;
    if (change.writtenDynamic) {
      set.writtenDynamic = change.writtenDynamic;
      set.playedDynamic = null;
    }
    await tx
      .insert(voiceAssignments)
      .values(rows.map((r) => ({ ...r, voice: change.voice ?? "tacet", writtenDynamic: change.writtenDynamic ?? "mf" })))
      .onConflictDoUpdate({
        target: [voiceAssignments.phraseId, voiceAssignments.section],
        set: {
          ...(change.voice ? { voice: sql`excluded.voice` } : {}),
          ...(change.writtenDynamic ? { writtenDynamic: sql`excluded.written_dynamic`, playedDynamic: sql`null` } : {}),
          updatedAt: new Date(),
        },
      });
    return rows.length;
  });
}

/** Performer ids among `ids` that are on the show's roster. */
export async function performersOfShow(showId: string, ids: string[]) {
  if (ids.length === 0) return new Set<string>();
  const rows = await db.select({ id: performers.id }).from(performers).where(and(eq(performers.showId, showId), inArray(performers.id, ids)));
  return new Set(rows.map((r) => r.id));
}

export async function upsertOverrides(rows: { phraseId: string; performerId: string; voice: VoiceOrTacet; writtenDynamic: Dynamic; note: string }[]) {
  await db
    .insert(performerOverrides)
    .values(rows.map((r) => ({ ...r, playedDynamic: null })))
    .onConflictDoUpdate({
      target: [performerOverrides.phraseId, performerOverrides.performerId],
      set: { voice: sql`excluded.voice`, writtenDynamic: sql`excluded.written_dynamic`, note: sql`excluded.note`, playedDynamic: sql`null` },
    });
}

export async function deleteOverride(phraseId: string, performerId: string) {
  const gone = await db
    .delete(performerOverrides)
    .where(and(eq(performerOverrides.phraseId, phraseId), eq(performerOverrides.performerId, performerId)))
    .returning({ performerId: performerOverrides.performerId });
  return gone.length > 0;
}
