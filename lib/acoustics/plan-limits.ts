// The musical limits of the balance plan: how far it may move a section from what is written and
// the shape of the phrase it keeps. A director can change them per show and per phrase; missing
// ones keep the default. Defaults: common practice, no source.
import { AcousticsInputError, requireInRange } from "./errors";

export interface MusicalLimits {
  /** Winds: the most dynamic steps a section may move from its written dynamic (p → mf is 2). */
  windSteps: number;
  /** Battery and front ensemble (percussion, keyboards, amplified): the same, on their own. */
  percussionSteps: number;
  /**
   * Keep the written shape: a section written louder than another is planned softer than it only
   * when a target needs it, and the melody (a soloist too) is never planned under its accompaniment.
   */
  keepShape: boolean;
}

/**
 * - windSteps 2: a director asks a section for "one or two dynamics up", rarely more; p → ff is a
 *   different piece of music (common practice, no source).
 * - percussionSteps 1: a battery written fff played pp changes the arrangement, not the balance; a step
 *   either way is the usual "back off" or "lay in" (common practice, no source).
 * - keepShape true: common practice, no source.
 */
export const DEFAULT_LIMITS: Readonly<MusicalLimits> = Object.freeze({ windSteps: 2, percussionSteps: 1, keepShape: true });

/** Bounds of the step limits: 0 (play as written) to 6 (pp ↔ fff). */
export const LIMIT_STEPS_RANGE: readonly [number, number] = [0, 6];

/** The defaults with the show's and then the phrase's limits laid over them; throws on a value out of range. */
export function resolveLimits(...layers: (Partial<MusicalLimits> | null | undefined)[]): MusicalLimits {
  const out: MusicalLimits = { ...DEFAULT_LIMITS };
  for (const layer of layers) {
    if (!layer) continue;
    for (const key of ["windSteps", "percussionSteps"] as const) {
      const v = layer[key];
      if (v === undefined) continue;
      out[key] = requireInRange(v, LIMIT_STEPS_RANGE[0], LIMIT_STEPS_RANGE[1], `limits.${key}`);
      if (!Number.isInteger(v)) throw new AcousticsInputError(`limits.${key}`, "must be a whole number of steps");
    }
    if (layer.keepShape !== undefined) {
      if (typeof layer.keepShape !== "boolean") throw new AcousticsInputError("limits.keepShape", "must be true or false");
      out.keepShape = layer.keepShape;
    }
  }
  return out;
}
