// The octave equaliser that shapes a part's source to its band levels at the listening point: a flat gain
// and eight peaking filters in cascade, one per octave (a graphic equaliser). Neighbouring filters overlap,
// so their gains are fitted: the output level in each octave is computed from the source's tones and noise
// through the whole cascade, and the gains are corrected until it matches.
import { OCTAVE_BANDS } from "@/lib/acoustics/bands";
import { OCTAVE_Q } from "./source-power";

/** What feeds a part's equaliser: steady tones (frequency, mean square) and white noise of a variance. */
export interface SourceSpectrum {
  tones: { hz: number; power: number }[];
  noiseVariance: number;
}

/** The harmonics below Nyquist of band-limited sawtooths of peak 1 (amplitude 2/(πn): the sawtooth's Fourier series). */
export function sawtoothTones(fundamentalsHz: readonly number[], sampleRate: number): SourceSpectrum["tones"] {
  return fundamentalsHz.flatMap((f0) => {
    const out: SourceSpectrum["tones"] = [];
    for (let n = 1; n * f0 < sampleRate / 2; n++) out.push({ hz: n * f0, power: (2 / (Math.PI * n)) ** 2 / 2 });
    return out;
  });
}

/**
 * Power gain |H(f)|² of the Web Audio BiquadFilterNode "peaking" (W3C Web Audio API 1.0; the Audio EQ
 * Cookbook's peakingEQ) with centre fc, quality q and gain gainDb, at f.
 */
export function peakingPower(f: number, fc: number, gainDb: number, sampleRate: number, q = OCTAVE_Q): number {
  const A = 10 ** (gainDb / 40);
  const w0 = (2 * Math.PI * fc) / sampleRate;
  const alpha = Math.sin(w0) / (2 * q);
  const c0 = Math.cos(w0);
  const [b0, b1, b2, a0, a1, a2] = [1 + alpha * A, -2 * c0, 1 - alpha * A, 1 + alpha / A, -2 * c0, 1 - alpha / A];
  const w = (2 * Math.PI * f) / sampleRate;
  const c1 = Math.cos(w), s1 = Math.sin(w), c2 = Math.cos(2 * w), s2 = Math.sin(2 * w);
  const nr = b0 + b1 * c1 + b2 * c2, ni = -b1 * s1 - b2 * s2;
  const dr = a0 + a1 * c1 + a2 * c2, di = -a1 * s1 - a2 * s2;
  return (nr * nr + ni * ni) / (dr * dr + di * di);
}

/** Noise points per octave where the noise's share is summed. */
const NOISE_STEPS = 24;

/** The frequency points of a source in each octave (edges fm·2^(∓1/2), IEC 61260-1 base 2) with their mean square. */
export function sourcePoints(source: SourceSpectrum, sampleRate: number): { hz: number; power: number }[][] {
  return OCTAVE_BANDS.map(({ exactHz }) => {
    const lo = exactHz / Math.SQRT2;
    const hi = Math.min(exactHz * Math.SQRT2, sampleRate / 2);
    const points = source.tones.filter((t) => t.hz >= lo && t.hz < hi);
    if (source.noiseVariance > 0) {
      // White noise of variance σ² spreads σ² evenly over 0 … Nyquist.
      const df = (hi - lo) / NOISE_STEPS;
      for (let i = 0; i < NOISE_STEPS; i++) points.push({ hz: lo + (i + 0.5) * df, power: (source.noiseVariance * df) / (sampleRate / 2) });
    }
    return points;
  });
}

export interface Equaliser {
  /** The flat gain (dB) before the peaking filters. */
  flatDb: number;
  /** The peaking filters' gains (dB), one per octave. */
  bandDb: number[];
}

/** Output level (dB) in each octave of a source through an equaliser. */
export function equalisedLevels(points: readonly (readonly { hz: number; power: number }[])[], eq: Equaliser, sampleRate: number): number[] {
  return points.map((ps) => {
    let e = 0;
    for (const p of ps) {
      let h = 1;
      for (let b = 0; b < OCTAVE_BANDS.length; b++) h *= peakingPower(p.hz, OCTAVE_BANDS[b]!.exactHz, eq.bandDb[b]!, sampleRate);
      e += p.power * h;
    }
    return 10 * Math.log10(e * 10 ** (eq.flatDb / 10));
  });
}

/** How far under its strongest octave (dB) a source may be in an octave that is still fitted; an octave it cannot reach is left as it falls. */
export const MAX_BOOST_DB = 30;
/** Range of a peaking filter's gain (dB). */
export const BAND_RANGE_DB = 40;

/**
 * The equaliser that gives each octave the source reaches the level levelDb (dB re full scale): each step moves
 * the flat gain by the mean error of those octaves and each filter by its octave's error from that mean.
 * Octaves the source cannot reach, or with no level, keep a filter of 0 dB; a part with no level anywhere is silent.
 */
export function fitEqualiser(levelDb: readonly number[], points: readonly (readonly { hz: number; power: number }[])[], sampleRate: number, steps = 16): Equaliser {
  const own = points.map((ps) => ps.reduce((s, p) => s + p.power, 0));
  const top = Math.max(...own);
  const fitted = own.map((e, b) => levelDb[b]! > -Infinity && e > 0 && e >= top * 10 ** (-MAX_BOOST_DB / 10));
  const eq: Equaliser = { flatDb: -Infinity, bandDb: levelDb.map(() => 0) };
  if (!fitted.some(Boolean)) return eq;
  eq.flatDb = 0;
  for (let s = 0; s < steps; s++) {
    const out = equalisedLevels(points, eq, sampleRate);
    const errors = out.map((l, b) => (fitted[b] ? levelDb[b]! - l : 0));
    const n = fitted.filter(Boolean).length;
    const mean = errors.reduce((a, e) => a + e, 0) / n;
    eq.flatDb += mean;
    eq.bandDb = eq.bandDb.map((g, b) => (fitted[b] ? Math.max(-BAND_RANGE_DB, Math.min(BAND_RANGE_DB, g + 0.8 * (errors[b]! - mean))) : g));
  }
  return eq;
}
