// A director's balance thresholds for a show: each optional, each within its documented range.
import { TARGET_RANGES } from "@/lib/acoustics/targets";
import { VOICES } from "@/lib/acoustics/types";
import { z } from "./zod";

const numeric = Object.fromEntries(
  Object.entries(TARGET_RANGES).map(([key, [min, max]]) => [
    key,
    z
      .number({ error: `${key} must be a number.` })
      .min(min, `Use ${min} or more.`)
      .max(max, `Use ${max} or less.`)
      .optional(),
  ]),
) as Record<keyof typeof TARGET_RANGES, z.ZodOptional<z.ZodNumber>>;

export const targetsSchema = z
  .object({
    ...numeric,
    pyramidVoices: z.array(z.enum(VOICES)).min(1, "Choose at least one voice.").optional(),
  })
  .strict();

/** PUT body: the thresholds to keep (missing ones use the defaults), or reset to the defaults. */
export const saveTargetsSchema = z.union([z.object({ targets: targetsSchema }).strict(), z.object({ reset: z.literal(true) }).strict()]);
