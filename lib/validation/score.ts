// A score import's choices as the API takes them: which section each part plays in, and where sets meet the music.
import { z } from "./zod";

export const scoreMappingSchema = z.record(
  z.string().min(1).max(200),
  z.string().trim().min(1, "Name a section or leave the part out.").max(120).nullable(),
  { error: "mapping must map each part's id to a section name or null." },
);

export const scoreAnchorSchema = z
  .object({
    setId: z.string().uuid("Choose a set of the show."),
    measure: z.string().trim().min(1, "Give the measure's number.").max(12, "That measure number is too long."),
    beat: z.number({ error: "The beat must be a number." }).min(1, "Beats start at 1.").max(64, "The beat is past any measure's counts."),
    pass: z.number().int().min(1).max(16).optional(),
  })
  .strict();

export const scoreAnchorsSchema = z.array(scoreAnchorSchema).min(1, "Anchor at least one set to the music (for example set 1 at measure 1, beat 1).").max(200);

/** The choices sent with a preview or a confirm; each may be left out to take the suggestion. */
export const scoreChoicesSchema = z
  .object({
    mapping: scoreMappingSchema.optional(),
    anchors: scoreAnchorsSchema.optional(),
  })
  .strict();
export type ScoreChoices = z.infer<typeof scoreChoicesSchema>;
