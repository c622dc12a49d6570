import { describe, expect, it } from "vitest";
import { BAND_COUNT, OCTAVE_BANDS, nearestBandIndex } from "@/lib/acoustics";

describe("octave bands", () => {
  it("uses the exact base-10 centres of IEC 61260-1:2014 (fm = 1000·10^(3k/10))", () => {
    // IEC 61260-1:2014 exact centres, as listed in REFERENCES.md
    const exact = [63.096, 125.893, 251.189, 501.187, 1000, 1995.262, 3981.072, 7943.282];
    expect(OCTAVE_BANDS.map((b) => b.nominalHz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
    OCTAVE_BANDS.forEach((b, i) => expect(b.exactHz).toBeCloseTo(exact[i], 2));
    expect(BAND_COUNT).toBe(8);
  });

  it("has neighbouring centres an octave apart: ratio 10^0.3 (IEC 61260-1:2014, base-10 system)", () => {
    for (let i = 1; i < BAND_COUNT; i++) {
      expect(OCTAVE_BANDS[i].exactHz / OCTAVE_BANDS[i - 1].exactHz).toBeCloseTo(10 ** 0.3, 10);
    }
  });

  it("maps a frequency to the nearest band on a log scale", () => {
    expect(nearestBandIndex(63)).toBe(0);
    expect(nearestBandIndex(1000)).toBe(4);
    expect(nearestBandIndex(2800)).toBe(5);
    expect(nearestBandIndex(20000)).toBe(7);
  });
});
