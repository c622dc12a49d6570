// Adopting a balance plan for a phrase: played dynamics stored beside the written ones, in one transaction.
import { and, eq } from "drizzle-orm";
import type { Dynamic } from "@/lib/acoustics/types";
import { db } from "../client";
import { performerOverrides, voiceAssignments } from "../schema";

export interface AdoptedEntry {
  section: string;
  playedDynamic: Dynamic;
  /** The players the entry covers; those with an override in the phrase change their override. */
  performerIds: string[];
}

/** A played dynamic equal to the written one is stored as null: nothing adopted there. */
export async function adoptPlan(phraseId: string, entries: AdoptedEntry[]) {
  return db.transaction(async (tx) => {
    const overrides = await tx.select().from(performerOverrides).where(eq(performerOverrides.phraseId, phraseId));
    const assignments = await tx.select().from(voiceAssignments).where(eq(voiceAssignments.phraseId, phraseId));
    for (const e of entries) {
      const own = overrides.filter((o) => e.performerIds.includes(o.performerId));
      for (const o of own) {
        await tx
          .update(performerOverrides)
          .set({ playedDynamic: o.writtenDynamic === e.playedDynamic ? null : e.playedDynamic })
          .where(and(eq(performerOverrides.phraseId, phraseId), eq(performerOverrides.performerId, o.performerId)));
      }
      const row = assignments.find((a) => a.section === e.section);
      if (row && own.length < e.performerIds.length) {
        await tx
          .update(voiceAssignments)
          .set({ playedDynamic: row.writtenDynamic === e.playedDynamic ? null : e.playedDynamic })
          .where(and(eq(voiceAssignments.phraseId, phraseId), eq(voiceAssignments.section, e.section)));
      }
    }
  });
}

/** Back to what is written: every played dynamic of the phrase cleared. */
export async function clearPlan(phraseId: string) {
  await db.transaction(async (tx) => {
    await tx.update(voiceAssignments).set({ playedDynamic: null }).where(eq(voiceAssignments.phraseId, phraseId));
    await tx.update(performerOverrides).set({ playedDynamic: null }).where(eq(performerOverrides.phraseId, phraseId));
  });
}

