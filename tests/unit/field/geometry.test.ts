// Field geometry against the published field dimensions (values gathered in shared/REFERENCES.md, "Field geometry").
import { describe, expect, it } from "vitest";
import {
  END_LINE_X_M,
  FIELD_WIDTH_M,
  GOAL_LINE_X_M,
  hashesY,
  snapToStep,
  STEP_M,
  yardLines,
  yardLineX,
  yardOfX,
} from "@/lib/field/geometry";

describe("field dimensions", () => {
  it("is 360 × 160 ft = 109.728 × 48.768 m with 100 yd = 91.44 m between goal lines (field rules; public encyclopedia copies)", () => {
    expect(2 * END_LINE_X_M).toBeCloseTo(109.728, 6);
    expect(FIELD_WIDTH_M).toBeCloseTo(48.768, 6);
    expect(2 * GOAL_LINE_X_M).toBeCloseTo(91.44, 6);
  });

  it("has a step of 8 to 5 of 22.5 in = 0.5715 m (common practice, no source)", () => {
    expect(STEP_M).toBeCloseTo(0.5715, 9);
    expect(8 * STEP_M).toBeCloseTo(5 * 0.9144, 9);
  });

  it("puts high-school hashes 53 ft 4 in = 16.256 m from each sideline, the width in thirds", () => {
    const h = hashesY("high-school");
    expect(h.front).toBeCloseTo(16.256, 6);
    expect(h.back).toBeCloseTo(48.768 - 16.256, 6);
    expect(h.back - h.front).toBeCloseTo(FIELD_WIDTH_M / 3, 3);
  });

  it("puts college hashes 60 ft = 18.288 m from each sideline, 40 ft = 12.192 m apart", () => {
    const h = hashesY("college");
    expect(h.front).toBeCloseTo(18.288, 6);
    expect(h.back - h.front).toBeCloseTo(12.192, 6);
    expect(h.front / STEP_M).toBeCloseTo(32, 9); // computed: 60 ft is exactly 32 steps of 22.5 in
  });
});

describe("yard lines", () => {
  it("places the 35 on side 1 15 yd = 13.716 m left of the 50 and the goal line of side 2 at +45.72 m", () => {
    expect(yardLineX(35, 1)).toBeCloseTo(-13.716, 9);
    expect(yardLineX(0, 2)).toBeCloseTo(45.72, 9);
    expect(yardLineX(50, 1)).toBeCloseTo(0, 9);
    expect(() => yardLineX(55, 1)).toThrow(RangeError);
  });

  it("reads back the yard and the side of an x", () => {
    expect(yardOfX(yardLineX(20, 2))).toEqual({ yard: expect.closeTo(20, 9), side: 2 });
    expect(yardOfX(-1).side).toBe(1);
    expect(yardOfX(0).side).toBeNull();
  });

  it("lists 21 lines every 5 yd with numbers on the 10s (9 numbered lines: 10…40 twice and the 50)", () => {
    const lines = yardLines();
    expect(lines).toHaveLength(21);
    for (let i = 1; i < lines.length; i++) expect(lines[i].x - lines[i - 1].x).toBeCloseTo(4.572, 9);
    expect(lines.filter((l) => l.numbered).map((l) => l.yard)).toEqual([10, 20, 30, 40, 50, 40, 30, 20, 10]);
    expect(lines[0]).toMatchObject({ yard: 0, side: 1, numbered: false });
  });

  it("snaps to whole steps from the 50 and the front sideline, so yard lines stay on the grid", () => {
    expect(snapToStep(0.3)).toBeCloseTo(STEP_M, 9);
    expect(snapToStep(0.2)).toBeCloseTo(0, 9);
    expect(snapToStep(yardLineX(35, 1) + 0.1)).toBeCloseTo(yardLineX(35, 1), 9);
  });
});
