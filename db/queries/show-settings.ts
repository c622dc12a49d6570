// A show's settings (name, field rules, conditions) and its movements, written in one transaction.
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "../client";
import { movements, sets, shows } from "../schema";

export interface ShowSettingsChange {
  name?: string;
  fieldRules?: "high-school" | "college";
  conditions?: { temperatureC?: number; relativeHumidityPct?: number; pressureKPa?: number; groundFactor?: number | null; betweenGroundFactor?: number | null };
  /** Replaces the show's movements; each runs from its first set to the set before the next one's. */
  movements?: { name: string; firstSetId: string }[];
}

export type MovementProblem = { unknownSetIds: string[] } | { sharedSetIds: string[] };

/** The show's movements, each with the first and last set it spans. */
export async function listMovements(showId: string) {
  const [rows, setRows] = await Promise.all([
    db.select({ id: movements.id, number: movements.number, name: movements.name }).from(movements).where(eq(movements.showId, showId)).orderBy(asc(movements.number)),
    db.select({ id: sets.id, movementId: sets.movementId }).from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order)),
  ]);
  return rows.map((m) => {
    const own = setRows.filter((s) => s.movementId === m.id);
    return { ...m, firstSetId: own[0]?.id ?? null, lastSetId: own.at(-1)?.id ?? null };
  });
}

/** Writes the change; refuses (without writing) movements that name sets of another show or share a first set. */
export async function updateShowSettings(showId: string, change: ShowSettingsChange): Promise<{ ok: true } | { ok: false; problem: MovementProblem }> {
  return db.transaction(async (tx) => {
    const { conditions = {}, movements: moves, ...rest } = change;
    const values = { ...rest, ...conditions };
    if (Object.keys(values).length) await tx.update(shows).set(values).where(eq(shows.id, showId));
    if (!moves) return { ok: true as const };
    const setRows = await tx.select({ id: sets.id, order: sets.order }).from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order));
    const orderOf = new Map(setRows.map((s, i) => [s.id, i]));
    const unknownSetIds = moves.map((m) => m.firstSetId).filter((id) => !orderOf.has(id));
    if (unknownSetIds.length) return { ok: false as const, problem: { unknownSetIds } };
    const firsts = moves.map((m) => m.firstSetId);
    const sharedSetIds = [...new Set(firsts.filter((id, i) => firsts.indexOf(id) !== i))];
    if (sharedSetIds.length) return { ok: false as const, problem: { sharedSetIds } };
    // Numbered in the order they start on the field, whatever order they were sent in.
    const sorted = [...moves].sort((a, b) => orderOf.get(a.firstSetId)! - orderOf.get(b.firstSetId)!);
    await tx.update(sets).set({ movementId: null }).where(eq(sets.showId, showId));
    await tx.delete(movements).where(eq(movements.showId, showId));
    if (!sorted.length) return { ok: true as const };
    const inserted = await tx
      .insert(movements)
      .values(sorted.map((m, i) => ({ showId, number: i + 1, name: m.name })))
      .returning({ id: movements.id, number: movements.number });
    for (const [i, m] of sorted.entries()) {
      const from = orderOf.get(m.firstSetId)!;
      const to = i + 1 < sorted.length ? orderOf.get(sorted[i + 1]!.firstSetId)! : setRows.length;
      const ids = setRows.slice(from, to).map((s) => s.id);
      const id = inserted.find((r) => r.number === i + 1)!.id;
      if (ids.length) await tx.update(sets).set({ movementId: id }).where(and(eq(sets.showId, showId), inArray(sets.id, ids)));
    }
    return { ok: true as const };
  });
}
