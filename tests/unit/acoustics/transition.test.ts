import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { facingBetweenDeg, positionsAtCount } from "@/lib/acoustics";

const from = [
  { performerId: "T1", x: 0, y: 10, facingDeg: 350 },
  { performerId: "T2", x: -10, y: 5, facingDeg: 90 },
];
const to = [
  { performerId: "T2", x: 6, y: 13, facingDeg: 270 },
  { performerId: "T1", x: 8, y: 18, facingDeg: 10 },
];

describe("transitions between sets", () => {
  it("moves in straight lines at an even step", () => {
    const mid = positionsAtCount(from, to, 4, 8);
    expect(mid[0]).toMatchObject({ performerId: "T1" });
    expect(mid[0].x).toBeCloseTo(4, 12);
    expect(mid[0].y).toBeCloseTo(14, 12);
    expect(mid[1].x).toBeCloseTo(-2, 12);
    const quarter = positionsAtCount(from, to, 2, 8);
    expect(quarter[1].y).toBeCloseTo(7, 12);
  });

  it("turns the short way: 350° → 10° passes 0°, not 180°", () => {
    expect(positionsAtCount(from, to, 4, 8)[0].facingDeg).toBeCloseTo(0, 9);
    expect(facingBetweenDeg(350, 10, 0.25)).toBeCloseTo(355, 9);
    expect(facingBetweenDeg(10, 350, 0.5)).toBeCloseTo(0, 9);
  });

  it("starts at the first set and ends at the second", () => {
    const a = positionsAtCount(from, to, 0, 16);
    const b = positionsAtCount(from, to, 16, 16);
    expect(a[0]).toEqual({ performerId: "T1", x: 0, y: 10, facingDeg: 350 });
    expect(b[0].x).toBeCloseTo(8, 12);
    expect(b[0].facingDeg).toBeCloseTo(10, 9);
  });

  it("never turns more than 180° over a transition (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -720, max: 720, noNaN: true }), fc.double({ min: -720, max: 720, noNaN: true }), (a, b) => {
        const start = facingBetweenDeg(a, b, 0);
        const end = facingBetweenDeg(a, b, 1);
        const wanted = (((b % 360) + 360) % 360);
        const gap = Math.abs(((end - wanted + 540) % 360) - 180);
        expect(Math.min(gap, 360 - gap)).toBeLessThan(1e-6);
        let swept = 0;
        for (let i = 1; i <= 8; i++) {
          const d = Math.abs(((facingBetweenDeg(a, b, i / 8) - facingBetweenDeg(a, b, (i - 1) / 8) + 540) % 360) - 180);
          swept += d;
        }
        expect(swept).toBeLessThanOrEqual(180 + 1e-6);
        expect(start).toBeGreaterThanOrEqual(0);
        expect(start).toBeLessThan(360);
      }),
    );
  });

  it("keeps a performer present in one set only at that set's position", () => {
    const out = positionsAtCount(from, [to[0]], 4, 8);
    expect(out.find((p) => p.performerId === "T1")).toMatchObject({ x: 0, y: 10 });
  });

  it("rejects counts out of range and bad coordinates, naming the field", () => {
    expect(() => positionsAtCount(from, to, 9, 8)).toThrow(/count must be between 0 and 8/);
    expect(() => positionsAtCount(from, to, 1, 0)).toThrow(/counts must be above 0/);
    expect(() => positionsAtCount([{ ...from[0], x: Number.NaN }], to, 1, 8)).toThrow(/fromPositions\[0\]\.x must be a finite number/);
  });
});
