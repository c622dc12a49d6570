// The show file: one versioned JSON document holding a whole show without any database ids, so a
// show exported, imported and exported again gives the same document. Each part is checked with the
// schema of the route that writes the same thing, and unknown keys are refused. Pure (zod).
import { listeningPointSchema } from "@/lib/validation/listening-points";
import { dynamicSchema, overrideSchema, phraseSchema, voiceSchema } from "@/lib/validation/music";
import { performerFields } from "@/lib/validation/performers";
import { planLimitsSchema } from "@/lib/validation/plan-limits";
import { positionSchema } from "@/lib/validation/positions";
import { countsSchema, setNumberSchema } from "@/lib/validation/sets";
import { conditionsSchema, createShowSchema } from "@/lib/validation/shows";
import { targetsSchema } from "@/lib/validation/targets";
import { z } from "@/lib/validation/zod";

export const SHOW_FILE_FORMAT = "farfield-show";
export const SHOW_FILE_VERSION = 1;

const { label, section } = performerFields;


export const showFileSchema = z
  .object({
    format: z.literal(SHOW_FILE_FORMAT),
    version: z.literal(SHOW_FILE_VERSION),
    show: z
      .object({
        name: createShowSchema.shape.name,
        fieldRules: createShowSchema.shape.fieldRules,
        conditions: conditionsSchema,
        checkTargets: targetsSchema.nullable(),
        planLimits: planLimitsSchema.nullable().optional(),
      })
      .strict(),
    listeningPoints: z.array(listeningPointSchema.extend({ order: z.number().int().min(0).max(10_000) }).strict()),
    performers: z.array(
      z
        .object({
          ...performerFields,
          name: z.string().max(120, "That name is too long.").nullable(),
        })
        .strict(),
    ),
    movements: z.array(z.object({ number: z.number().int().min(1).max(99), name: z.string().max(160) }).strict()).max(50),
    sets: z.array(
      z
        .object({
          number: setNumberSchema,
          counts: countsSchema,
          movement: z.number().int().nullable(),
          positions: z.array(positionSchema.omit({ performerId: true }).extend({ label }).strict()),
        })
        .strict(),
    ),
    phrases: z
      .array(
        z
          .object({
            name: phraseSchema.shape.name,
            firstSet: setNumberSchema,
            lastSet: setNumberSchema,
            voices: z.array(z.object({ section, voice: voiceSchema, writtenDynamic: dynamicSchema, playedDynamic: dynamicSchema.nullable() }).strict()).max(200),
            overrides: z
              .array(overrideSchema.omit({ phraseId: true, performerId: true }).extend({ label, playedDynamic: dynamicSchema.nullable() }).strict())
              .max(500),
            planLimits: planLimitsSchema.nullable().optional(),
          })
          .strict(),
      )
      .max(500),
  })
  .strict();

export type ShowFile = z.infer<typeof showFileSchema>;
