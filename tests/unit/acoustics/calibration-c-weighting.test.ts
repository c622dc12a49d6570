// C-weighting, for box readings taken in dBC.
import { describe, expect, it } from "vitest";
import weightings from "a-weighting";
import { OCTAVE_BANDS, cWeightingDb } from "@/lib/acoustics";

const EXACT = [31.623, ...OCTAVE_BANDS.map((b) => b.exactHz)];

describe("C-weighting, IEC 61672-1:2013", () => {
  it("matches Table 3 (C column) at octave centres 31.5 Hz … 8 kHz within 0.05 dB (via python-acoustics acoustics/weighting.py THIRD_OCTAVE_C_WEIGHTING)", () => {
    const table = [-3.0, -0.8, -0.2, 0.0, 0.0, 0.0, -0.2, -0.8, -3.0];
    EXACT.forEach((f, i) => expect(Math.abs(cWeightingDb(f) - table[i]!)).toBeLessThanOrEqual(0.05));
  });

  it("is 0 dB at 1 kHz and agrees with the npm package a-weighting 1.1.0 (its c curve) within 0.06 dB", () => {
    expect(Math.abs(cWeightingDb(1000))).toBeLessThan(1e-3);
    for (const f of EXACT) expect(Math.abs(cWeightingDb(f) - 20 * Math.log10(weightings.c(f)))).toBeLessThan(0.06);
  });

  it("rejects a frequency that is not positive", () => {
    expect(() => cWeightingDb(0)).toThrow(/frequencyHz/);
  });
});
