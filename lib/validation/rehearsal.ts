// What the director chooses for a stadium rehearsal plan (shared by the page and the routes).
import { z } from "./zod";

export const rehearsalChoiceSchema = z
  .object({
    listeningPointId: z.string().uuid().optional(),
    phraseIds: z.array(z.string().uuid()).max(100).default([]),
    setIds: z.array(z.string().uuid()).max(200).default([]),
  })
  .refine((c) => c.phraseIds.length + c.setIds.length > 0, { message: "Choose at least one phrase or set to rehearse.", path: ["phraseIds"] });

export const rehearsalSendSchema = z.object({
  choice: rehearsalChoiceSchema,
  userIds: z.array(z.string().min(1).max(100)).min(1, "Choose at least one staff member.").max(100),
});

export type RehearsalChoice = z.infer<typeof rehearsalChoiceSchema>;
