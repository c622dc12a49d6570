// The show file: one versioned JSON document holding a whole show without any database ids, so a
// show exported, imported and exported again gives the same document. Pure (zod).
import { z } from "zod";
import { DYNAMICS, VOICES } from "@/lib/acoustics/types";
import { planLimitsSchema } from "@/lib/validation/plan-limits";

export const SHOW_FILE_FORMAT = "farfield-show";
export const SHOW_FILE_VERSION = 1;

const finite = z.number().refine(Number.isFinite, "must be a finite number");
const dynamic = z.enum(DYNAMICS);
const voice = z.enum([...VOICES, "tacet"]);
const label = z.string().min(1).max(16);
const setNumber = z.string().regex(/^\d{1,3}[A-Za-z]?$/, "must be a set number such as 12 or 12A");

export const showFileSchema = z
  .object({
    format: z.literal(SHOW_FILE_FORMAT),
    version: z.literal(SHOW_FILE_VERSION),
    show: z.object({
      name: z.string().min(1).max(160),
      fieldRules: z.enum(["high-school", "college"]),
      conditions: z.object({
        temperatureC: finite,
        relativeHumidityPct: finite.refine((v) => v >= 0 && v <= 100, "must be 0 to 100"),
        pressureKPa: finite.refine((v) => v > 0, "must be above 0"),
        groundFactor: finite.refine((v) => v >= 0 && v <= 1, "must be 0 to 1").nullable(),
      }),
      checkTargets: z.unknown().nullable(),
      planLimits: planLimitsSchema.nullable().optional(),
    }),
    listeningPoints: z.array(z.object({ name: z.string().min(1).max(120), x: finite, y: finite, z: finite, order: z.number().int() })).max(50),
    performers: z
      .array(
        z.object({
          label,
          instrument: z.string().min(1).max(60),
          section: z.string().min(1).max(60),
          part: z.string().max(40),
          strengthDb: finite.refine((v) => v >= -6 && v <= 6, "must be -6 to 6 dB"),
          name: z.string().max(120).nullable(),
        }),
      )
      .max(1000),
    movements: z.array(z.object({ number: z.number().int().min(1), name: z.string().max(160) })).max(50),
    sets: z
      .array(
        z.object({
          number: setNumber,
          counts: z.number().int().min(0).max(999),
          movement: z.number().int().nullable(),
          positions: z.array(z.object({ label, x: finite, y: finite, facingDeg: finite })).max(1000),
        }),
      )
      .max(500),
    phrases: z
      .array(
        z.object({
          name: z.string().min(1).max(160),
          firstSet: setNumber,
          lastSet: setNumber,
          voices: z.array(z.object({ section: z.string().min(1).max(60), voice, writtenDynamic: dynamic, playedDynamic: dynamic.nullable() })),
          overrides: z.array(z.object({ label, voice, writtenDynamic: dynamic, playedDynamic: dynamic.nullable(), note: z.string().max(500) })),
          planLimits: planLimitsSchema.nullable().optional(),
        }),
      )
      .max(500),
  })
  .strict();

export type ShowFile = z.infer<typeof showFileSchema>;
