// The thresholds of the balance checks and the balance plan, with their documented defaults.
// A director can change any of them per show (shows.check_targets); missing ones keep the default.
import { AcousticsInputError, requireInRange } from "./errors";
import { VOICES, type Voice } from "./types";

/** Bumped whenever the checks or the plan compute differently, so stored results are recomputed. */
export const BALANCE_VERSION = "farfield-balance-5";

export interface BalanceTargets {
  /** melody-forward: the melody leads every other voice by at least this (dB). */
  melodyLeadDb: number;
  /** bass-up-pyramid: a lower register may sit at most this far below a higher one of its choir (dB). */
  pyramidToleranceDb: number;
  /** bass-up-pyramid: the voices whose players form the pyramid (the harmony under the lines). */
  pyramidVoices: Voice[];
  /** depth-support: front-third players of an instrument may reach the box at most this much louder per player than back-third ones (dB). */
  depthToleranceDb: number;
  /** wide-form-edges: a form of wind players wider than this (m) is checked. */
  wideFormWidthM: number;
  /** wide-form-edges: the end players may reach the box at most this much louder per player than the centre (dB). */
  edgeToleranceDb: number;
  /** stand-outs: a performer may be at most this far above the median of the rest of its section (dB). */
  standOutDb: number;
  /** arrival-spread: the largest delay between the nearest and farthest sounding players (ms). */
  arrivalSpreadMs: number;
  /** The plan: sections doubling one voice stay within this of each other at the box (dB). */
  blendToleranceDb: number;
  /** Set compare: a voice changing more than this from one set to the next is flagged (dB). */
  setChangeDb: number;
}

/**
 * Defaults and where they come from:
 * - melodyLeadDb 3: common practice, no source (a few dB of lead is the usual teaching).
 * - pyramidToleranceDb 1, pyramidVoices accompaniment + bass: common practice, no source (the
 *   "pyramid of sound": lower voices at least as present as higher ones, for the harmony).
 * - depthToleranceDb 3: common practice, no source (front players listen back and blend).
 * - wideFormWidthM 36.576 (40 yd) and edgeToleranceDb 0: common practice, no source.
 * - standOutDb 6: common practice, no source (6 dB is twice the sound pressure of the others).
 * - arrivalSpreadMs 100: the precedence (Haas) effect fuses a second arrival within roughly 30–40 ms
 *   for speech (Haas 1951); for music the echo threshold lies higher, some 50–100 ms depending on the
 *   attacks (from memory). A field-deep form always spreads 60 ms or more at the box, so 100 ms flags
 *   the forms whose back players will sound late there, not every set.
 * - blendToleranceDb 6: common practice, no source.
 * - setChangeDb 3: common practice, no source (the sound should not jump from one set to the next).
 */
export const DEFAULT_TARGETS: Readonly<BalanceTargets> = Object.freeze({
  melodyLeadDb: 3,
  pyramidToleranceDb: 1,
  pyramidVoices: ["accompaniment", "bass"] as Voice[],
  depthToleranceDb: 3,
  wideFormWidthM: 40 * 0.9144,
  edgeToleranceDb: 0,
  standOutDb: 6,
  arrivalSpreadMs: 100,
  blendToleranceDb: 6,
  setChangeDb: 3,
});

/** Bounds a director's value must respect (a threshold outside them is a typo, not a choice). */
export const TARGET_RANGES: Readonly<Record<Exclude<keyof BalanceTargets, "pyramidVoices">, [number, number]>> = Object.freeze({
  melodyLeadDb: [0, 20],
  pyramidToleranceDb: [0, 20],
  depthToleranceDb: [0, 20],
  wideFormWidthM: [5, 120],
  edgeToleranceDb: [0, 20],
  standOutDb: [0, 30],
  arrivalSpreadMs: [1, 500],
  blendToleranceDb: [0, 30],
  setChangeDb: [0, 30],
});

/** The defaults with a show's stored targets laid over them; throws on a value out of range. */
export function resolveTargets(overrides?: Partial<BalanceTargets> | null): BalanceTargets {
  const out: BalanceTargets = { ...DEFAULT_TARGETS, pyramidVoices: [...DEFAULT_TARGETS.pyramidVoices] };
  if (!overrides) return out;
  for (const key of Object.keys(TARGET_RANGES) as (keyof typeof TARGET_RANGES)[]) {
    const v = overrides[key];
    if (v === undefined) continue;
    const [min, max] = TARGET_RANGES[key];
    out[key] = requireInRange(v, min, max, `targets.${key}`);
  }
  if (overrides.pyramidVoices !== undefined) {
    const voices = overrides.pyramidVoices;
    if (!Array.isArray(voices) || voices.some((v) => !VOICES.includes(v))) {
      throw new AcousticsInputError("targets.pyramidVoices", `must list voices among ${VOICES.join(", ")}`);
    }
    out.pyramidVoices = [...new Set(voices)];
  }
  return out;
}
