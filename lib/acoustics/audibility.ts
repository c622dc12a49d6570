// Whether a voice is audible at all over a masker (the rest of the band plus the background), per
// critical band. Method — the masked threshold of ISO/IEC 11172-3:1993 Annex D, psychoacoustic
// model 1, on the 20 approximated critical bands of ISO 532-1 (the three lowest gathered from their
// third-octaves, then one third-octave each):
//  - each masker's level in a band spreads to its neighbours by the slopes of Terhardt (1979) as
//    used in ITU-R BS.1387-1 (PEAQ): 27 dB per Bark downward, 24 + 230 Hz/f − 0.2·L dB per Bark
//    upward (flatter for louder maskers); contributions add as energies. (From memory; P. Kabal's
//    PEAQ implementation PQspreadCB.m shows the same constants.)
//  - the individual masking threshold lies below that spread level by the masking index of the
//    masker's kind (model 1, step 6): tonal maskers av_tm = −1.525 − 0.275·z − 4.5 dB, noise-like
//    maskers av_nm = −1.525 − 0.175·z − 0.5 dB. The tonal index is transcribed in
//    rajmic/declipping2020_codes Methods/l1_relaxation/masking2.m
//    @ 7170fbfe9149406221163fb576b58e81256f583c; the non-tonal one from memory of the same clause.
//    Winds, keyboards and the synth play harmonic tones and mask as tones; drums, cymbals and crowd
//    noise mask as noise. (Judging a whole band as noise — the earlier rule — put its threshold
//    4–6 dB too high and masked even a melody in front of it.)
//  - the global masked threshold is the energy sum of the individual thresholds (model 1, step 7),
//    never below the threshold in quiet, the level at which ISO 532-1 gives a band no loudness:
//    Table A.6 plus the ear's transmission (Table A.4), free field.
// A voice is heard when, in at least one critical band, its level exceeds the global threshold; its
// margin is the largest excess (dB). Simultaneous masking only: the rule knows nothing of rhythm,
// onsets or where players stand, which help a listener pick a voice out.
import {
  CORE_BAND_COUNT,
  CRITICAL_BAND_UPPER_BARK,
  EAR_TRANSMISSION_DB,
  LOW_CRITICAL_BANDS,
  THRESHOLD_QUIET_DB,
  thirdOctaveCentreHz as thirdCentreHz,
} from "./loudness-tables";

const CB = CORE_BAND_COUNT;
const LN10_10 = Math.LN10 / 10;
/** Lower spreading slope (dB per Bark), masker above the band. */
export const LOWER_SLOPE_DB_PER_BARK = 27;

/** Centre (Bark) of each approximated critical band: the middle of its limits. */
export const CRITICAL_BAND_CENTRE_BARK = Float64Array.from({ length: CB }, (_, i) => ((i === 0 ? 0 : CRITICAL_BAND_UPPER_BARK[i - 1]) + CRITICAL_BAND_UPPER_BARK[i]) / 2);

/** Centre frequency (Hz) of each approximated critical band: its third-octave's, or the geometric middle of a gathered group. */
const CRITICAL_BAND_CENTRE_HZ = Float64Array.from({ length: CB }, (_, i) =>
  i < LOW_CRITICAL_BANDS.length ? Math.sqrt(thirdCentreHz(LOW_CRITICAL_BANDS[i][0]) * thirdCentreHz(LOW_CRITICAL_BANDS[i][1] - 1)) : thirdCentreHz(i + 8),
);

/** Tonal (harmonic: winds, keyboards) or noise-like (drums, cymbals, crowd) masker. */
export type MaskerKind = "tonal" | "noise";

/** Masking index (dB) of a tonal or noise-like masker at a critical-band rate (ISO/IEC 11172-3 Annex D, model 1). */
// Stryker disable next-line StringLiteral: any default but "tonal" takes the noise-like index
export function maskingIndexDb(bark: number, kind: MaskerKind = "noise"): number {
  return kind === "tonal" ? -1.525 - 0.275 * bark - 4.5 : -1.525 - 0.175 * bark - 0.5;
}

/** Threshold in quiet (dB, third-octave or gathered band level) per approximated critical band. */
export const QUIET_THRESHOLD_DB = Float64Array.from({ length: CB }, (_, i) => THRESHOLD_QUIET_DB[i] + EAR_TRANSMISSION_DB[i]);

/** Writes the level (dB) of each of the 20 approximated critical bands of 28 third-octave levels into `out`. */
export function criticalBandLevelsInto(thirdOctaveDb: ArrayLike<number>, out: Float64Array): void {
  for (let i = 0; i < CB; i++) {
    if (i < LOW_CRITICAL_BANDS.length) {
      let e = 0;
      for (let t = LOW_CRITICAL_BANDS[i][0]; t < LOW_CRITICAL_BANDS[i][1]; t++) e += Math.exp(thirdOctaveDb[t] * LN10_10);
      out[i] = 10 * Math.log10(e);
    } else out[i] = thirdOctaveDb[i + 8];
  }
}

// Spread contributions below this level (dB SPL) are skipped: even all twenty of them together
// stay under the threshold in quiet, so no result changes.
const SPREAD_FLOOR_DB = -20;
// Downward spread as an energy factor per (band i, masker band j ≥ i): 10^(−2.7·(z_j − z_i)).
const LOWER_FACTOR = Float64Array.from({ length: CB * CB }, (_, k) => {
  const i = Math.floor(k / CB), j = k % CB;
  return j >= i ? Math.exp(-LOWER_SLOPE_DB_PER_BARK * (CRITICAL_BAND_CENTRE_BARK[j] - CRITICAL_BAND_CENTRE_BARK[i]) * LN10_10) : 0;
});
const MASKING_INDEX_DB: Record<MaskerKind, Float64Array> = {
  tonal: Float64Array.from(CRITICAL_BAND_CENTRE_BARK, (z) => maskingIndexDb(z, "tonal")),
  noise: Float64Array.from(CRITICAL_BAND_CENTRE_BARK, (z) => maskingIndexDb(z, "noise")),
};
const spreadEnergy = new Float64Array(CB);

/** Writes the masked threshold (dB) in each critical band of a masker of one kind, given by its critical-band levels, into `out`. */
export function maskedThresholdInto(maskerCbDb: ArrayLike<number>, out: Float64Array, kind: MaskerKind = "noise"): void {
  spreadEnergy.fill(0);
  for (let j = 0; j < CB; j++) {
    const l = maskerCbDb[j];
    if (!(l > -Infinity)) continue;
    const zj = CRITICAL_BAND_CENTRE_BARK[j];
    const ej = Math.exp(l * LN10_10);
    // Its own band and downward: 27 dB per Bark.
    for (let i = j; i >= 0 && l - LOWER_SLOPE_DB_PER_BARK * (zj - CRITICAL_BAND_CENTRE_BARK[i]) >= SPREAD_FLOOR_DB; i--) {
      spreadEnergy[i] += ej * LOWER_FACTOR[i * CB + j];
    }
    // Upward: 24 + 230 Hz/f − 0.2·L dB per Bark, never rising.
    let slope = 24 + 230 / CRITICAL_BAND_CENTRE_HZ[j] - 0.2 * l;
    if (slope < 0) slope = 0;
    for (let i = j + 1; i < CB; i++) {
      const level = l - slope * (CRITICAL_BAND_CENTRE_BARK[i] - zj);
      if (level < SPREAD_FLOOR_DB) break;
      spreadEnergy[i] += Math.exp(level * LN10_10);
    }
  }
  const index = MASKING_INDEX_DB[kind];
  for (let i = 0; i < CB; i++) out[i] = 10 * Math.log10(spreadEnergy[i]) + index[i];
}

const tonalThreshold = new Float64Array(CB);
const noiseThreshold = new Float64Array(CB);

/**
 * Writes the global masked threshold (dB) of a tonal and a noise-like masker heard together into
 * `out`: the energy sum of their individual thresholds (ISO/IEC 11172-3 Annex D, model 1, step 7).
 */
export function globalMaskedThresholdInto(tonalCbDb: ArrayLike<number>, noiseCbDb: ArrayLike<number>, out: Float64Array): void {
  maskedThresholdInto(tonalCbDb, tonalThreshold, "tonal");
  maskedThresholdInto(noiseCbDb, noiseThreshold, "noise");
  for (let i = 0; i < CB; i++) out[i] = 10 * Math.log10(Math.exp(tonalThreshold[i] * LN10_10) + Math.exp(noiseThreshold[i] * LN10_10));
}

export interface Audibility {
  heard: boolean;
  /** Largest excess (dB) of the voice over the masked threshold and the threshold in quiet, over the critical bands; −Infinity for silence. */
  marginDb: number;
  /** Index (0–19) of the approximated critical band where the margin is largest, −1 for silence. */
  band: number;
}

/**
 * Is a voice (its critical-band levels) audible over a masker's masked threshold (maskedThresholdInto)?
 * Heard when its level exceeds the masked threshold and the threshold in quiet in at least one band.
 */
export function audibility(voiceCbDb: ArrayLike<number>, maskedThresholdDb: ArrayLike<number>): Audibility {
  let marginDb = -Infinity;
  let band = -1;
  for (let i = 0; i < CB; i++) {
    const l = voiceCbDb[i];
    if (!(l > -Infinity)) continue;
    const masked = maskedThresholdDb[i];
    const threshold = masked > QUIET_THRESHOLD_DB[i] ? masked : QUIET_THRESHOLD_DB[i];
    if (l - threshold > marginDb) {
      marginDb = l - threshold;
      band = i;
    }
  }
  return { heard: marginDb > 0, marginDb, band };
}
