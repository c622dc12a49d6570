import { eq } from "drizzle-orm";
import { db } from "../client";
import { performers } from "../schema";
import { isUniqueViolation } from "./pg-errors";

export type NewPerformerRow = { label: string; instrument: string; section: string; part: string; strengthDb: number };

export type AddPerformersResult =
  | { ok: true; performers: (NewPerformerRow & { id: string })[] }
  | { ok: false; reason: "label-taken" };

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
        .returning({
          id: performers.id,
          label: performers.label,
          instrument: performers.instrument,
          section: performers.section,
          part: performers.part,
          strengthDb: performers.strengthDb,
        }),
    );
    return { ok: true, performers: created };
  } catch (err) {
    if (isUniqueViolation(err)) return { ok: false, reason: "label-taken" };
    throw err;
  }
}
