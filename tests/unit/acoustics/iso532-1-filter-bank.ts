// The third-octave filter bank of ISO 532-1:2017 Annex A (Tables A.1 and A.2, 48 kHz), used only
// to turn the standard's pure-tone test signals (Annex B.3) into the 28 band levels its own
// program measures, so the published loudness of those signals can be checked here.
// Source of the coefficients: ggrecow/SQAT psychoacoustic_metrics/Loudness_ISO532_1/Loudness_ISO532_1.m
// @ 069dc3217202839d8b7c363e52bcc082ec6d6478 ("filter 'a' coefficient offsets TABLES A.1 A.2",
// "filter gains"). Each band is three biquads: numerators [1,2,1], [1,0,-1], [1,-2,1]; denominators
// [1,-2,1] minus the offsets [0, a1, a2] below; times the band's gain.

const SAMPLE_RATE_HZ = 48000;

// Per band (25 Hz … 12.5 kHz): the offsets [a1, a2] of its three sections.
const OFFSETS: readonly (readonly [number, number])[][] = [
  [[-6.70260e-4, 6.59453e-4], [-3.75071e-4, 3.61926e-4], [-3.06523e-4, 2.97634e-4]],
  [[-8.47258e-4, 8.30131e-4], [-4.76448e-4, 4.55616e-4], [-3.88773e-4, 3.74685e-4]],
  [[-1.07210e-3, 1.04496e-3], [-6.06567e-4, 5.73553e-4], [-4.94004e-4, 4.71677e-4]],
  [[-1.35836e-3, 1.31535e-3], [-7.74327e-4, 7.22007e-4], [-6.29154e-4, 5.93771e-4]],
  [[-1.72380e-3, 1.65564e-3], [-9.91780e-4, 9.08866e-4], [-8.03529e-4, 7.47455e-4]],
  [[-2.19188e-3, 2.08388e-3], [-1.27545e-3, 1.14406e-3], [-1.02976e-3, 9.40900e-4]],
  [[-2.79386e-3, 2.62274e-3], [-1.64828e-3, 1.44006e-3], [-1.32520e-3, 1.18438e-3]],
  [[-3.57182e-3, 3.30071e-3], [-2.14252e-3, 1.81258e-3], [-1.71397e-3, 1.49082e-3]],
  [[-4.58305e-3, 4.15355e-3], [-2.80413e-3, 2.28135e-3], [-2.23006e-3, 1.87646e-3]],
  [[-5.90655e-3, 5.22622e-3], [-3.69947e-3, 2.87118e-3], [-2.92205e-3, 2.36178e-3]],
  [[-7.65243e-3, 6.57493e-3], [-4.92540e-3, 3.61318e-3], [-3.86007e-3, 2.97240e-3]],
  [[-1.00023e-2, 8.29610e-3], [-6.63788e-3, 4.55999e-3], [-5.15982e-3, 3.75306e-3]],
  [[-1.31230e-2, 1.04220e-2], [-9.02274e-3, 5.73132e-3], [-6.94543e-3, 4.71734e-3]],
  [[-1.73693e-2, 1.30947e-2], [-1.24176e-2, 7.20526e-3], [-9.46002e-3, 5.93145e-3]],
  [[-2.31934e-2, 1.64308e-2], [-1.73009e-2, 9.04761e-3], [-1.30358e-2, 7.44926e-3]],
  [[-3.13292e-2, 2.06370e-2], [-2.44342e-2, 1.13731e-2], [-1.82108e-2, 9.36778e-3]],
  [[-4.28261e-2, 2.59325e-2], [-3.49619e-2, 1.43046e-2], [-2.57855e-2, 1.17912e-2]],
  [[-5.91733e-2, 3.25054e-2], [-5.06072e-2, 1.79513e-2], [-3.69401e-2, 1.48094e-2]],
  [[-8.26348e-2, 4.05894e-2], [-7.40348e-2, 2.24476e-2], [-5.34977e-2, 1.85371e-2]],
  [[-1.17018e-1, 5.08116e-2], [-1.09516e-1, 2.81387e-2], [-7.85097e-2, 2.32872e-2]],
  [[-1.67714e-1, 6.37872e-2], [-1.63378e-1, 3.53729e-2], [-1.16419e-1, 2.93723e-2]],
  [[-2.42528e-1, 7.98576e-2], [-2.45161e-1, 4.43370e-2], [-1.73972e-1, 3.70015e-2]],
  [[-3.53142e-1, 9.96330e-2], [-3.69163e-1, 5.53535e-2], [-2.61399e-1, 4.65428e-2]],
  [[-5.16316e-1, 1.24177e-1], [-5.55473e-1, 6.89403e-2], [-3.93998e-1, 5.86715e-2]],
  [[-7.56635e-1, 1.55023e-1], [-8.34281e-1, 8.58123e-2], [-5.94547e-1, 7.43960e-2]],
  [[-1.10165e0, 1.91713e-1], [-1.23939e0, 1.05243e-1], [-8.91666e-1, 9.40354e-2]],
  [[-1.58477e0, 2.39049e-1], [-1.80505e0, 1.28794e-1], [-1.32500e0, 1.21333e-1]],
  [[-2.50630e0, 1.42308e-1], [-2.19464e0, 2.76470e-1], [-1.90231e0, 1.47304e-1]],
];

const GAINS = [
  4.30764e-11, 8.5934e-11, 1.71424e-10, 3.41944e-10, 6.82035e-10, 1.36026e-9, 2.71261e-9, 5.4087e-9, 1.07826e-8, 2.1491e-8,
  4.28228e-8, 8.54316e-8, 1.70009e-7, 3.38215e-7, 6.7199e-7, 1.33531e-6, 2.65172e-6, 5.25477e-6, 1.0378e-5, 2.0487e-5,
  4.05198e-5, 7.97914e-5, 1.56511e-4, 3.04954e-4, 5.99157e-4, 1.16544e-3, 2.27488e-3, 3.91006e-3,
];

const NUMERATORS = [
  [1, 2, 1],
  [1, 0, -1],
  [1, -2, 1],
] as const;

/** Power gain |H(f)|² of one second-order section at z = e^{jω}. */
function sectionPower(b: readonly number[], a: readonly number[], w: number): number {
  const re = (c: readonly number[]) => c[0] + c[1] * Math.cos(w) + c[2] * Math.cos(2 * w);
  const im = (c: readonly number[]) => -(c[1] * Math.sin(w) + c[2] * Math.sin(2 * w));
  return (re(b) ** 2 + im(b) ** 2) / (re(a) ** 2 + im(a) ** 2);
}

/** Gain (dB) of third-octave band `band` (0 = 25 Hz) of the standard's filter bank at a frequency. */
export function filterGainDb(band: number, frequencyHz: number): number {
  const w = (2 * Math.PI * frequencyHz) / SAMPLE_RATE_HZ;
  let power = GAINS[band] ** 2;
  for (let s = 0; s < 3; s++) {
    const [a1, a2] = OFFSETS[band][s];
    power *= sectionPower(NUMERATORS[s], [1, -2 - a1, 1 - a2], w);
  }
  return 10 * Math.log10(power);
}

/** The 28 band levels the standard's filter bank measures for a steady sine of `levelDb` at `frequencyHz`. */
export function sineThirdOctaveLevels(frequencyHz: number, levelDb: number): number[] {
  return Array.from({ length: 28 }, (_, band) => levelDb + filterGainDb(band, frequencyHz));
}
