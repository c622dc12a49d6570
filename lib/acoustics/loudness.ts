// Loudness of stationary sounds by ISO 532-1:2017 clause 5 (Zwicker method) from 28 unweighted
// third-octave levels, 25 Hz … 12.5 kHz. Steps as in the standard's Annex A program: low-frequency
// correction by the equal-loudness contours, the three lowest critical bands summed, ear
// transmission, core loudness per critical band, the lowest band's correction, then the upper
// slopes (spread of masking) integrated over 0–24 Bark. Tables: loudness-tables.ts.
import { AcousticsInputError } from "./errors";
import * as T from "./loudness-tables";

// Local copies of the tables: hot loops then read plain constants, not a module namespace's bindings.
const THIRD_OCTAVE_COUNT = T.THIRD_OCTAVE_COUNT;
const CORE_BAND_COUNT = T.CORE_BAND_COUNT;
const LF_RANGE_DB = T.LF_RANGE_DB;
const LF_REDUCTION_DB = T.LF_REDUCTION_DB;
const LOW_BAND_END_0 = T.LOW_CRITICAL_BANDS[0][1];
const LOW_BAND_END_1 = T.LOW_CRITICAL_BANDS[1][1];
const EAR_TRANSMISSION_DB = T.EAR_TRANSMISSION_DB;
const DIFFUSE_FIELD_DB = T.DIFFUSE_FIELD_DB;
const THRESHOLD_QUIET_DB = T.THRESHOLD_QUIET_DB;
const CRITICAL_BAND_ADAPTATION_DB = T.CRITICAL_BAND_ADAPTATION_DB;
const CRITICAL_BAND_UPPER_BARK = T.CRITICAL_BAND_UPPER_BARK;
const SLOPE_RANGE_SONE = T.SLOPE_RANGE_SONE;
const UPPER_SLOPE = T.UPPER_SLOPE;

export type SoundField = "free" | "diffuse";

export interface Loudness {
  /** Total loudness N (sone). */
  sone: number;
  /** Loudness level LN (phon). */
  phon: number;
}

/** Points of the specific-loudness pattern: 0.1 Bark steps up to 24 Bark. */
export const SPECIFIC_LOUDNESS_POINTS = 240;

const LF_BANDS = LF_REDUCTION_DB[0].length;
const RANGE_COUNT = LF_RANGE_DB.length;
const SLOPE_LAST = SLOPE_RANGE_SONE.length - 1;
const SLOPE_COLUMNS = UPPER_SLOPE[0].length;
const LN10_10 = Math.LN10 / 10;
// Table A.6 threshold factor 0.0635·10^(0.025·LTQ) of the core-loudness formula, per band.
const CORE_SCALE = Float64Array.from(THRESHOLD_QUIET_DB, (ltq) => 0.0635 * 10 ** (0.025 * ltq));

/** Throws unless `levels` holds 28 numbers below +Infinity (−Infinity is a silent band). */
function checkLevels(levels: ArrayLike<number>): void {
  if (!levels || levels.length !== THIRD_OCTAVE_COUNT) {
    throw new AcousticsInputError("thirdOctaveDb", `must hold ${THIRD_OCTAVE_COUNT} third-octave levels (25 Hz to 12.5 kHz)`);
  }
  for (let i = 0; i < THIRD_OCTAVE_COUNT; i++) {
    const l = levels[i];
    if (typeof l !== "number" || Number.isNaN(l) || l === Infinity) {
      throw new AcousticsInputError(`thirdOctaveDb[${i}]`, "must be a number in dB (−Infinity for silence)");
    }
  }
}

/**
 * Core loudness (sone/Bark) of the 21 approximated critical bands (the 21st is always 0) from
 * 28 third-octave levels, written into `out`. No input checks: callers pass checked levels.
 * Above 120 dB in a band below 315 Hz the standard's table ends; its last row applies, as in the
 * standard's program.
 */
export function coreLoudnessInto(levels: ArrayLike<number>, field: SoundField, out: Float64Array): void {
  // Low-frequency correction (Table A.3) and the three lowest critical bands' levels.
  let lowIntensity0 = 0, lowIntensity1 = 0, lowIntensity2 = 0;
  for (let i = 0; i < LF_BANDS; i++) {
    const l = levels[i];
    let k = 0;
    while (k < RANGE_COUNT - 1 && l > LF_RANGE_DB[k] - LF_REDUCTION_DB[k][i]) k++;
    const intensity = Math.exp((l + LF_REDUCTION_DB[k][i]) * LN10_10);
    if (i < LOW_BAND_END_0) lowIntensity0 += intensity;
    else if (i < LOW_BAND_END_1) lowIntensity1 += intensity;
    else lowIntensity2 += intensity;
  }
  const diffuse = field === "diffuse";
  for (let i = 0; i < CORE_BAND_COUNT; i++) {
    // Critical bands 4… are the third-octaves 315 Hz … 12.5 kHz one for one.
    let le =
      i === 0 ? 10 * Math.log10(lowIntensity0) : i === 1 ? 10 * Math.log10(lowIntensity1) : i === 2 ? 10 * Math.log10(lowIntensity2) : levels[i + 8];
    le -= EAR_TRANSMISSION_DB[i];
    if (diffuse) le += DIFFUSE_FIELD_DB[i];
    const ltq = THRESHOLD_QUIET_DB[i];
    let n = 0;
    if (le > ltq) {
      le -= CRITICAL_BAND_ADAPTATION_DB[i];
      // The fourth root as two square roots: Math.pow is several times slower here.
      n = CORE_SCALE[i] * (Math.sqrt(Math.sqrt(0.75 + 0.25 * Math.exp((le - ltq) * LN10_10))) - 1);
      if (n < 0) n = 0;
    }
    out[i] = n;
  }
  out[CORE_BAND_COUNT] = 0;
  // The lowest critical band's threshold varies within the band (the standard's program: f_corr_loudness).
  const corr = 0.4 + 0.32 * Math.pow(out[0], 0.2);
  if (corr < 1) out[0] *= corr;
}

/**
 * Total loudness (sone) from the 21 core loudnesses: each band's core loudness plus the upper
 * slope of the band below where that slope is higher (spread of masking), integrated over Bark.
 * When `specific` (240 points) is given, the specific loudness at 0.1, 0.2 … 24 Bark goes there.
 */
export function totalLoudnessFromCore(core: ArrayLike<number>, specific?: Float64Array): number {
  let total = 0;
  let z1 = 0; // Bark where the pattern has been integrated to
  let n1 = 0; // specific loudness there
  let z = 0.1; // next point of the specific pattern
  let iz = 0;
  let j = SLOPE_LAST; // row of the slope table in use
  for (let i = 0; i <= CORE_BAND_COUNT; i++) {
    const zup = CRITICAL_BAND_UPPER_BARK[i] + 0.0001; // as the standard's program, so 0.1-Bark points on a limit count
    const column = Math.min(i - 1, SLOPE_COLUMNS - 1); // slope of the band below (never read for i = 0: n1 = 0 there)
    const nm = core[i];
    while (z1 < zup) {
      let z2: number;
      let n2: number;
      if (n1 <= nm) {
        // The band's own core loudness is not masked: flat to the band's upper limit.
        if (n1 < nm) {
          j = 0;
          while (j < SLOPE_LAST && SLOPE_RANGE_SONE[j] > nm) j++;
        }
        z2 = zup;
        n2 = nm;
        total += n2 * (z2 - z1);
        // Stryker disable next-line ConditionalExpression,EqualityOperator: z2 here is a band limit + 0.0001 Bark, never on the 0.1-Bark grid; z passes 24.0001 after the 240th point, so iz never reaches 240 here
        if (specific) for (; z <= z2 && iz < SPECIFIC_LOUDNESS_POINTS; z += 0.1) specific[iz++] = n2;
      } else {
        // The slope of a louder band below covers this band, fully or in part.
        const slope = UPPER_SLOPE[j][column];
        n2 = SLOPE_RANGE_SONE[j] > nm ? SLOPE_RANGE_SONE[j] : nm;
        let dz = (n1 - n2) / slope;
        z2 = z1 + dz;
        if (z2 > zup) {
          z2 = zup;
          dz = z2 - z1;
          n2 = n1 - dz * slope;
        }
        total += (dz * (n1 + n2)) / 2;
        // Stryker disable next-line ConditionalExpression,EqualityOperator: a point exactly at z2 is written by the next stretch, which starts there at the same value; iz never reaches 240 (as above)
        if (specific) for (; z <= z2 && iz < SPECIFIC_LOUDNESS_POINTS; z += 0.1) specific[iz++] = n1 - (z - z1) * slope;
      }
      if (n2 <= SLOPE_RANGE_SONE[j] && j < SLOPE_LAST) j++;
      z1 = z2;
      n1 = n2;
    }
  }
  // Stryker disable next-line ConditionalExpression,EqualityOperator,UpdateOperator: for a core of finite, non-negative loudnesses (as coreLoudnessInto gives) the loop above writes all 240 points (the 240th is at 24.0 Bark, below the last limit, 24.0001), so none is left here
  if (specific) for (; iz < SPECIFIC_LOUDNESS_POINTS; iz++) specific[iz] = 0;
  return total > 0 ? total : 0;
}

/** Loudness level (phon) of a loudness (sone): 40 + 10·log2 N from 1 sone up, 40·N^0.35 below, at least 3 phon. */
export function soneToPhon(sone: number): number {
  if (sone >= 1) return 40 + 10 * Math.log2(sone);
  const phon = 40 * Math.pow(sone, 0.35);
  return phon < 3 ? 3 : phon;
}

/** Loudness (sone) of a loudness level (phon): the inverse of soneToPhon above 3 phon. */
export function phonToSone(phon: number): number {
  // Stryker disable next-line EqualityOperator: at exactly 40 phon both branches give 1 sone
  if (phon >= 40) return Math.pow(2, (phon - 40) / 10);
  return Math.pow(phon / 40, 1 / 0.35);
}

const coreScratch = new Float64Array(CORE_BAND_COUNT + 1);

/**
 * ISO 532-1:2017 loudness of a stationary sound from its 28 unweighted third-octave levels
 * (dB SPL, 25 Hz … 12.5 kHz; −Infinity for a silent band), free field unless told otherwise.
 * Unrounded: the standard's program rounds N to 0.001 sone (0.01 above 16 sone) for display only.
 */
export function loudnessIso532_1(thirdOctaveDb: ArrayLike<number>, field: SoundField = "free"): Loudness {
  checkLevels(thirdOctaveDb);
  if (field !== "free" && field !== "diffuse") throw new AcousticsInputError("field", 'must be "free" or "diffuse"');
  coreLoudnessInto(thirdOctaveDb, field, coreScratch);
  const sone = totalLoudnessFromCore(coreScratch);
  return { sone, phon: soneToPhon(sone) };
}
