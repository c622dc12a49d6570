// Stadium rehearsal plans a director keeps: what was chosen, the minutes of stadium time, the plan as
// built when it was kept (so the staff read the same plan on the field), and which items are done.
import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { RehearsalItem } from "@/lib/rehearsal/plan";
import type { RehearsalChoice } from "@/lib/validation/rehearsal";
import { shows, users } from "./schema";

/** The plan as built: items worst first, each with its minutes, and where to listen from. */
export type KeptPlan = { listenFrom: { id: string; name: string; words: string }; items: (RehearsalItem & { key: string; minutes: number })[] };

export const rehearsalPlans = pgTable(
  "rehearsal_plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    budgetMinutes: integer("budget_minutes").notNull(),
    choice: jsonb("choice").$type<RehearsalChoice>().notNull(),
    plan: jsonb("plan").$type<KeptPlan>().notNull(),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("rehearsal_plans_show_idx").on(t.showId, t.createdAt),
    // The range of lib/validation/rehearsal.ts.
    check("rehearsal_plans_budget_range", sql`${t.budgetMinutes} between 1 and 600`),
  ],
);
export type RehearsalPlanRow = typeof rehearsalPlans.$inferSelect;

/** An item marked done during the rehearsal, by whom and when (absent: not done). */
export const rehearsalItemsDone = pgTable(
  "rehearsal_items_done",
  {
    planId: uuid("plan_id")
      .notNull()
      .references(() => rehearsalPlans.id, { onDelete: "cascade" }),
    itemKey: text("item_key").notNull(),
    doneBy: text("done_by").references(() => users.id, { onDelete: "set null" }),
    doneAt: timestamp("done_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.planId, t.itemKey] })],
);
