// What the director chooses for a stadium rehearsal plan (shared by the page and the routes).
import { z } from "./zod";

export const rehearsalChoiceSchema = z
  .object({
    listeningPointId: z.string().uuid().optional(),
    phraseIds: z.array(z.string().uuid()).max(100).default([]),
    setIds: z.array(z.string().uuid()).max(200).default([]),
    /** Minutes of stadium time the plan shares among its items (default 30). */
    budgetMinutes: z.number().int("Give the stadium time in whole minutes.").min(1, "Give at least 1 minute of stadium time.").max(600, "Give at most 600 minutes (10 hours) of stadium time.").optional(),
  })
  .refine((c) => c.phraseIds.length + c.setIds.length > 0, { message: "Choose at least one phrase or set to rehearse.", path: ["phraseIds"] });

export const rehearsalSendSchema = z.object({
  choice: rehearsalChoiceSchema,
  userIds: z.array(z.string().min(1).max(100)).min(1, "Choose at least one staff member.").max(100),
});

export type RehearsalChoice = z.infer<typeof rehearsalChoiceSchema>;

/** Keeping a plan: its name and what it was built from. */
export const keepRehearsalPlanSchema = z.object({
  name: z.string().trim().min(1, "Name the plan, e.g. \"Thursday at the stadium\".").max(100, "Keep the name under 100 characters."),
  choice: rehearsalChoiceSchema,
});

/** Marking a kept plan's item done (or not) during the rehearsal. */
export const markRehearsalItemSchema = z.object({ done: z.boolean({ error: "Say done: true or false." }) });
