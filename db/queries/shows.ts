import { asc, eq } from "drizzle-orm";
import { db } from "../client";
import { listeningPoints, performers, sets, shows } from "../schema";

export async function findShow(showId: string) {
  const rows = await db.select().from(shows).where(eq(shows.id, showId)).limit(1);
  return rows[0] ?? null;
}

export async function listShows(programId: string) {
  return db.select({ id: shows.id, name: shows.name }).from(shows).where(eq(shows.programId, programId)).orderBy(asc(shows.name));
}

export async function listListeningPoints(showId: string) {
  return db
    .select({ id: listeningPoints.id, name: listeningPoints.name, x: listeningPoints.x, y: listeningPoints.y, z: listeningPoints.z })
    .from(listeningPoints)
    .where(eq(listeningPoints.showId, showId))
    .orderBy(asc(listeningPoints.order), asc(listeningPoints.name));
}

export async function listPerformers(showId: string) {
  return db
    .select({
      id: performers.id,
      label: performers.label,
      instrument: performers.instrument,
      section: performers.section,
      part: performers.part,
      strengthDb: performers.strengthDb,
      name: performers.name,
    })
    .from(performers)
    .where(eq(performers.showId, showId))
    .orderBy(asc(performers.section), asc(performers.label));
}

export async function listSets(showId: string) {
  return db
    .select({ id: sets.id, number: sets.number, counts: sets.counts, order: sets.order, version: sets.version })
    .from(sets)
    .where(eq(sets.showId, showId))
    .orderBy(asc(sets.order));
}

/** The director's balance thresholds for a show; null returns it to the defaults. */
export async function saveCheckTargets(showId: string, targets: Record<string, unknown> | null) {
  await db.update(shows).set({ checkTargets: targets }).where(eq(shows.id, showId));
}
