import { describe, expect, it } from "vitest";
import weightings from "a-weighting";
import { OCTAVE_BANDS, aWeightingDb } from "@/lib/acoustics";

// Exact base-10 octave centres 31.5 Hz … 8 kHz (IEC 61260-1:2014).
const EXACT = [31.623, ...OCTAVE_BANDS.map((b) => b.exactHz)];

describe("A-weighting, IEC 61672-1:2013", () => {
  it("matches Table 3 at octave centres within 0.05 dB at the exact frequencies (via python-acoustics acoustics/data/iec_61672_1_2013.csv)", () => {
    const table = [-39.4, -26.2, -16.1, -8.6, -3.2, 0.0, 1.2, 1.0, -1.1];
    EXACT.forEach((f, i) => expect(Math.abs(aWeightingDb(f) - table[i])).toBeLessThanOrEqual(0.05));
  });

  it("is 0 dB at 1 kHz (IEC 61672-1:2013 Annex E normalisation A1000 = −2.000 dB)", () => {
    expect(Math.abs(aWeightingDb(1000))).toBeLessThan(1e-3);
  });

  it("agrees with the npm package a-weighting 1.1.0 within 0.06 dB at the exact centres", () => {
    for (const f of EXACT) expect(Math.abs(aWeightingDb(f) - 20 * Math.log10(weightings.a(f)))).toBeLessThan(0.06);
  });

  it("differs from the nominal-frequency value by up to 0.13 dB, so exact centres matter (REFERENCES.md, IEC 61260-1)", () => {
    const gaps = OCTAVE_BANDS.map((b) => Math.abs(aWeightingDb(b.exactHz) - aWeightingDb(b.nominalHz)));
    expect(Math.max(...gaps)).toBeGreaterThan(0.05);
    expect(Math.max(...gaps)).toBeLessThan(0.14);
  });
});
