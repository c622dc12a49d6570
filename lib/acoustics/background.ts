// Background noise at a listening point, as 28 third-octave levels (25 Hz … 12.5 kHz, dB SPL): a
// preset, or custom octave or third-octave levels. Its loudness and masking are judged with the
// band's by ISO 532-1 (loudness.ts, audibility.ts). Crowd noise is talk and murmur: its presets take
// the shape of the standard speech spectrum of ANSI S3.5-1997 at a vocal effort, scaled to an
// A-weighted level that is a rough everyday figure ("from memory"), not a measurement.
import { AcousticsInputError, requireInRange } from "./errors";
import { THIRD_OCTAVE_COUNT, thirdOctaveCentreHz as centreHz } from "./loudness-tables";
import { thirdOctavesFromOctaves } from "./third-octaves";
import { aWeightingDb } from "./weighting";
import { BAND_COUNT } from "./bands";

export const BACKGROUND_PRESETS = ["quiet-field", "stadium-between-bands", "crowd-during-performance"] as const;
export type BackgroundPreset = (typeof BACKGROUND_PRESETS)[number];

/** What a listening point hears besides the band: a preset, custom levels, or nothing (null). */
export type Background =
  | { preset: BackgroundPreset }
  | { octaveDb: number[] } // 8 levels, 63 Hz … 8 kHz
  | { thirdOctaveDb: number[] }; // 28 levels, 25 Hz … 12.5 kHz

/** Lowest and highest level (dB SPL) a custom background band may have. */
export const BACKGROUND_RANGE_DB = [-20, 130] as const;


// ANSI S3.5-1997 Table 3, standard speech spectrum level (dB per Hz) in the third-octaves 160 Hz …
// 8 kHz, for normal and raised vocal effort (overall 62.35 and 68.34 dB). Transcribed from
// Eomys/MoSQITo mosqito/sq_metrics/speech_intelligibility/sii_ansi/_speech_data.py
// @ af68d182c06928039eae4ebc6d257e4b5865aa15 (_get_third_octave_band_speech_data).
const SPEECH_FIRST_BAND = 8; // 160 Hz
const SPEECH_SPECTRUM_LEVEL = {
  normal: [32.41, 34.48, 34.75, 33.98, 34.59, 34.27, 32.06, 28.3, 25.01, 23.0, 20.15, 17.32, 13.18, 11.55, 9.33, 5.31, 2.59, 1.13],
  raised: [33.81, 33.92, 38.98, 38.57, 39.11, 40.15, 38.78, 36.37, 33.86, 31.89, 28.58, 25.32, 22.35, 20.15, 16.78, 11.47, 7.67, 5.07],
} as const;
/** Fall (dB per third-octave) of crowd noise outside the speech bands, below 160 Hz and above 8 kHz: from memory. */
const SPEECH_EDGE_FALL_DB = 3;

/** Third-octave band levels (dB) of the ANSI S3.5 speech spectrum at a vocal effort, 28 bands. */
export function speechBandLevels(effort: keyof typeof SPEECH_SPECTRUM_LEVEL): Float64Array {
  const spectrum = SPEECH_SPECTRUM_LEVEL[effort];
  const out = new Float64Array(THIRD_OCTAVE_COUNT);
  const last = SPEECH_FIRST_BAND + spectrum.length - 1;
  for (let i = 0; i < THIRD_OCTAVE_COUNT; i++) {
    const j = Math.min(Math.max(i, SPEECH_FIRST_BAND), last);
    // A spectrum level times the band's width (base-10 third-octave: fc·(10^0.05 − 10^−0.05)).
    const bandLevel = spectrum[j - SPEECH_FIRST_BAND] + 10 * Math.log10(centreHz(j) * (10 ** 0.05 - 10 ** -0.05));
    out[i] = bandLevel - SPEECH_EDGE_FALL_DB * Math.abs(i - j);
  }
  return out;
}

/** A-weighted total (dBA) of 28 third-octave levels. */
export function thirdOctavesDbA(levels: ArrayLike<number>): number {
  let e = 0;
  for (let i = 0; i < THIRD_OCTAVE_COUNT; i++) e += 10 ** ((levels[i] + aWeightingDb(centreHz(i))) / 10);
  return 10 * Math.log10(e);
}

function scaledToDbA(levels: Float64Array, dbA: number): Float64Array {
  const shift = dbA - thirdOctavesDbA(levels);
  return levels.map((l) => l + shift);
}

export interface BackgroundPresetSpec {
  label: string;
  /** A-weighted level of the preset at the listening point. */
  dbA: number;
  thirdOctaveDb: Float64Array;
  source: string;
}

// Octave levels (63 Hz … 8 kHz) of a quiet school practice field with distant traffic: from memory.
const QUIET_FIELD_OCTAVES = [52, 47, 43, 40, 37, 33, 28, 22];

/** The presets, with their level, spectrum and where they come from. */
export const BACKGROUND_PRESET_SPECS: Readonly<Record<BackgroundPreset, BackgroundPresetSpec>> = Object.freeze({
  "quiet-field": {
    label: "Quiet practice field",
    dbA: thirdOctavesDbA(thirdOctavesFromOctaves(QUIET_FIELD_OCTAVES)),
    thirdOctaveDb: thirdOctavesFromOctaves(QUIET_FIELD_OCTAVES),
    source: "octave levels of distant traffic on a quiet field, from memory",
  },
  "stadium-between-bands": {
    label: "Stadium between bands",
    dbA: 65,
    thirdOctaveDb: scaledToDbA(speechBandLevels("raised"), 65),
    source: "ANSI S3.5-1997 Table 3 speech spectrum, raised effort, at 65 dBA (level from memory)",
  },
  "crowd-during-performance": {
    label: "Crowd during a performance",
    dbA: 55,
    thirdOctaveDb: scaledToDbA(speechBandLevels("normal"), 55),
    source: "ANSI S3.5-1997 Table 3 speech spectrum, normal effort, at 55 dBA (level from memory)",
  },
});

/** Throws unless `background` is null, a known preset, or 8 octave / 28 third-octave levels in range. */
export function validateBackground(background: unknown, field = "background"): asserts background is Background | null {
  if (background === null || background === undefined) return;
  if (typeof background !== "object") throw new AcousticsInputError(field, "must be a preset or band levels");
  const b = background as Record<string, unknown>;
  const keys = Object.keys(b);
  if (keys.length !== 1) throw new AcousticsInputError(field, "must give exactly one of preset, octaveDb, thirdOctaveDb");
  const [lo, hi] = BACKGROUND_RANGE_DB;
  if ("preset" in b) {
    if (!BACKGROUND_PRESETS.includes(b.preset as BackgroundPreset)) {
      throw new AcousticsInputError(`${field}.preset`, `must be one of ${BACKGROUND_PRESETS.join(", ")}`);
    }
    return;
  }
  // Stryker disable next-line ArrayDeclaration: for no known form an empty array leaves key undefined, refused below as "" is
  const [key, count] = "octaveDb" in b ? ["octaveDb", BAND_COUNT] : "thirdOctaveDb" in b ? ["thirdOctaveDb", THIRD_OCTAVE_COUNT] : ["", 0];
  if (!key) throw new AcousticsInputError(field, "must give exactly one of preset, octaveDb, thirdOctaveDb");
  const levels = b[key];
  if (!Array.isArray(levels) || levels.length !== count) throw new AcousticsInputError(`${field}.${key}`, `must hold ${count} levels`);
  levels.forEach((l, i) => requireInRange(l, lo, hi, `${field}.${key}[${i}]`));
}

/** The 28 third-octave levels of a background (all −Infinity for none). Validates it first. */
export function backgroundThirdOctaves(background: Background | null | undefined): Float64Array {
  validateBackground(background);
  if (!background) return new Float64Array(THIRD_OCTAVE_COUNT).fill(-Infinity);
  if ("preset" in background) return new Float64Array(BACKGROUND_PRESET_SPECS[background.preset].thirdOctaveDb);
  if ("octaveDb" in background) return thirdOctavesFromOctaves(background.octaveDb);
  return Float64Array.from(background.thirdOctaveDb);
}
