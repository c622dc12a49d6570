// Stored transition sweeps, read and written for a whole show at once.
import { inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { balanceSweeps } from "../schema";

export async function listStoredSweeps(setIds: string[]) {
  if (setIds.length === 0) return [];
  return db.select().from(balanceSweeps).where(inArray(balanceSweeps.setId, setIds));
}

export type SweepRow = { setId: string; listeningPointId: string; inputsHash: string; modelVersion: string; result: unknown };

/** Upserts many sweeps in one statement per chunk. */
export async function storeSweeps(rows: SweepRow[]) {
  const computedAt = new Date();
  for (let i = 0; i < rows.length; i += 500) {
    await db
      .insert(balanceSweeps)
      .values(rows.slice(i, i + 500).map((r) => ({ ...r, computedAt })))
      .onConflictDoUpdate({
        target: [balanceSweeps.setId, balanceSweeps.listeningPointId],
        set: { inputsHash: sql`excluded.inputs_hash`, modelVersion: sql`excluded.model_version`, result: sql`excluded.result`, computedAt },
      });
  }
  return computedAt;
}
