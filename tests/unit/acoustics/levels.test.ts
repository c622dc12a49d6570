import { describe, expect, it } from "vitest";
import { divergenceDb, sumLevelsDb } from "@/lib/acoustics";

const FT = 0.3048;

describe("level addition", () => {
  it("90 dB ⊕ 90 dB = 93 dB (Davis & Patronis, Sound System Engineering 3rd ed., §2.15)", () => {
    expect(Math.abs(sumLevelsDb([90, 90]) - 93)).toBeLessThan(0.02);
  });
  it("90 ⊕ 96 = 96.97 dB (Davis & Patronis §2.15)", () => {
    expect(sumLevelsDb([90, 96])).toBeCloseTo(96.97, 2);
  });
  it("N equal incoherent sources add 10·log10 N (Davis & Patronis §2.15)", () => {
    for (const n of [2, 3, 10, 70]) expect(sumLevelsDb(Array(n).fill(80)) - 80).toBeCloseTo(10 * Math.log10(n), 9);
  });
  it("is -Infinity for no levels, and silent members add nothing", () => {
    expect(sumLevelsDb([])).toBe(-Infinity);
    expect(sumLevelsDb([-Infinity, 72])).toBeCloseTo(72, 9);
  });
});

describe("spherical divergence, ISO 9613-2:1996 eq. (7)", () => {
  it("is 51.0 dB at 100 m (20·lg(d/1 m) + 11)", () => {
    expect(divergenceDb(100)).toBeCloseTo(51.0, 9);
  });
  it("drops 6.0206 dB per doubling of distance (inverse-square law, REFERENCES.md)", () => {
    expect(divergenceDb(80) - divergenceDb(40)).toBeCloseTo(6.0206, 4);
  });
  it("takes 80 dB at 10 ft to 76.5 dB at 15 ft and 83.1 dB at 7 ft (Everest & Pohlmann, Master Handbook of Acoustics, ch. 3)", () => {
    const at = (ft: number) => 80 - (divergenceDb(ft * FT) - divergenceDb(10 * FT));
    expect(Math.abs(at(15) - 76.5)).toBeLessThan(0.05);
    expect(Math.abs(at(7) - 83.1)).toBeLessThan(0.05);
  });
  it("gives Lp = Lw − 20·lg r − 11 in free field: Lw 100 dB → 69 dB at 10 m (Davis & Patronis; ISO 9613-2)", () => {
    expect(100 - divergenceDb(10)).toBeCloseTo(69, 9);
  });
});
