// Adding, changing and removing a show's listening points. A show keeps at least one.
import { and, count, eq, max } from "drizzle-orm";
import { db } from "../client";
import { listeningPoints, shows } from "../schema";
import { boxReadings } from "../schema-readings";

export interface ListeningPointFields {
  name: string;
  x: number;
  y: number;
  z: number;
  groundFactor?: number | null;
  surroundingsM?: number;
  background?: unknown;
}

export const listeningPointColumns = {
  id: listeningPoints.id,
  name: listeningPoints.name,
  x: listeningPoints.x,
  y: listeningPoints.y,
  z: listeningPoints.z,
  groundFactor: listeningPoints.groundFactor,
  surroundingsM: listeningPoints.surroundingsM,
  background: listeningPoints.background,
};

/** Adds a point after the others; null when the show already holds `limit` points (counted under a lock on the show). */
export async function addListeningPoint(showId: string, fields: ListeningPointFields, limit: number) {
  return db.transaction(async (tx) => {
    await tx.select({ id: shows.id }).from(shows).where(eq(shows.id, showId)).for("update");
    const [{ n, last }] = await tx.select({ n: count(), last: max(listeningPoints.order) }).from(listeningPoints).where(eq(listeningPoints.showId, showId));
    if (n >= limit) return null;
    const [row] = await tx
      .insert(listeningPoints)
      .values({ showId, ...fields, background: fields.background ?? null, order: (last ?? -1) + 1 })
      .returning(listeningPointColumns);
    return row!;
  });
}

/** Changes a point of the show; null when the show has no such point. */
export async function updateListeningPoint(showId: string, id: string, fields: Partial<ListeningPointFields>) {
  const [row] = await db
    .update(listeningPoints)
    .set(fields)
    .where(and(eq(listeningPoints.id, id), eq(listeningPoints.showId, showId)))
    .returning(listeningPointColumns);
  return row ?? null;
}

/**
 * Removes a point: "unknown" when the show has no such point, "last" when it is the show's only one, and
 * the number of box readings taken there when it has some (they would go with it).
 */
export async function deleteListeningPoint(showId: string, id: string): Promise<"deleted" | "unknown" | "last" | { readings: number }> {
  return db.transaction(async (tx) => {
    // The lock on the show serialises two deletes, so two points removed at once cannot leave none.
    await tx.select({ id: shows.id }).from(shows).where(eq(shows.id, showId)).for("update");
    const [{ n }] = await tx.select({ n: count() }).from(listeningPoints).where(eq(listeningPoints.showId, showId));
    const mine = await tx.select({ id: listeningPoints.id }).from(listeningPoints).where(and(eq(listeningPoints.id, id), eq(listeningPoints.showId, showId)));
    if (!mine.length) return "unknown";
    if (n <= 1) return "last";
    const [{ readings }] = await tx.select({ readings: count() }).from(boxReadings).where(eq(boxReadings.listeningPointId, id));
    if (readings > 0) return { readings };
    await tx.delete(listeningPoints).where(eq(listeningPoints.id, id));
    return "deleted";
  });
}
