// How much of each synthesized source falls in each octave band of the filter bank: the band gains
// divide it out so the bank's output follows the part's octave-band levels at the listening point.
import { OCTAVE_BANDS } from "@/lib/acoustics/bands";

/** Q of a second-order band-pass one octave wide (Q = √2 / (2 − 1)). */
export const OCTAVE_Q = Math.SQRT2;

/**
 * Coefficients [b0, b2, a1, a2] (b1 = 0, all over a0) of the Web Audio BiquadFilterNode "bandpass"
 * (W3C Web Audio API 1.0, BiquadFilterNode; the Audio EQ Cookbook's constant 0 dB peak band-pass),
 * centre fc and quality q at a sample rate.
 */
export function bandpassCoefficients(fc: number, q: number, sampleRate: number): [number, number, number, number] {
  const w0 = (2 * Math.PI * fc) / sampleRate;
  const alpha = Math.sin(w0) / (2 * q);
  const a0 = 1 + alpha;
  return [alpha / a0, -alpha / a0, (-2 * Math.cos(w0)) / a0, (1 - alpha) / a0];
}

/** Power gain |H(f)|² of that band-pass at frequency f (1 at fc). */
export function bandpassPower(f: number, fc: number, sampleRate: number, q = OCTAVE_Q): number {
  const [b0, b2, a1, a2] = bandpassCoefficients(fc, q, sampleRate);
  const w = (2 * Math.PI * f) / sampleRate;
  // H(e^jw) = (b0 + b2 e^−2jw) / (1 + a1 e^−jw + a2 e^−2jw)
  const numRe = b0 + b2 * Math.cos(2 * w);
  const numIm = -b2 * Math.sin(2 * w);
  const denRe = 1 + a1 * Math.cos(w) + a2 * Math.cos(2 * w);
  const denIm = -a1 * Math.sin(w) - a2 * Math.sin(2 * w);
  return (numRe * numRe + numIm * numIm) / (denRe * denRe + denIm * denIm);
}

/**
 * Mean square, after the band-pass at fc, of a band-limited sawtooth of peak 1 at f0: its harmonics n·f0
 * below Nyquist carry amplitude 2/(πn) (the Fourier series of a sawtooth; the Web Audio oscillator is band-limited).
 */
export function sawtoothBandPower(f0: number, fc: number, sampleRate: number): number {
  let sum = 0;
  for (let n = 1; n * f0 < sampleRate / 2; n++) {
    const a = 2 / (Math.PI * n);
    sum += ((a * a) / 2) * bandpassPower(n * f0, fc, sampleRate);
  }
  return sum;
}

/** Mean square, after the band-pass at fc, of white noise of variance 1: the energy of the filter's impulse response. */
export function whiteNoiseBandPower(fc: number, sampleRate: number): number {
  const [b0, b2, a1, a2] = bandpassCoefficients(fc, OCTAVE_Q, sampleRate);
  let y1 = 0, y2 = 0, sum = 0;
  for (let n = 0; n < 1_000_000; n++) {
    const x = n === 0 ? 1 : 0;
    const x2 = n === 2 ? 1 : 0;
    const y = b0 * x + b2 * x2 - a1 * y1 - a2 * y2;
    sum += y * y;
    y2 = y1;
    y1 = y;
    if (n > 2 && Math.abs(y1) + Math.abs(y2) < 1e-12) break;
  }
  return sum;
}

/** How far under the strongest band (dB) a band's source power is taken to be at least: a band the source barely reaches is not boosted past this. */
export const MAX_BOOST_DB = 30;

/**
 * Linear gains of the 8 bands that turn a source of band powers `sourcePower` into band energies
 * 10^(levelDb/10) (full-scale units): √(target / source), a silent band 0.
 */
export function bandGains(levelDb: readonly number[], sourcePower: readonly number[]): number[] {
  const top = Math.max(...sourcePower);
  const floor = top * 10 ** (-MAX_BOOST_DB / 10);
  return levelDb.map((l, b) => (l > -Infinity && top > 0 ? Math.sqrt(10 ** (l / 10) / Math.max(sourcePower[b]!, floor)) : 0));
}

/** Band powers of a chord of sawtooths (peak 1 each) plus white noise of variance `noiseVariance`. */
export function chordBandPower(frequencies: readonly number[], noiseVariance: number, sampleRate: number): number[] {
  return OCTAVE_BANDS.map(({ exactHz }) => frequencies.reduce((s, f) => s + sawtoothBandPower(f, exactHz, sampleRate), 0) + noiseVariance * whiteNoiseBandPower(exactHz, sampleRate));
}

/** Mean square over one count of `countSeconds` of a burst e^(−t/τ) of variance-1 noise struck at its start. */
export function burstMeanSquare(decaySeconds: number, countSeconds: number): number {
  return ((decaySeconds / 2) * (1 - Math.exp((-2 * countSeconds) / decaySeconds))) / countSeconds;
}
