import { and, asc, count, eq, inArray, isNull, sql } from "drizzle-orm";
import type { Background } from "@/lib/acoustics/background";
import { db } from "../client";
import { listeningPoints, performers, phrases, positions, sets, shows } from "../schema";
import { listeningPointColumns } from "./listening-points";
import { performerColumns } from "./performers";

export async function findShow(showId: string) {
  const rows = await db.select().from(shows).where(eq(shows.id, showId)).limit(1);
  return rows[0] ?? null;
}

/** The program's shows that are not deleted (archived ones too, marked). */
export async function listShows(programId: string) {
  return db
    .select({ id: shows.id, name: shows.name, archivedAt: shows.archivedAt })
    .from(shows)
    .where(and(eq(shows.programId, programId), isNull(shows.deletedAt)))
    .orderBy(asc(shows.name));
}

/** The program's shows (not deleted) with a performer playing one of `instruments`, and how many such performers each has. */
export async function listShowsPlaying(programId: string, instruments: string[]) {
  if (instruments.length === 0) return [];
  return db
    .select({ id: shows.id, name: shows.name, performers: count(performers.id) })
    .from(shows)
    .innerJoin(performers, eq(performers.showId, shows.id))
    .where(and(eq(shows.programId, programId), isNull(shows.deletedAt), inArray(performers.instrument, instruments)))
    .groupBy(shows.id, shows.name)
    .orderBy(asc(shows.name));
}

/** The show's listening points in order; a stored background was validated when written (backgroundSchema). */
export async function listListeningPoints(showId: string) {
  const rows = await db
    .select(listeningPointColumns)
    .from(listeningPoints)
    .where(eq(listeningPoints.showId, showId))
    .orderBy(asc(listeningPoints.order), asc(listeningPoints.name));
  return rows.map((r) => ({ ...r, background: (r.background ?? null) as Background | null }));
}

export async function listPerformers(showId: string) {
  return db
    .select(performerColumns)
    .from(performers)
    .where(eq(performers.showId, showId))
    .orderBy(asc(performers.section), asc(performers.label));
}

export async function listSets(showId: string) {
  return db
    .select({ id: sets.id, number: sets.number, counts: sets.counts, order: sets.order, version: sets.version, inputsRevision: sets.inputsRevision, movementId: sets.movementId })
    .from(sets)
    .where(eq(sets.showId, showId))
    .orderBy(asc(sets.order));
}

/** The director's balance thresholds for a show; null returns it to the defaults. */
export async function saveCheckTargets(showId: string, targets: Record<string, unknown> | null) {
  await db.update(shows).set({ checkTargets: targets }).where(eq(shows.id, showId));
}

/**
 * A new, empty show: the default press box 18 m up and 25 m behind the front sideline on the 50,
 * and set 1 (0 counts) to start the drill from, in one transaction.
 */
export async function createShow(programId: string, input: { name: string; fieldRules: "high-school" | "college" }) {
  return db.transaction(async (tx) => {
    const [show] = await tx.insert(shows).values({ programId, name: input.name, fieldRules: input.fieldRules }).returning({ id: shows.id, name: shows.name });
    await tx.insert(listeningPoints).values({ showId: show!.id, name: "Press box", x: 0, y: -25, z: 18 });
    const [first] = await tx.insert(sets).values({ showId: show!.id, number: "1", counts: 0, order: 0 }).returning({ id: sets.id });
    return { ...show!, firstSetId: first!.id };
  });
}

/** How far a new show has come: performers placed in any set, and phrases written. */
export async function showProgress(showId: string) {
  const [row] = await db
    .select({
      placedPerformers: sql<number>`(select count(distinct ${positions.performerId})::int from ${positions} join ${sets} on ${sets.id} = ${positions.setId} where ${sets.showId} = ${showId})`,
      phrases: sql<number>`(select count(*)::int from ${phrases} where ${phrases.showId} = ${showId})`,
    })
    .from(shows)
    .where(eq(shows.id, showId));
  return row ?? { placedPerformers: 0, phrases: 0 };
}
