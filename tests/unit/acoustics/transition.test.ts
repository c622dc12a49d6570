import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { facingBetweenDeg, positionsAtCount, positionsBetweenInto, transitionFraction } from "@/lib/acoustics";

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

  it("turns a half turn clockwise, whichever way it is given", () => {
    // Clockwise is increasing facing (the code comment of facingBetweenDeg): half-way from
    // 0° to 180° is 90° and half-way from 180° to 0° is 270°; a quarter of 270° → 90° is 315°.
    expect(facingBetweenDeg(0, 180, 0.5)).toBeCloseTo(90, 9);
    expect(facingBetweenDeg(180, 0, 0.5)).toBeCloseTo(270, 9);
    expect(facingBetweenDeg(270, 90, 0.25)).toBeCloseTo(315, 9);
  });

  it("accepts a count of 0 and of all the counts, and refuses a count below 0 or a value that is not a number, naming the field", () => {
    expect(transitionFraction(0, 8)).toBe(0);
    expect(transitionFraction(8, 8)).toBe(1);
    expect(() => transitionFraction(-1, 8)).toThrow(/^count must be between 0 and 8$/);
    expect(() => transitionFraction(Number.NaN, 8)).toThrow(/^count must be a finite number$/);
    expect(() => transitionFraction(1, Number.POSITIVE_INFINITY)).toThrow(/^counts must be a finite number$/);
  });

  it("writes positions between two sets held in typed arrays, in place", () => {
    // Hand calculation at t = 0.25: x 0 → 8 gives 2, x −10 → 6 gives −6; y 10 → 18 gives 12,
    // y 5 → 13 gives 7; facing 350 → 10 (the short way, +20°) gives 355, 90 → 270 (a half turn,
    // clockwise) gives 135.
    const a = { x: new Float64Array([0, -10]), y: new Float64Array([10, 5]), facingDeg: new Float64Array([350, 90]) };
    const b = { x: new Float64Array([8, 6]), y: new Float64Array([18, 13]), facingDeg: new Float64Array([10, 270]) };
    const out = { x: new Float64Array(2), y: new Float64Array(2), facingDeg: new Float64Array(2) };
    positionsBetweenInto(a, b, 0.25, out);
    expect(Array.from(out.x)).toEqual([2, -6]);
    expect(Array.from(out.y)).toEqual([12, 7]);
    expect(out.facingDeg[0]).toBeCloseTo(355, 9);
    expect(out.facingDeg[1]).toBeCloseTo(135, 9);
  });

  it("adds a performer present only in the second set after the others, at that set's spot with facing brought into 0…360", () => {
    const out = positionsAtCount([from[0]!], [{ performerId: "N1", x: 3, y: 4, facingDeg: -90 }, to[1]!], 4, 8);
    expect(out).toHaveLength(2);
    expect(out[0]!.performerId).toBe("T1");
    expect(out[1]).toEqual({ performerId: "N1", x: 3, y: 4, facingDeg: 270 });
  });

  it("refuses sets that are not lists, ids that are not strings or used twice, and bad coordinates, naming the set and index", () => {
    const ok = { performerId: "T9", x: 0, y: 0, facingDeg: 0 };
    // A string has forEach only through Array.prototype: without the check it fails as a TypeError.
    expect(() => positionsAtCount("T1" as never, to, 1, 8)).toThrow(/^fromPositions must be an array$/);
    expect(() => positionsAtCount(from, [null] as never, 1, 8)).toThrow(/^toPositions\[0\]\.performerId must be a string$/);
    expect(() => positionsAtCount(from, [{ ...ok, performerId: 7 }] as never, 1, 8)).toThrow(/^toPositions\[0\]\.performerId must be a string$/);
    expect(() => positionsAtCount([from[0]!, { ...from[1]!, performerId: "T1" }], to, 1, 8)).toThrow(/^fromPositions\[1\]\.performerId "T1" is used twice$/);
    expect(() => positionsAtCount(from, [ok, { ...ok, performerId: "T8", y: Number.NaN }], 1, 8)).toThrow(/^toPositions\[1\]\.y must be a finite number$/);
    expect(() => positionsAtCount(from, [{ ...ok, facingDeg: Number.POSITIVE_INFINITY }], 1, 8)).toThrow(/^toPositions\[0\]\.facingDeg must be a finite number$/);
  });
});
