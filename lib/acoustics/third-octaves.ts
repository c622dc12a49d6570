// Third-octave levels (25 Hz … 12.5 kHz, the 28 bands of ISO 532-1) derived from the engine's eight
// octave bands (63 Hz … 8 kHz). The engine stays in octave bands: its source spectra are octave
// data, and three times the bands would triple the cost of every evaluation, for a loudness that
// moves by well under a phon (README, "Loudness at the listening point").
//
// The rule: each octave's energy is split over its three thirds along the spectrum's slope there,
// the slope (dB per octave) taken from the neighbouring octaves (central difference; one-sided at
// the ends or next to a silent octave; at most ±MAX_SLOPE_DB_PER_OCTAVE). The thirds get
// L − s/3, L, L + s/3 plus the one offset that makes their energies add up to the octave's exactly.
// Outside the modelled octaves the end slope continues, but never rising away from them: 25, 31.5
// and 40 Hz fall (or stay level) below 50 Hz, 12.5 kHz falls (or stays level) above 10 kHz.
import { BAND_COUNT } from "./bands";
import { THIRD_OCTAVE_COUNT } from "./loudness-tables";

/** Steepest slope (dB per octave) the split uses; a silent neighbour would otherwise send the whole octave to one third. */
export const MAX_SLOPE_DB_PER_OCTAVE = 30;

/** Index of the first third-octave of the lowest octave (50 Hz in 25 Hz … 12.5 kHz). */
const FIRST_SPLIT = 3;
const LN10_10 = Math.LN10 / 10;

function clampSlope(s: number): number {
  return s > MAX_SLOPE_DB_PER_OCTAVE ? MAX_SLOPE_DB_PER_OCTAVE : s < -MAX_SLOPE_DB_PER_OCTAVE ? -MAX_SLOPE_DB_PER_OCTAVE : s;
}

/** Spectrum slope (dB per octave) at octave k from its finite neighbours; 0 when it has none. */
function slopeAt(octaveDb: ArrayLike<number>, k: number): number {
  const below = k > 0 && Number.isFinite(octaveDb[k - 1]);
  const above = k < BAND_COUNT - 1 && Number.isFinite(octaveDb[k + 1]);
  if (below && above) return clampSlope((octaveDb[k + 1] - octaveDb[k - 1]) / 2);
  if (above) return clampSlope(octaveDb[k + 1] - octaveDb[k]);
  if (below) return clampSlope(octaveDb[k] - octaveDb[k - 1]);
  return 0;
}

/**
 * Writes the 28 third-octave levels (dB, 25 Hz … 12.5 kHz) derived from 8 octave levels (63 Hz …
 * 8 kHz) into `out`. A silent octave (−Infinity) gives three silent thirds; the thirds of every
 * octave carry exactly its energy.
 */
export function thirdOctavesFromOctavesInto(octaveDb: ArrayLike<number>, out: Float64Array): void {
  let lowSlope = 0;
  let highSlope = 0;
  for (let k = 0; k < BAND_COUNT; k++) {
    const level = octaveDb[k];
    const o = FIRST_SPLIT + 3 * k;
    if (!(level > -Infinity)) {
      out[o] = out[o + 1] = out[o + 2] = -Infinity;
      continue;
    }
    const s = slopeAt(octaveDb, k);
    if (k === 0) lowSlope = s;
    if (k === BAND_COUNT - 1) highSlope = s;
    const step = s / 3;
    const norm = 10 * Math.log10(Math.exp(-step * LN10_10) + 1 + Math.exp(step * LN10_10));
    out[o] = level - step - norm;
    out[o + 1] = level - norm;
    out[o + 2] = level + step - norm;
  }
  // Below 50 Hz: the lowest octave's slope continued downward, never rising.
  const fall = lowSlope > 0 ? lowSlope / 3 : 0;
  for (let m = 1; m <= FIRST_SPLIT; m++) out[FIRST_SPLIT - m] = out[FIRST_SPLIT] - m * fall;
  // 12.5 kHz: the highest octave's slope continued upward, never rising.
  const last = FIRST_SPLIT + 3 * BAND_COUNT; // 27
  out[last] = out[last - 1] + (highSlope < 0 ? highSlope / 3 : 0);
}

/** The 28 third-octave levels derived from 8 octave levels (see thirdOctavesFromOctavesInto). */
export function thirdOctavesFromOctaves(octaveDb: ArrayLike<number>): Float64Array {
  const out = new Float64Array(THIRD_OCTAVE_COUNT);
  thirdOctavesFromOctavesInto(octaveDb, out);
  return out;
}
