import { and, asc, eq, gt, inArray, or, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { performers, phrases, positions, sets } from "../schema";
import { finitePosition } from "./finite-positions";
import { isUniqueViolation } from "./pg-errors";

/** The columns of a set that requests work with (everything but its timestamps). */
export const setColumns = {
  id: sets.id,
  showId: sets.showId,
  number: sets.number,
  counts: sets.counts,
  order: sets.order,
  version: sets.version,
  inputsRevision: sets.inputsRevision,
};

export async function findSetInShow(showId: string, setId: string) {
  const rows = await db
    .select(setColumns)
    .from(sets)
    .where(and(eq(sets.id, setId), eq(sets.showId, showId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function listPositions(setId: string) {
  return db
    .select({ performerId: positions.performerId, x: positions.x, y: positions.y, facingDeg: positions.facingDeg })
    .from(positions)
    .where(and(eq(positions.setId, setId), finitePosition))
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

async function bumpVersion(tx: Tx, setId: string, version: number) {
  const bumped = await tx
    .update(sets)
    .set({ version: sql`${sets.version} + 1` })
    .where(and(eq(sets.id, setId), eq(sets.version, version)))
    .returning({ version: sets.version });
  return bumped[0]?.version ?? null;
}

async function currentVersion(tx: Tx, setId: string) {
  const rows = await tx.select({ version: sets.version }).from(sets).where(eq(sets.id, setId));
  return rows[0]?.version ?? 0;
}

export type SetSummaryRow = { id: string; number: string; counts: number; order: number; version: number };
const summary = { id: sets.id, number: sets.number, counts: sets.counts, order: sets.order, version: sets.version };

export type CreateSetResult = { ok: true; set: SetSummaryRow } | { ok: false; reason: "number-taken" };

/**
 * Adds a set after `after` (or at the end), moving later sets down one place; with `copyFrom`
 * the new set starts with that set's positions. One transaction.
 */
export async function createSet(
  showId: string,
  args: { number: string; counts: number; after: { order: number } | null; copyFromSetId: string | null },
): Promise<CreateSetResult> {
  try {
    return await db.transaction(async (tx) => {
      let order: number;
      if (args.after) {
        order = args.after.order + 1;
        await tx
          .update(sets)
          .set({ order: sql`${sets.order} + 1` })
          .where(and(eq(sets.showId, showId), gt(sets.order, args.after.order)));
      } else {
        const [last] = await tx.select({ max: sql<number | null>`max(${sets.order})` }).from(sets).where(eq(sets.showId, showId));
        order = (last?.max ?? -1) + 1;
      }
      const [created] = await tx.insert(sets).values({ showId, number: args.number, counts: args.counts, order }).returning(summary);
      if (args.copyFromSetId) {
        await tx.execute(sql`
          insert into ${positions} (set_id, performer_id, x, y, facing_deg)
          select ${created!.id}, performer_id, x, y, facing_deg from ${positions} where set_id = ${args.copyFromSetId} and ${finitePosition}`);
      }
      return { ok: true as const, set: created! };
    });
  } catch (err) {
    if (isUniqueViolation(err)) return { ok: false, reason: "number-taken" };
    throw err;
  }
}

export type UpdateSetResult =
  | { ok: true; version: number }
  | { ok: false; reason: "stale"; currentVersion: number }
  | { ok: false; reason: "number-taken" };

/** Renumbers a set or changes its counts if `version` is still current, bumping it. */
export async function updateSet(setId: string, version: number, changes: { number?: string; counts?: number }): Promise<UpdateSetResult> {
  try {
    return await db.transaction(async (tx) => {
      const next = await bumpVersion(tx, setId, version);
      if (next === null) return { ok: false as const, reason: "stale" as const, currentVersion: await currentVersion(tx, setId) };
      if (changes.number !== undefined || changes.counts !== undefined) await tx.update(sets).set(changes).where(eq(sets.id, setId));
      return { ok: true as const, version: next };
    });
  } catch (err) {
    if (isUniqueViolation(err)) return { ok: false, reason: "number-taken" };
    throw err;
  }
}

export type DeleteSetResult =
  | { ok: true }
  | { ok: false; reason: "stale"; currentVersion: number }
  | { ok: false; reason: "only-set-of-phrase"; phrase: string };

/**
 * Deletes a set if `version` is current. A phrase that starts or ends on it is moved to its
 * neighbouring set inside the phrase (the schema would otherwise delete the phrase with it);
 * a phrase spanning this set alone blocks the delete.
 */
class OnlySetOfPhrase extends Error {
  constructor(readonly phrase: string) {
    super("only set of a phrase");
  }
}

export async function deleteSet(showId: string, set: { id: string; order: number }, version: number): Promise<DeleteSetResult> {
  try {
    return await deleteSetTx(showId, set, version);
  } catch (err) {
    if (err instanceof OnlySetOfPhrase) return { ok: false, reason: "only-set-of-phrase", phrase: err.phrase };
    throw err;
  }
}

function deleteSetTx(showId: string, set: { id: string; order: number }, version: number): Promise<DeleteSetResult> {
  return db.transaction(async (tx) => {
    const locked = await bumpVersion(tx, set.id, version);
    if (locked === null) return { ok: false as const, reason: "stale" as const, currentVersion: await currentVersion(tx, set.id) };
    const touching = await tx
      .select()
      .from(phrases)
      .where(and(eq(phrases.showId, showId), or(eq(phrases.firstSetId, set.id), eq(phrases.lastSetId, set.id))));
    if (touching.length) {
      const ordered = await tx.select({ id: sets.id, order: sets.order }).from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order));
      const orderOf = new Map(ordered.map((s) => [s.id, s.order]));
      for (const ph of touching) {
        if (ph.firstSetId === set.id && ph.lastSetId === set.id) throw new OnlySetOfPhrase(ph.name); // rolls the version bump back
        const last = orderOf.get(ph.lastSetId) ?? set.order;
        const first = orderOf.get(ph.firstSetId) ?? set.order;
        const inside = ordered.filter((s) => s.id !== set.id && s.order >= first && s.order <= last);
        await tx
          .update(phrases)
          .set(ph.firstSetId === set.id ? { firstSetId: inside[0]!.id } : { lastSetId: inside[inside.length - 1]!.id })
          .where(eq(phrases.id, ph.id));
      }
    }
    await tx.delete(sets).where(eq(sets.id, set.id));
    return { ok: true as const };
  });
}
