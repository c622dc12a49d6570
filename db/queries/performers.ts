import { and, eq } from "drizzle-orm";
import { db } from "../client";
import { performers } from "../schema";
import { isUniqueViolation } from "./pg-errors";

export type NewPerformerRow = { label: string; instrument: string; section: string; part: string; strengthDb: number; name?: string | null };

export type AddPerformersResult =
  | { ok: true; performers: (NewPerformerRow & { id: string })[] }
  | { ok: false; reason: "label-taken" };

/** A performer as the API answers it (the roster, adding and changing one). */
export const performerColumns = {
  id: performers.id,
  label: performers.label,
  instrument: performers.instrument,
  section: performers.section,
  part: performers.part,
  strengthDb: performers.strengthDb,
  name: performers.name,
};

/** Labels and instruments of the show's roster (for suggesting new labels). */
export async function rosterLabels(showId: string) {
  return db.select({ label: performers.label, instrument: performers.instrument, section: performers.section }).from(performers).where(eq(performers.showId, showId));
}

/** Adds performers to the show's roster in one transaction (not placed in any set yet). */
export async function addPerformers(showId: string, rows: NewPerformerRow[]): Promise<AddPerformersResult> {
  try {
    const created = await db.transaction((tx) =>
      tx
        .insert(performers)
        .values(rows.map((r) => ({ showId, ...r })))
        .returning(performerColumns),
    );
    return { ok: true, performers: created };
  } catch (err) {
    if (isUniqueViolation(err)) return { ok: false, reason: "label-taken" };
    throw err;
  }
}

export type PerformerRow = NewPerformerRow & { id: string; name: string | null };
export type UpdatePerformerResult = { ok: true; performer: PerformerRow } | { ok: false; reason: "not-found" | "label-taken" };


/** Changes one performer of the show; a label another performer has is refused. */
export async function updatePerformer(showId: string, performerId: string, patch: Partial<Omit<PerformerRow, "id">>): Promise<UpdatePerformerResult> {
  try {
    const [row] = await db
      .update(performers)
      .set(patch)
      .where(and(eq(performers.showId, showId), eq(performers.id, performerId)))
      .returning(performerColumns);
    return row ? { ok: true, performer: row } : { ok: false, reason: "not-found" };
  } catch (err) {
    if (isUniqueViolation(err)) return { ok: false, reason: "label-taken" };
    throw err;
  }
}

/** Removes a performer from the show: their dots in every set and their solos go with them. */
export async function deletePerformer(showId: string, performerId: string): Promise<boolean> {
  const removed = await db
    .delete(performers)
    .where(and(eq(performers.showId, showId), eq(performers.id, performerId)))
    .returning({ id: performers.id });
  return removed.length > 0;
}
