import { describe, expect, it } from "vitest";
import { equalisedLevels, fitEqualiser, sawtoothTones, sourcePoints } from "@/lib/listen/equaliser";
import { burstMeanSquare, OCTAVE_Q } from "@/lib/listen/source-power";
import { OCTAVE_CENTRES as CENTRES, octaveEnergies } from "../../support/octave-energies";

const SR = 48_000;
const db = (x: number) => 10 * Math.log10(x);

/** Peaking biquad of the Audio EQ Cookbook (R. Bristow-Johnson), "peakingEQ", run on samples. */
function cookbookPeaking(x: Float64Array, fc: number, q: number, gainDb: number): Float64Array {
  const A = 10 ** (gainDb / 40);
  const w0 = (2 * Math.PI * fc) / SR;
  const alpha = Math.sin(w0) / (2 * q);
  const a0 = 1 + alpha / A;
  const b0 = (1 + alpha * A) / a0, b1 = (-2 * Math.cos(w0)) / a0, b2 = (1 - alpha * A) / a0, a1 = (-2 * Math.cos(w0)) / a0, a2 = (1 - alpha / A) / a0;
  const y = new Float64Array(x.length);
  let x1 = 0, x2 = 0, y1 = 0, y2 = 0;
  for (let i = 0; i < x.length; i++) {
    const v = b0 * x[i]! + b1 * x1 + b2 * x2 - a1 * y1 - a2 * y2;
    x2 = x1; x1 = x[i]!; y2 = y1; y1 = v; y[i] = v;
  }
  return y;
}

describe("listen: the octave equaliser", () => {
  // A C5 E5 G5 chord of sawtooths with breath noise, as a soprano wind part sounds.
  const chord = [523.25, 659.26, 783.99];
  const target = [40, 50, 65, 75, 80, 78, 70, 60].map((l) => l - 110);
  const source = { tones: sawtoothTones(chord, SR), noiseVariance: 0.01 };

  it("the predicted octave levels match the equaliser run on samples (cookbook peaking biquads in cascade, FFT) within 0.5 dB, relative to 1 kHz", () => {
    const points = sourcePoints(source, SR);
    const eq = fitEqualiser(target, points, SR);
    const n = 65_536 + SR / 4;
    let x: Float64Array = new Float64Array(n);
    for (const t of source.tones) {
      const a = Math.sqrt(2 * t.power);
      const w = (2 * Math.PI * t.hz) / SR;
      for (let i = 0; i < n; i++) x[i]! += a * Math.sin(w * i);
    }
    let seed = 3;
    for (let i = 0; i < n; i++) {
      seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
      x[i]! += ((seed / 4294967296) * 2 - 1) * Math.sqrt(3) * 0.1; // variance 0.01
    }
    CENTRES.forEach((fc, b) => (x = cookbookPeaking(x, fc, OCTAVE_Q, eq.bandDb[b]!)));
    const measured = octaveEnergies(x, SR / 4, SR);
    const predicted = equalisedLevels(points, eq, SR);
    for (const k of [3, 4, 5, 6, 7]) expect(Math.abs(db(measured[k]! / measured[4]!) - (predicted[k]! - predicted[4]!))).toBeLessThan(0.5);
  });

  it("the fitted equaliser gives each octave the chord reaches its level within 0.1 dB", () => {
    const points = sourcePoints(source, SR);
    const out = equalisedLevels(points, fitEqualiser(target, points, SR), SR);
    for (const k of [3, 4, 5, 6, 7]) expect(Math.abs(out[k]! - target[k]!)).toBeLessThan(0.1);
  });

  it("octaves under the chord's lowest note are left alone (0 dB), and a part with no level is silent", () => {
    const points = sourcePoints({ tones: sawtoothTones(chord, SR), noiseVariance: 0 }, SR);
    const eq = fitEqualiser(target, points, SR);
    expect(eq.bandDb.slice(0, 3)).toEqual([0, 0, 0]);
    expect(fitEqualiser(new Array(8).fill(-Infinity), points, SR).flatDb).toBe(-Infinity);
  });

  it("a struck burst's mean square over a count matches the samples of e^(−t/τ) (τ = 0.1 s, count 0.5 s)", () => {
    const n = SR / 2;
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.exp((-2 * i) / SR / 0.1);
    expect(burstMeanSquare(0.1, 0.5)).toBeCloseTo(s / n, 4);
  });
});
