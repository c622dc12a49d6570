// A director's musical limits for the balance plan, for the whole show or one phrase: each optional.
import { LIMIT_STEPS_RANGE } from "@/lib/acoustics/plan-limits";
import { z } from "./zod";

const steps = (what: string) =>
  z
    .number({ error: `${what} must be a number of dynamic steps.` })
    .int("Use a whole number of steps.")
    .min(LIMIT_STEPS_RANGE[0], `Use ${LIMIT_STEPS_RANGE[0]} or more.`)
    .max(LIMIT_STEPS_RANGE[1], `Use ${LIMIT_STEPS_RANGE[1]} or less (pp to fff).`)
    .optional();

export const planLimitsSchema = z
  .object({
    windSteps: steps("windSteps"),
    percussionSteps: steps("percussionSteps"),
    keepShape: z.boolean({ error: "keepShape must be true or false." }).optional(),
  })
  .strict();

/** PUT body: the show's limits, or one phrase's (phraseId); null goes back to the defaults (the show's, for a phrase). */
export const savePlanLimitsSchema = z
  .object({
    phraseId: z.string().uuid("phraseId must be a phrase's id.").optional(),
    limits: planLimitsSchema.nullable(),
  })
  .strict();
