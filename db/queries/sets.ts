import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { performers, positions, sets } from "../schema";

export async function findSetInShow(showId: string, setId: string) {
  const rows = await db
    .select({ id: sets.id, showId: sets.showId, number: sets.number, counts: sets.counts, order: sets.order, version: sets.version })
    .from(sets)
    .where(and(eq(sets.id, setId), eq(sets.showId, showId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function listPositions(setId: string) {
  return db
    .select({ performerId: positions.performerId, x: positions.x, y: positions.y, facingDeg: positions.facingDeg })
    .from(positions)
    .where(eq(positions.setId, setId))
    .orderBy(asc(positions.performerId));
}

export type PositionInput = { performerId: string; x: number; y: number; facingDeg: number };

export type SavePositionsResult =
  | { ok: true; version: number }
  | { ok: false; reason: "stale"; currentVersion: number }
  | { ok: false; reason: "unknown-performers"; performerIds: string[] };

class UnknownPerformers extends Error {
  constructor(readonly performerIds: string[]) {
    super("unknown performers");
  }
}

/**
 * Writes the listed positions if `version` is still the set's version, all in one transaction.
 * The version bump is a conditional UPDATE, so of concurrent saves with one version exactly one wins.
 */
export async function savePositions(showId: string, setId: string, version: number, rows: PositionInput[]): Promise<SavePositionsResult> {
  try {
    return await db.transaction(async (tx) => {
      const bumped = await tx
        .update(sets)
        .set({ version: sql`${sets.version} + 1` })
        .where(and(eq(sets.id, setId), eq(sets.version, version)))
        .returning({ version: sets.version });
      if (bumped.length === 0) {
        const current = await tx.select({ version: sets.version }).from(sets).where(eq(sets.id, setId));
        return { ok: false as const, reason: "stale" as const, currentVersion: current[0]?.version ?? 0 };
      }
      if (rows.length > 0) {
        const ids = [...new Set(rows.map((r) => r.performerId))];
        const known = await tx
          .select({ id: performers.id })
          .from(performers)
          .where(and(eq(performers.showId, showId), inArray(performers.id, ids)));
        const knownIds = new Set(known.map((r) => r.id));
        const unknown = ids.filter((id) => !knownIds.has(id));
        if (unknown.length) throw new UnknownPerformers(unknown); // rolls the version bump back
        await tx
          .insert(positions)
          .values(rows.map((r) => ({ setId, ...r })))
          .onConflictDoUpdate({
            target: [positions.setId, positions.performerId],
            set: { x: sql`excluded.x`, y: sql`excluded.y`, facingDeg: sql`excluded.facing_deg` },
          });
      }
      return { ok: true as const, version: bumped[0]!.version };
    });
  } catch (err) {
    if (err instanceof UnknownPerformers) return { ok: false, reason: "unknown-performers", performerIds: err.performerIds };
    throw err;
  }
}

/** Removes performers from a set (they stay on the roster), bumping the version like a save. */
export async function removeFromSet(setId: string, version: number, performerIds: string[]) {
  return db.transaction(async (tx) => {
    const bumped = await tx
      .update(sets)
      .set({ version: sql`${sets.version} + 1` })
      .where(and(eq(sets.id, setId), eq(sets.version, version)))
      .returning({ version: sets.version });
    if (bumped.length === 0) return null;
    if (performerIds.length) {
      await tx.delete(positions).where(and(eq(positions.setId, setId), inArray(positions.performerId, performerIds)));
    }
    return bumped[0]!.version;
  });
}
