import { describe, expect, it } from "vitest";
import { bandGains, bandpassPower, burstMeanSquare, chordBandPower, MAX_BOOST_DB, OCTAVE_Q, sawtoothBandPower, whiteNoiseBandPower } from "@/lib/listen/source-power";

const SR = 48_000;
const db = (x: number) => 10 * Math.log10(x);

/** Band-pass biquad of the Audio EQ Cookbook (R. Bristow-Johnson), "BPF, constant 0 dB peak gain", run on samples. */
function cookbookBandpass(x: Float64Array, fc: number, q: number, sr: number): Float64Array {
  const w0 = (2 * Math.PI * fc) / sr;
  const alpha = Math.sin(w0) / (2 * q);
  const a0 = 1 + alpha;
  const b0 = alpha / a0, b2 = -alpha / a0, a1 = (-2 * Math.cos(w0)) / a0, a2 = (1 - alpha) / a0;
  const y = new Float64Array(x.length);
  let x1 = 0, x2 = 0, y1 = 0, y2 = 0;
  for (let i = 0; i < x.length; i++) {
    const v = b0 * x[i]! + b2 * x2 - a1 * y1 - a2 * y2;
    x2 = x1; x1 = x[i]!; y2 = y1; y1 = v; y[i] = v;
  }
  return y;
}
const meanSquare = (y: Float64Array, from: number) => {
  let s = 0;
  for (let i = from; i < y.length; i++) s += y[i]! * y[i]!;
  return s / (y.length - from);
};

describe("listen: source power per octave band", () => {
  it("an octave band-pass of Q = √2 is 3 dB down at the octave's edges fc/√2 and fc·√2 (Q = centre / −3 dB bandwidth; Audio EQ Cookbook)", () => {
    // At a 1 kHz centre the bilinear transform bends the edges by well under 0.1 dB at 48 kHz.
    expect(db(bandpassPower(1000, 1000, SR))).toBeCloseTo(0, 6);
    expect(db(bandpassPower(1000 * Math.SQRT2, 1000, SR, OCTAVE_Q))).toBeCloseTo(-3.01, 1);
    expect(db(bandpassPower(1000 / Math.SQRT2, 1000, SR, OCTAVE_Q))).toBeCloseTo(-3.01, 1);
  });

  it.each([250, 1000, 4000])("a 110 Hz sawtooth through the cookbook band-pass at %s Hz: the predicted power matches the filtered samples within 0.5 dB", (fc) => {
    const n = SR * 2;
    const x = new Float64Array(n);
    // A band-limited sawtooth, summed from its harmonics below Nyquist (as the Web Audio oscillator is).
    for (let k = 1; k * 110 < SR / 2; k++) {
      const a = 2 / (Math.PI * k);
      const w = (2 * Math.PI * k * 110) / SR;
      for (let i = 0; i < n; i++) x[i]! += a * Math.sin(w * i) * (k % 2 ? 1 : -1);
    }
    const measured = meanSquare(cookbookBandpass(x, fc, OCTAVE_Q, SR), SR / 2);
    expect(Math.abs(db(measured) - db(sawtoothBandPower(110, fc, SR)))).toBeLessThan(0.5);
  });

  it.each([125, 1000, 8000])("white noise of variance 1 through the cookbook band-pass at %s Hz: the predicted power matches within 0.5 dB", (fc) => {
    let seed = 7;
    const rand = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) * 2 - 1;
    const n = SR * 4;
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) x[i] = rand() * Math.sqrt(3); // uniform on ±√3: variance 1
    const measured = meanSquare(cookbookBandpass(x, fc, OCTAVE_Q, SR), 1000);
    expect(Math.abs(db(measured) - db(whiteNoiseBandPower(fc, SR)))).toBeLessThan(0.5);
  });

  it("a struck burst's mean square over a count matches the samples of e^(−t/τ) (τ = 0.1 s, count 0.5 s)", () => {
    const n = SR / 2;
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.exp((-2 * i) / SR / 0.1);
    expect(burstMeanSquare(0.1, 0.5)).toBeCloseTo(s / n, 4);
  });

  it("band gains bring the source to the target in each band, and never boost a band the source barely reaches by more than MAX_BOOST_DB", () => {
    const source = [1, 1, 1, 1, 1, 1, 0.5, 1e-9];
    const target = [-40, -40, -40, -40, -40, -40, -40, -40];
    const g = bandGains(target, source);
    expect(db(g[6]! ** 2 * source[6]!)).toBeCloseTo(-40, 6);
    // The 8 kHz band: taken at 30 dB under the strongest band, so boosted by 30 dB, not 90.
    expect(db(g[7]! ** 2)).toBeCloseTo(-40 + MAX_BOOST_DB, 6);
    expect(bandGains([-Infinity, ...target.slice(1)], source)[0]).toBe(0);
  });

  it("a chord's band powers: a C4 sawtooth puts most in the 250 Hz and 500 Hz octaves, nothing loud at 63 Hz", () => {
    const p = chordBandPower([261.63], 0, SR);
    expect(p[2]! + p[3]!).toBeGreaterThan(10 * p[0]!);
  });
});
