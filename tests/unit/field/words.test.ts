// Positions in the trade's words and back. Dimensions from shared/REFERENCES.md ("Field geometry");
// the wording (inside = toward the 50, steps of 8 to 5 from yard lines and hashes) is common practice, no source.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FIELD_WIDTH_M, STEP_M, yardLineX } from "@/lib/field/geometry";
import { describePosition, formatSteps, positionFromWords } from "@/lib/field/words";

const HS = "high-school" as const;
const COLLEGE = "college" as const;

describe("describePosition", () => {
  it("says side 1: 2 steps outside the 35; 4 steps in front of the front hash (high school, hash 16.256 m)", () => {
    const x = -(13.716 + 2 * 0.5715);
    const y = 16.256 - 4 * 0.5715;
    expect(describePosition(x, y, HS).text).toBe("side 1: 2 steps outside the 35 yard line; 4 steps in front of the front hash");
  });

  it("names the 50 without a side, and dots on a line or a hash as 'on'", () => {
    expect(describePosition(0, 16.256, HS).text).toBe("on the 50 yard line; on the front hash");
    expect(describePosition(yardLineX(20, 2), 18.288, COLLEGE).text).toBe("side 2: on the 20 yard line; on the front hash");
  });

  it("counts inside toward the 50 and behind toward the back sideline", () => {
    const d = describePosition(yardLineX(40, 2) - 3 * STEP_M, 48.768 - 16.256 + 2 * STEP_M, HS);
    expect(d.text).toBe("side 2: 3 steps inside the 40 yard line; 2 steps behind the back hash");
  });

  it("uses the rules in force: 18.288 m is on the college hash but 3.5 steps behind the high-school one", () => {
    // 18.288 − 16.256 = 2.032 m = 3.556 steps, rounded to the quarter step (computed).
    expect(describePosition(0, 18.288, HS).frontToBack).toBe("3.5 steps behind the front hash");
    expect(describePosition(0, 18.288, COLLEGE).frontToBack).toBe("on the front hash");
  });

  it("counts from the goal line in the end zone and from the sidelines near them, off the field too", () => {
    expect(describePosition(45.72 + 4 * STEP_M, 2 * STEP_M, HS).text).toBe("side 2: 4 steps outside the goal line; 2 steps behind the front sideline");
    expect(describePosition(-45.72, -3 * STEP_M, HS).text).toBe("side 1: on the goal line; 3 steps in front of the front sideline");
    expect(describePosition(0, FIELD_WIDTH_M - STEP_M, HS).frontToBack).toBe("1 step in front of the back sideline");
  });

  it("rounds to the chosen precision and writes steps plainly", () => {
    expect(describePosition(-0.3 * STEP_M, 16.256, HS, { precisionSteps: 0.5 }).sideToSide).toBe("0.5 steps outside the 50 yard line");
    expect(formatSteps(1)).toBe("1 step");
    expect(formatSteps(2.25)).toBe("2.25 steps");
    expect(() => describePosition(Number.NaN, 0, HS)).toThrow(RangeError);
  });
});

describe("positionFromWords", () => {
  it("reads the example back to x = −14.859 m, y = 13.970 m (computed from 0.9144 m/yd and 0.5715 m/step)", () => {
    const r = positionFromWords("side 1: 2 steps outside the 35 yard line; 4 steps in front of the front hash", HS);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.x).toBeCloseTo(-14.859, 6);
    expect(r.y).toBeCloseTo(13.97, 6);
  });

  it("takes shorthands, fractions and either order", () => {
    const a = positionFromWords("S2 - 3 1/2 steps in the 40 yd ln, 2 steps behind BH", COLLEGE);
    expect(a).toEqual({ ok: true, x: expect.closeTo(yardLineX(40, 2) - 3.5 * STEP_M, 9), y: expect.closeTo(30.48 + 2 * STEP_M, 9) });
    const b = positionFromWords("on the front sideline; on the 50", HS);
    expect(b).toEqual({ ok: true, x: expect.closeTo(0, 9), y: expect.closeTo(0, 9) });
    const c = positionFromWords("Side 1: on the goal line; 1 step behind the back sideline", HS);
    expect(c).toEqual({ ok: true, x: expect.closeTo(-45.72, 9), y: expect.closeTo(FIELD_WIDTH_M + STEP_M, 9) });
  });

  it("refuses what is not a position, with a reason", () => {
    for (const text of [
      "side 1: 2 steps outside the 37 yard line; on the front hash",
      "2 steps outside the 35 yard line; on the front hash",
      "side 2: 9 steps inside the 45; on the front hash",
      "on the 50",
      "side 1: on the 30; 4 steps over the hash",
    ]) {
      const r = positionFromWords(text, HS);
      expect(r.ok, text).toBe(false);
      if (!r.ok) expect(r.error.length).toBeGreaterThan(5);
    }
  });

  it("reads back every description within half the precision (property over the whole field area)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -64, max: 64, noNaN: true }),
        fc.double({ min: -10, max: 58, noNaN: true }),
        fc.constantFrom(HS, COLLEGE),
        (x, y, rules) => {
          const d = describePosition(x, y, rules);
          const r = positionFromWords(d.text, rules);
          if (!r.ok) throw new Error(`${d.text}: ${r.error}`);
          expect(Math.abs(r.x - x)).toBeLessThanOrEqual(0.125 * STEP_M + 1e-9);
          expect(Math.abs(r.y - y)).toBeLessThanOrEqual(0.125 * STEP_M + 1e-9);
        },
      ),
      { numRuns: 2000 },
    );
  });
});
