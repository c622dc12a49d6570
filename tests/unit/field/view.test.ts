// The screen view: a linear map metres ↔ pixels with y flipped (front sideline at the bottom). Computed checks.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { END_LINE_X_M, FIELD_WIDTH_M } from "@/lib/field/geometry";
import { facingVector, fieldBounds, fitView, panBy, toField, toScreen, zoomAt } from "@/lib/field/view";

describe("view", () => {
  it("fits the field into the screen, side 1 on the left and the front sideline below the back one", () => {
    const v = fitView(1000, 500, fieldBounds());
    const s1 = toScreen(v, -END_LINE_X_M, 0);
    const s2 = toScreen(v, END_LINE_X_M, FIELD_WIDTH_M);
    expect(s1.x).toBeGreaterThanOrEqual(0);
    expect(s2.x).toBeLessThanOrEqual(1000);
    expect(s1.x).toBeLessThan(s2.x);
    expect(s1.y).toBeGreaterThan(s2.y);
    expect(s1.y).toBeLessThanOrEqual(500);
    expect(v.scale).toBeCloseTo(1000 / (2 * END_LINE_X_M + 6), 9); // width-limited: 115.728 m in 1000 px
  });

  it("includes the listening points given", () => {
    const b = fieldBounds([{ x: 0, y: -25 }]);
    expect(b.minY).toBeLessThanOrEqual(-25);
  });

  it("maps back and forth, and zooms about the pointer without moving the point under it", () => {
    fc.assert(
      fc.property(fc.double({ min: -60, max: 60, noNaN: true }), fc.double({ min: -30, max: 60, noNaN: true }), fc.double({ min: 0.5, max: 4, noNaN: true }), (x, y, k) => {
        const v = panBy(fitView(800, 600, fieldBounds()), 13, -7);
        const s = toScreen(v, x, y);
        const back = toField(v, s.x, s.y);
        expect(back.x).toBeCloseTo(x, 9);
        expect(back.y).toBeCloseTo(y, 9);
        const z = zoomAt(v, k, s.x, s.y, 0.01, 1000);
        const after = toScreen(z, x, y);
        expect(after.x).toBeCloseTo(s.x, 6);
        expect(after.y).toBeCloseTo(s.y, 6);
      }),
    );
  });

  it("points facing 0 down the screen (toward the front) and 90 to the right (side 2)", () => {
    expect(facingVector(0).dy).toBeCloseTo(1, 12);
    expect(facingVector(90).dx).toBeCloseTo(1, 12);
    expect(facingVector(270).dx).toBeCloseTo(-1, 12);
  });
});
