// Box readings: list, record (one or a whole upload in one transaction), remove; and a program's readings for the fit.
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "../client";
import { listeningPoints, sets, shows, users } from "../schema";
import { boxReadings, type NewBoxReadingRow } from "../schema-readings";

const columns = {
  id: boxReadings.id,
  showId: boxReadings.showId,
  setId: boxReadings.setId,
  setNumber: sets.number,
  listeningPointId: boxReadings.listeningPointId,
  listeningPointName: listeningPoints.name,
  takenAt: boxReadings.takenAt,
  temperatureC: boxReadings.temperatureC,
  relativeHumidityPct: boxReadings.relativeHumidityPct,
  sections: boxReadings.sections,
  measuredDb: boxReadings.measuredDb,
  weighting: boxReadings.weighting,
  response: boxReadings.response,
  meterHeightM: boxReadings.meterHeightM,
  note: boxReadings.note,
  recordedBy: users.name,
  recordedById: boxReadings.recordedBy,
  createdAt: boxReadings.createdAt,
};

function selectReadings() {
  return db
    .select(columns)
    .from(boxReadings)
    .innerJoin(sets, eq(sets.id, boxReadings.setId))
    .innerJoin(listeningPoints, eq(listeningPoints.id, boxReadings.listeningPointId))
    .leftJoin(users, eq(users.id, boxReadings.recordedBy));
}

export type StoredReading = Awaited<ReturnType<typeof listReadings>>[number];

/** A show's readings, newest first. */
export async function listReadings(showId: string) {
  return selectReadings().where(eq(boxReadings.showId, showId)).orderBy(desc(boxReadings.takenAt), asc(boxReadings.id));
}

/** Every reading of a program's shows (or of one of them), oldest first, for the fit. */
export async function listProgramReadings(programId: string, showId?: string) {
  const showIds = db.select({ id: shows.id }).from(shows).where(eq(shows.programId, programId));
  return selectReadings()
    .where(showId ? and(inArray(boxReadings.showId, showIds), eq(boxReadings.showId, showId)) : inArray(boxReadings.showId, showIds))
    .orderBy(asc(boxReadings.takenAt), asc(boxReadings.id));
}

/** Inserts the readings in one transaction (all or none); answers their ids in order. */
export async function insertReadings(rows: NewBoxReadingRow[]): Promise<string[]> {
  if (rows.length === 0) return [];
  return db.transaction(async (tx) => {
    const out = await tx.insert(boxReadings).values(rows).returning({ id: boxReadings.id });
    return out.map((r) => r.id);
  });
}

export async function findReading(showId: string, readingId: string) {
  const rows = await selectReadings()
    .where(and(eq(boxReadings.showId, showId), eq(boxReadings.id, readingId)))
    .limit(1);
  return rows[0] ?? null;
}

/** Who recorded a reading (null when the account is gone). */
export async function readingRecorder(showId: string, readingId: string) {
  const rows = await db
    .select({ recordedBy: boxReadings.recordedBy })
    .from(boxReadings)
    .where(and(eq(boxReadings.showId, showId), eq(boxReadings.id, readingId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function deleteReading(showId: string, readingId: string) {
  const out = await db
    .delete(boxReadings)
    .where(and(eq(boxReadings.showId, showId), eq(boxReadings.id, readingId)))
    .returning({ id: boxReadings.id });
  return out.length > 0;
}
