// Octave bands of the model. Labels are the nominal frequencies; computation uses the exact
// base-10 centres fm = 1000·10^(3k/10) Hz of IEC 61260-1:2014, as the ISO 9613 and IEC 61672
// tables do (the nominal values move A-weighting by up to 0.13 dB).

export interface OctaveBand {
  nominalHz: number;
  exactHz: number;
}

const NOMINAL_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

/** Octave bands 63 Hz … 8 kHz: nominal label and exact IEC 61260-1 centre. */
export const OCTAVE_BANDS: readonly OctaveBand[] = Object.freeze(
  NOMINAL_HZ.map((nominalHz, i) => Object.freeze({ nominalHz, exactHz: 1000 * 10 ** ((3 * (i - 4)) / 10) })),
);

/** Number of octave bands every band table holds. */
export const BAND_COUNT = OCTAVE_BANDS.length;

/** Index of the octave band whose centre is nearest (on a log scale) to a frequency. */
export function nearestBandIndex(frequencyHz: number): number {
  let best = 0;
  let bestGap = Infinity;
  for (let i = 0; i < BAND_COUNT; i++) {
    const gap = Math.abs(Math.log(frequencyHz / OCTAVE_BANDS[i].exactHz));
    // Stryker disable next-line EqualityOperator: exactly between two centres, either band is as near
    if (gap < bestGap) {
      bestGap = gap;
      best = i;
    }
  }
  return best;
}
