// A listening point as the API takes it (shared/API.md): metres in the field frame, z up; its own
// ground (ISO 9613-2 §7.3.1 receiver region) and its background noise (lib/acoustics/background.ts).
import { BACKGROUND_PRESETS, BACKGROUND_RANGE_DB, type Background } from "@/lib/acoustics/background";
import { BAND_COUNT } from "@/lib/acoustics/bands";
import { THIRD_OCTAVE_COUNT } from "@/lib/acoustics/loudness-tables";
import { z } from "./zod";

/** A listening point may lie at most this far from the 50-yard line on the front sideline, and this high. */
export const LISTENING_POINT_REACH_M = 300;
export const LISTENING_POINT_MAX_HEIGHT_M = 100;

const coordinate = (what: string, min: number, max: number, where: string) =>
  z.number({ error: `${what} must be a number.` }).refine((v) => Number.isFinite(v) && v >= min && v <= max, `${what} ${where}`);

/** An ISO 9613-2 ground factor: 0 hard (concrete, water) to 1 porous (grass). */
export const groundFactorSchema = z
  .number({ error: "The ground factor must be a number." })
  .refine((g) => Number.isFinite(g) && g >= 0 && g <= 1, "The ground factor must be between 0 (hard, e.g. concrete) and 1 (grass).");

const [LOW_DB, HIGH_DB] = BACKGROUND_RANGE_DB;
const bandLevels = (count: number, what: string) =>
  z
    .array(
      z.number({ error: "Each level must be a number of dB." }).refine((l) => Number.isFinite(l) && l >= LOW_DB && l <= HIGH_DB, `Each level must be ${LOW_DB} to ${HIGH_DB} dB.`),
      { error: `Give ${count} ${what} levels.` },
    )
    .length(count, `Give ${count} ${what} levels.`);

/** What the point hears besides the band: a preset, custom octave (63 Hz–8 kHz) or third-octave (25 Hz–12.5 kHz) levels. */
export const backgroundSchema = z
  .object(
    {
      preset: z.enum(BACKGROUND_PRESETS, { error: `The background preset is one of ${BACKGROUND_PRESETS.join(", ")}.` }).optional(),
      octaveDb: bandLevels(BAND_COUNT, "octave-band (63 Hz to 8 kHz)").optional(),
      thirdOctaveDb: bandLevels(THIRD_OCTAVE_COUNT, "third-octave (25 Hz to 12.5 kHz)").optional(),
    },
    { error: "The background is a preset, or octave or third-octave levels in dB." },
  )
  .strict()
  // One of the three, as lib/acoustics/background.ts takes it.
  .refine((b) => Object.keys(b).length === 1, "Give the background as one of preset, octaveDb or thirdOctaveDb.")
  .transform((b) => b as Background);

export const listeningPointSchema = z
  .object({
    name: z.string().trim().min(1, "Name the listening point.").max(120, "That name is too long."),
    x: coordinate("x", -LISTENING_POINT_REACH_M, LISTENING_POINT_REACH_M, `must be within ${LISTENING_POINT_REACH_M} m of the 50-yard line.`),
    y: coordinate("y", -LISTENING_POINT_REACH_M, LISTENING_POINT_REACH_M, `must be within ${LISTENING_POINT_REACH_M} m of the front sideline.`),
    z: coordinate("z", 0, LISTENING_POINT_MAX_HEIGHT_M, `must be 0 to ${LISTENING_POINT_MAX_HEIGHT_M} m above the field.`),
    /** G of the ground around the point (e.g. 0 for concrete stands); null: the ground between. */
    groundFactor: groundFactorSchema.nullable().optional(),
    /** How far that ground reaches from the point toward the field. */
    surroundingsM: coordinate("surroundingsM", 0, LISTENING_POINT_REACH_M, `must be 0 to ${LISTENING_POINT_REACH_M} m.`).optional(),
    background: backgroundSchema.nullable().optional(),
  })
  .strict();

/** A change to a listening point: any of its fields, at least one. */
export const updateListeningPointSchema = listeningPointSchema
  .partial()
  .strict()
  .refine((b) => Object.keys(b).length > 0, { message: "Give at least one field to change.", path: ["(body)"] });
