// Form helpers. Expected points are computed by hand from plane geometry (circle through three
// points; even spacing by arc length); the step is 22.5 in = 0.5715 m (common practice, no source).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { circleThrough, copyFrom, face, fillBlock, mirrorSides, nudge, snappedOffset, snapToGrid, spreadAlongArc, spreadAlongLine } from "@/lib/editor/forms";
import { diffLayouts, layoutOf, rowsOf, withSpots, type Layout } from "@/lib/editor/layout";
import { STEP_M } from "@/lib/field/geometry";

const at = (x: number, y: number, facingDeg = 0) => ({ x, y, facingDeg });

describe("spreadAlongLine", () => {
  it("keeps the two ends and spaces the rest evenly in their order along the line", () => {
    const layout: Layout = { a: at(-8, 10), b: at(5, 11), c: at(-1, 9), d: at(8, 14) };
    const out = spreadAlongLine(layout, ["a", "b", "c", "d"]);
    expect(out.a).toMatchObject({ x: -8, y: 10 });
    expect(out.d).toMatchObject({ x: 8, y: 14 });
    expect(out.c.x).toBeCloseTo(-8 + 16 / 3, 9);
    expect(out.c.y).toBeCloseTo(10 + 4 / 3, 9);
    expect(out.b.x).toBeCloseTo(-8 + 32 / 3, 9);
  });

  it("needs three performers and leaves facings alone", () => {
    expect(spreadAlongLine({ a: at(0, 0), b: at(1, 1) }, ["a", "b"])).toEqual({});
    const out = spreadAlongLine({ a: at(0, 0, 90), b: at(3, 0, 180), c: at(9, 0, 270) }, ["a", "b", "c"]);
    expect(out.b).toEqual({ x: 4.5, y: 0, facingDeg: 180 });
  });
});

describe("spreadAlongArc", () => {
  it("finds the circle through (0,0), (1,1), (2,0): centre (1,0), radius 1", () => {
    const c = circleThrough({ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 2, y: 0 })!;
    expect(c.cx).toBeCloseTo(1, 12);
    expect(c.cy).toBeCloseTo(0, 12);
    expect(c.radius).toBeCloseTo(1, 12);
    expect(circleThrough({ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 2, y: 2 })).toBeNull();
  });

  it("spaces five performers 45° apart on the half circle through the ends and the one farthest out", () => {
    // Ends (−10, 10) and (10, 10), the control at (0, 20): centre (0, 10), radius 10.
    const layout: Layout = { e1: at(-10, 10), m1: at(3, 12), top: at(0, 20), m2: at(-4, 11), e2: at(10, 10) };
    const out = spreadAlongArc(layout, Object.keys(layout));
    const r = Math.SQRT1_2 * 10;
    expect(out.e1).toMatchObject({ x: expect.closeTo(-10, 9), y: expect.closeTo(10, 9) });
    expect(out.m2).toMatchObject({ x: expect.closeTo(-r, 9), y: expect.closeTo(10 + r, 9) });
    expect(out.top).toMatchObject({ x: expect.closeTo(0, 9), y: expect.closeTo(20, 9) });
    expect(out.m1).toMatchObject({ x: expect.closeTo(r, 9), y: expect.closeTo(10 + r, 9) });
    expect(out.e2).toMatchObject({ x: expect.closeTo(10, 9), y: expect.closeTo(10, 9) });
  });

  it("bows toward the front when the control is in front of the chord, and falls back to a line when flat", () => {
    const bowed = spreadAlongArc({ a: at(-6, 20), b: at(0, 14), c: at(6, 20) }, ["a", "b", "c"]);
    expect(bowed.b.y).toBeCloseTo(14, 9);
    const flat = spreadAlongArc({ a: at(-6, 20), b: at(1, 20.05), c: at(6, 20) }, ["a", "b", "c"]);
    expect(flat.b).toMatchObject({ x: expect.closeTo(0, 9), y: expect.closeTo(20, 9) });
  });
});

describe("fillBlock", () => {
  it("fills ranks of three at 2-step intervals from the front corner on side 1, front rank first", () => {
    const layout: Layout = { a: at(1, 5), b: at(0, 5.1), c: at(4, 4.9), d: at(2, 9), e: at(0.5, 9.2), f: at(3, 8.8) };
    const out = fillBlock(layout, Object.keys(layout), { columns: 3, intervalSteps: 2 });
    const x0 = 0;
    const y0 = 4.9;
    const i = 2 * STEP_M;
    expect(out.b).toMatchObject({ x: x0, y: y0 });
    expect(out.a).toMatchObject({ x: expect.closeTo(x0 + i, 9), y: y0 });
    expect(out.c).toMatchObject({ x: expect.closeTo(x0 + 2 * i, 9), y: y0 });
    expect(out.e).toMatchObject({ x: x0, y: expect.closeTo(y0 + i, 9) });
    expect(out.f).toMatchObject({ x: expect.closeTo(x0 + 2 * i, 9), y: expect.closeTo(y0 + i, 9) });
  });
});

describe("mirror, copy, nudge, snap, face", () => {
  it("mirrors side 1 to side 2 with facings across the 50, and twice is the identity", () => {
    expect(mirrorSides({ a: at(-12, 7, 90) }, ["a"]).a).toEqual({ x: 12, y: 7, facingDeg: 270 });
    expect(mirrorSides({ a: at(3, 7, 0) }, ["a"]).a.facingDeg).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: -60, max: 60, noNaN: true }), fc.double({ min: -5, max: 55, noNaN: true }), fc.double({ min: 0, max: 359.9, noNaN: true }), (x, y, f) => {
        const once = withSpots({ a: at(x, y, f) }, mirrorSides({ a: at(x, y, f) }, ["a"]));
        const twice = mirrorSides(once, ["a"]).a;
        expect(twice.x).toBeCloseTo(x, 9);
        expect(twice.facingDeg).toBeCloseTo(f, 9);
      }),
    );
  });

  it("copies spots from another set for the performers placed there", () => {
    expect(copyFrom({ a: at(1, 2, 3) }, ["a", "b"])).toEqual({ a: at(1, 2, 3) });
  });

  it("nudges by steps and stays inside the field area (10 m beyond the lines)", () => {
    expect(nudge({ a: at(0, 10) }, ["a"], 1, -2).a).toMatchObject({ x: expect.closeTo(STEP_M, 12), y: expect.closeTo(10 - 2 * STEP_M, 12) });
    expect(nudge({ a: at(64.5, 58.5) }, ["a"], 4, 4).a).toMatchObject({ x: expect.closeTo(64.864, 9), y: expect.closeTo(58.768, 9) });
  });

  it("snaps to the step grid, and a drag offset lands the lead on it", () => {
    expect(snapToGrid({ a: at(1.0, 0.3) }, ["a"]).a).toMatchObject({ x: expect.closeTo(2 * STEP_M, 12), y: expect.closeTo(STEP_M, 12) });
    const off = snappedOffset({ x: 0.1, y: 0.1 }, 1.0, 0.1);
    expect(0.1 + off.dx).toBeCloseTo(2 * STEP_M, 12);
    expect(0.1 + off.dy).toBeCloseTo(0, 12);
  });

  it("sets a facing, brought into 0…360", () => {
    expect(face({ a: at(0, 0, 0) }, ["a"], -90).a.facingDeg).toBe(270);
    expect(face({ a: at(0, 0, 0) }, ["a"], Number.NaN)).toEqual({});
  });
});

describe("layouts", () => {
  it("diffs two layouts into writes and removals, and round-trips through rows", () => {
    const before = layoutOf([{ performerId: "a", ...at(1, 1) }, { performerId: "b", ...at(2, 2) }]);
    const after = withSpots(before, { a: at(1, 1.5), b: undefined, c: at(3, 3) });
    const d = diffLayouts(before, after);
    expect(d.upserts.map((r) => r.performerId).sort()).toEqual(["a", "c"]);
    expect(d.removals).toEqual(["b"]);
    expect(layoutOf(rowsOf(after))).toEqual(after);
    expect(diffLayouts(after, after)).toEqual({ upserts: [], removals: [] });
  });
});
