// The thresholds of the balance checks and the balance plan, with their documented defaults.
// A director can change any of them per show (shows.check_targets); missing ones keep the default.
import { AcousticsInputError, requireInRange } from "./errors";
import { VOICES, type Voice } from "./types";

/** Bumped whenever the checks or the plan compute differently, so stored results are recomputed. */
export const BALANCE_VERSION = "farfield-balance-6";

export interface BalanceTargets {
  /** melody-forward: the melody's loudness level leads every other wind voice's by at least this (phon). */
  melodyLeadDb: number;
  /** battery-balance: the battery's loudness level may exceed the winds' by at most this (phon). */
  batteryOverWindsDb: number;
  /** bass-up-pyramid: a lower register's loudness level may sit at most this far below a higher one's (phon). */
  pyramidToleranceDb: number;
  /** bass-up-pyramid: the voices whose players form the pyramid (the harmony under the lines). */
  pyramidVoices: Voice[];
  /** depth-support: an instrument's nearer players may be louder per player than its farther ones by at most this beyond what distance explains (phon). */
  depthToleranceDb: number;
  /** wide-form-edges: a form of wind players wider than this (m) is checked. */
  wideFormWidthM: number;
  /** wide-form-edges: a section's players at the form's ends may be louder per player than the same section's centre by at most this (phon). */
  edgeToleranceDb: number;
  /** stand-outs: a performer may be at most this far above the median of the rest of its section and voice (phon). */
  standOutDb: number;
  /** arrival-spread: the largest delay between players within the level window of the loudest (ms). */
  arrivalSpreadMs: number;
  /** arrival-spread: players more than this below the loudest player are left out (dB). */
  arrivalWindowDb: number;
  /** heard-at-box: each sounding voice rises above its masked threshold by at least this (dB). */
  heardMarginDb: number;
  /** Kept for stored targets; since balance version 6 the plan serves only the checks' targets and no longer uses it (dB). */
  blendToleranceDb: number;
  /** Set compare: a voice changing more than this from one set to the next is flagged (dB). */
  setChangeDb: number;
}

/**
 * Defaults and where they come from. Levels the checks compare are loudness levels (phon, ISO 532-1),
 * so a difference of 10 phon is twice or half as loud.
 * - melodyLeadDb 3: common practice, no source (a few dB of lead is the usual teaching).
 * - batteryOverWindsDb 3: common practice, no source (the battery sits with the winds, not over them).
 * - pyramidToleranceDb 3, pyramidVoices accompaniment + bass: common practice, no source (the
 *   "pyramid of sound": lower voices at least as present as higher ones, for the harmony).
 * - depthToleranceDb 3: common practice, no source (front players listen back and blend); what
 *   distance alone explains is the spreading loss 20·lg(d_far / d_near) (ISO 9613-2, eq. 7).
 * - wideFormWidthM 36.576 (40 yd) and edgeToleranceDb 2: common practice, no source.
 * - standOutDb 6: common practice, no source (6 dB is twice the sound pressure of the others).
 * - arrivalSpreadMs 50: a sound arriving 40–50 ms after the first is heard as an echo, provided it
 *   is not masked (B. Truax, Handbook for Acoustic Ecology, "Precedence effect",
 *   sfu.ca/sonic-studio-webdav/cmns/Handbook5/handbook/Precedence_Effect.html); sustained sounds
 *   such as a band's fuse longer than clicks, so the upper end.
 * - arrivalWindowDb 10: a later arrival more than about 10 dB below the first no longer competes
 *   with it (M. Burg, J. Romney, E. Schwartz, Digital Sound & Music, "precedence effect",
 *   wfu.tizrapublisher.com/digital-sound-and-music/218).
 * - heardMarginDb −3: a voice up to 3 dB under its masked threshold (ISO/IEC 11172-3 Annex D,
 *   audibility.ts) still counts as heard, since the threshold knows simultaneous masking only and a
 *   listener also separates players by direction: spatial release from masking is several dB for
 *   sources apart in azimuth (A. W. Bronkhorst, Acta Acustica 86:117–128, 2000; from memory).
 * - blendToleranceDb 6: no longer used (the plan serves the checks that fail as written).
 * - setChangeDb 3: common practice, no source (the sound should not jump from one set to the next).
 */
export const DEFAULT_TARGETS: Readonly<BalanceTargets> = Object.freeze({
  melodyLeadDb: 3,
  batteryOverWindsDb: 3,
  pyramidToleranceDb: 3,
  pyramidVoices: ["accompaniment", "bass"] as Voice[],
  depthToleranceDb: 3,
  wideFormWidthM: 40 * 0.9144,
  edgeToleranceDb: 2,
  standOutDb: 6,
  arrivalSpreadMs: 50,
  arrivalWindowDb: 10,
  heardMarginDb: -3,
  blendToleranceDb: 6,
  setChangeDb: 3,
});

/** Bounds a director's value must respect (a threshold outside them is a typo, not a choice). */
export const TARGET_RANGES: Readonly<Record<Exclude<keyof BalanceTargets, "pyramidVoices">, [number, number]>> = Object.freeze({
  melodyLeadDb: [0, 20],
  batteryOverWindsDb: [-10, 20],
  pyramidToleranceDb: [0, 20],
  depthToleranceDb: [0, 20],
  wideFormWidthM: [5, 120],
  edgeToleranceDb: [0, 20],
  standOutDb: [0, 30],
  arrivalSpreadMs: [1, 500],
  arrivalWindowDb: [1, 40],
  heardMarginDb: [-10, 20],
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
