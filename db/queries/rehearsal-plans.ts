// Kept stadium rehearsal plans: keep one, list a show's, read one with what is done, mark an item done or not.
import { and, count, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { users } from "../schema";
import { rehearsalItemsDone, rehearsalPlans, type KeptPlan } from "../schema-rehearsal";
import type { RehearsalChoice } from "@/lib/validation/rehearsal";

export async function keepRehearsalPlan(row: { showId: string; name: string; budgetMinutes: number; choice: RehearsalChoice; plan: KeptPlan; createdBy: string }) {
  const [kept] = await db.insert(rehearsalPlans).values(row).returning({ id: rehearsalPlans.id, createdAt: rehearsalPlans.createdAt });
  return kept!;
}

/** A show's kept plans, newest first, with how many items are done. */
export async function listRehearsalPlans(showId: string) {
  const rows = await db
    .select({ id: rehearsalPlans.id, name: rehearsalPlans.name, budgetMinutes: rehearsalPlans.budgetMinutes, plan: rehearsalPlans.plan, createdAt: rehearsalPlans.createdAt, createdBy: users.name })
    .from(rehearsalPlans)
    .leftJoin(users, eq(users.id, rehearsalPlans.createdBy))
    .where(eq(rehearsalPlans.showId, showId))
    .orderBy(desc(rehearsalPlans.createdAt));
  const done = await db
    .select({ planId: rehearsalItemsDone.planId, n: count() })
    .from(rehearsalItemsDone)
    .innerJoin(rehearsalPlans, eq(rehearsalPlans.id, rehearsalItemsDone.planId))
    .where(eq(rehearsalPlans.showId, showId))
    .groupBy(rehearsalItemsDone.planId);
  const doneOf = new Map(done.map((d) => [d.planId, Number(d.n)]));
  return rows.map(({ plan, ...r }) => ({ ...r, items: plan.items.length, done: doneOf.get(r.id) ?? 0 }));
}

/** One kept plan of the show with its done marks, or null. */
export async function findRehearsalPlan(showId: string, planId: string) {
  const [row] = await db
    .select()
    .from(rehearsalPlans)
    .where(and(eq(rehearsalPlans.id, planId), eq(rehearsalPlans.showId, showId)));
  if (!row) return null;
  const done = await db
    .select({ itemKey: rehearsalItemsDone.itemKey, doneAt: rehearsalItemsDone.doneAt, doneBy: users.name })
    .from(rehearsalItemsDone)
    .leftJoin(users, eq(users.id, rehearsalItemsDone.doneBy))
    .where(eq(rehearsalItemsDone.planId, planId));
  return { ...row, done };
}

/** Marks an item done (again: keeps the first mark) or not done. */
export async function markRehearsalItem(planId: string, itemKey: string, done: boolean, userId: string) {
  if (done) await db.insert(rehearsalItemsDone).values({ planId, itemKey, doneBy: userId }).onConflictDoNothing();
  else await db.delete(rehearsalItemsDone).where(and(eq(rehearsalItemsDone.planId, planId), eq(rehearsalItemsDone.itemKey, itemKey)));
}
