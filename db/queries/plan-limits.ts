// The director's musical limits of the balance plan: stored on the show and on each phrase.
import { and, eq } from "drizzle-orm";
import { db } from "../client";
import { phrases, shows } from "../schema";

/** The show's limits (null: the defaults). */
export async function saveShowLimits(showId: string, limits: Record<string, unknown> | null) {
  await db.update(shows).set({ planLimits: limits }).where(eq(shows.id, showId));
}

/** One phrase's limits (null: the show's); false when the phrase is not the show's. */
export async function savePhraseLimits(showId: string, phraseId: string, limits: Record<string, unknown> | null) {
  const rows = await db
    .update(phrases)
    .set({ planLimits: limits })
    .where(and(eq(phrases.id, phraseId), eq(phrases.showId, showId)))
    .returning({ id: phrases.id });
  return rows.length > 0;
}

/** Every phrase's stored limits, in phrase order. */
export async function listPhraseLimits(showId: string) {
  return db.select({ id: phrases.id, name: phrases.name, limits: phrases.planLimits }).from(phrases).where(eq(phrases.showId, showId)).orderBy(phrases.order);
}
