// Tables of ISO 532-1:2017 (Zwicker method, stationary signals), Annex A, as numbers only.
// Transcribed from two independent public copies of the standard's annex program, which
// agree value for value:
//   ggrecow/SQAT psychoacoustic_metrics/Loudness_ISO532_1/Loudness_ISO532_1.m
//     @ 069dc3217202839d8b7c363e52bcc082ec6d6478 (tables A.3–A.9, named there)
//   Eomys/MoSQITo mosqito/sq_metrics/loudness/loudness_zwst/_main_loudness.py
//     @ 051e5d01e494d8b7545994bd22bdea65bcb88880 and _calc_slopes.py
//     @ 4e06d201640e763b30ba609b2ab23450eb315fa1
// (both cite Zwicker & Fastl, "Program for calculating loudness according to DIN 45631
// (ISO 532 B)", J. Acoust. Soc. Jpn (E) 12(1), 1991, and the C program of ISO 532-1:2017 Annex A).

/** Number of third-octave bands the method takes: 25 Hz … 12.5 kHz. */
export const THIRD_OCTAVE_COUNT = 28;

/** Nominal third-octave centres 25 Hz … 12.5 kHz (IEC 61260-1 nominal values). */
export const THIRD_OCTAVE_NOMINAL_HZ: readonly number[] = Object.freeze([
  25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000,
  5000, 6300, 8000, 10000, 12500,
]);

/** Exact base-10 centre (Hz) of third-octave i of 25 Hz … 12.5 kHz (IEC 61260-1: 1000·10^((i − 16)/10)). */
export function thirdOctaveCentreHz(i: number): number {
  return 1000 * 10 ** ((i - 16) / 10);
}

/** Table A.3 (RAP): upper ends of the level ranges (dB) for the low-frequency correction. */
export const LF_RANGE_DB = Float64Array.of(45, 55, 65, 71, 80, 90, 100, 120);

/**
 * Table A.3 (DLL): level reduction (dB) of the 11 third-octave bands 25–250 Hz per range of
 * LF_RANGE_DB, equal-loudness contours of ISO 226:1987. Row = range, column = band.
 */
export const LF_REDUCTION_DB: readonly Float64Array[] = [
  Float64Array.of(-32, -24, -16, -10, -5, 0, -7, -3, 0, -2, 0),
  Float64Array.of(-29, -22, -15, -10, -4, 0, -7, -2, 0, -2, 0),
  Float64Array.of(-27, -19, -14, -9, -4, 0, -6, -2, 0, -2, 0),
  Float64Array.of(-25, -17, -12, -9, -3, 0, -5, -2, 0, -2, 0),
  Float64Array.of(-23, -16, -11, -7, -3, 0, -4, -1, 0, -1, 0),
  Float64Array.of(-20, -14, -10, -6, -3, 0, -4, -1, 0, -1, 0),
  Float64Array.of(-18, -12, -9, -6, -2, 0, -3, -1, 0, -1, 0),
  Float64Array.of(-15, -10, -8, -4, -2, 0, -3, -1, 0, -1, 0),
];

/** Third-octave bands (first index, one past last) summed into the three lowest critical bands. */
export const LOW_CRITICAL_BANDS: readonly (readonly [number, number])[] = [
  [0, 6], // 25–80 Hz
  [6, 9], // 100–160 Hz
  [9, 11], // 200–250 Hz
];

/** Number of approximated critical bands with a core loudness (the 21st, 23.6–24 Bark, is 0). */
export const CORE_BAND_COUNT = 20;

/** Table A.4 (A0): transmission of the outer and middle ear per critical band (dB). */
export const EAR_TRANSMISSION_DB = Float64Array.of(0, 0, 0, 0, 0, 0, 0, 0, 0, 0, -0.5, -1.6, -3.2, -5.4, -5.6, -4, -1.5, 2, 5, 12);

/** Table A.5 (DDF): level difference diffuse minus free field per critical band (dB). */
export const DIFFUSE_FIELD_DB = Float64Array.of(0, 0, 0.5, 0.9, 1.2, 1.6, 2.3, 2.8, 3, 2, 0, -1.4, -2, -1.9, -1, 0.5, 3, 4, 4.3, 4);

/** Table A.6 (LTQ): critical-band level at the threshold in quiet, without the ear's transmission (dB). */
export const THRESHOLD_QUIET_DB = Float64Array.of(30, 18, 12, 8, 7, 6, 5, 4, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3);

/** Table A.7 (DCB): third-octave to critical-band level adaptation per critical band (dB). */
export const CRITICAL_BAND_ADAPTATION_DB = Float64Array.of(
  -0.25, -0.6, -0.8, -0.8, -0.5, 0, 0.5, 1.1, 1.5, 1.7, 1.8, 1.8, 1.7, 1.6, 1.4, 1.2, 0.8, 0.5, 0, -0.5,
);

/** Table A.8 (ZUP): upper limits (Bark) of the 21 approximated critical bands. */
export const CRITICAL_BAND_UPPER_BARK = Float64Array.of(
  0.9, 1.8, 2.8, 3.5, 4.4, 5.4, 6.6, 7.9, 9.2, 10.6, 12.3, 13.8, 15.2, 16.7, 18.1, 19.3, 20.6, 21.8, 22.7, 23.6, 24,
);

/** Table A.9 (RNS): specific-loudness ranges (sone/Bark) that select the steepness of an upper slope. */
export const SLOPE_RANGE_SONE = Float64Array.of(
  21.5, 18, 15.1, 11.5, 9, 6.1, 4.4, 3.1, 2.13, 1.36, 0.82, 0.42, 0.3, 0.22, 0.15, 0.1, 0.035, 0,
);

/**
 * Table A.9 (USL): steepness (sone/Bark per Bark) of the upper slopes, row = range of
 * SLOPE_RANGE_SONE, column = the masking critical band (columns past the 8th repeat the 8th).
 */
export const UPPER_SLOPE: readonly Float64Array[] = [
  Float64Array.of(13, 8.2, 6.3, 5.5, 5.5, 5.5, 5.5, 5.5),
  Float64Array.of(9, 7.5, 6, 5.1, 4.5, 4.5, 4.5, 4.5),
  Float64Array.of(7.8, 6.7, 5.6, 4.9, 4.4, 3.9, 3.9, 3.9),
  Float64Array.of(6.2, 5.4, 4.6, 4.0, 3.5, 3.2, 3.2, 3.2),
  Float64Array.of(4.5, 3.8, 3.6, 3.2, 2.9, 2.7, 2.7, 2.7),
  Float64Array.of(3.7, 3.0, 2.8, 2.35, 2.2, 2.2, 2.2, 2.2),
  Float64Array.of(2.9, 2.3, 2.1, 1.9, 1.8, 1.7, 1.7, 1.7),
  Float64Array.of(2.4, 1.7, 1.5, 1.35, 1.3, 1.3, 1.3, 1.3),
  Float64Array.of(1.95, 1.45, 1.3, 1.15, 1.1, 1.1, 1.1, 1.1),
  Float64Array.of(1.5, 1.2, 0.94, 0.86, 0.82, 0.82, 0.82, 0.82),
  Float64Array.of(0.72, 0.67, 0.64, 0.63, 0.62, 0.62, 0.62, 0.62),
  Float64Array.of(0.59, 0.53, 0.51, 0.5, 0.42, 0.42, 0.42, 0.42),
  Float64Array.of(0.4, 0.33, 0.26, 0.24, 0.24, 0.22, 0.22, 0.22),
  Float64Array.of(0.27, 0.21, 0.2, 0.18, 0.17, 0.17, 0.17, 0.17),
  Float64Array.of(0.16, 0.15, 0.14, 0.12, 0.11, 0.11, 0.11, 0.11),
  Float64Array.of(0.12, 0.11, 0.1, 0.08, 0.08, 0.08, 0.08, 0.08),
  Float64Array.of(0.09, 0.08, 0.07, 0.06, 0.06, 0.06, 0.06, 0.05),
  Float64Array.of(0.06, 0.05, 0.03, 0.02, 0.02, 0.02, 0.02, 0.02),
];
