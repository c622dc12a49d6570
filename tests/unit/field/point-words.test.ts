// Listening points in words. Field dimensions: 160 ft wide (53 1/3 yd = 48.768 m), yard lines every 5 yd,
// 8 steps to 5 yards (22.5 in a step) — common practice, no source. The demo's press box is on the 50,
// 25 m behind the front sideline and 18 m up (README).
import { describe, expect, it } from "vitest";
import { describeListeningPoint, listeningPointFromWords } from "@/lib/field/point-words";

const STEP = 0.5715; // 22.5 in in metres
const WIDTH = 48.768; // 160 ft in metres

describe("listeningPointFromWords", () => {
  it("reads the press box: on the 50, 25 m behind the front sideline, 18 m up", () => {
    expect(listeningPointFromWords("on the 50, 25 m behind the front sideline, 18 m up")).toEqual({ ok: true, x: 0, y: -25, z: 18 });
  });

  it("reads a judge on the field by a yard line in steps and metres in from a sideline", () => {
    const r = listeningPointFromWords("side 1: 4 steps inside the 35, 20 m in from the front sideline, 1.7 m up");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // The 35 on side 1 is 15 yd = 24 steps from the 50; 4 steps inside is 20 steps from it.
    expect(r.x).toBeCloseTo(-20 * STEP, 9);
    expect(r.y).toBeCloseTo(20, 9);
    expect(r.z).toBeCloseTo(1.7, 9);
  });

  it("measures behind the back sideline away from the field, and takes a standing ear height when none is given", () => {
    const r = listeningPointFromWords("side 2, on the 40; 10 m behind the back sideline");
    expect(r).toMatchObject({ ok: true, z: 1.7 });
    if (!r.ok) return;
    expect(r.x).toBeCloseTo(16 * STEP, 9);
    expect(r.y).toBeCloseTo(WIDTH + 10, 9);
  });

  it("says what is missing or wrong, in words", () => {
    expect(listeningPointFromWords("25 m behind the front sideline, 18 m up")).toEqual({ ok: false, error: expect.stringContaining("Say where along the field") });
    expect(listeningPointFromWords("on the 50, 18 m up")).toEqual({ ok: false, error: expect.stringContaining("Say how far from a sideline") });
    const r = listeningPointFromWords("on the 52, 25 m behind the front sideline");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toContain('"52" is not a yard line');
    expect(listeningPointFromWords("2 steps outside the 35, 3 m in from the front sideline").ok).toBe(false); // no side
  });
});

describe("describeListeningPoint", () => {
  it("says how far from a sideline in yards (25 m = 27.34 yd, 1 yd = 0.9144 m by definition) and the height in metres", () => {
    expect(describeListeningPoint(0, -25, 18, "high-school")).toBe("on the 50 yard line, 27.3 yards behind the front sideline, 18 m up");
    expect(describeListeningPoint(0, 0.9144, 1.7, "high-school")).toBe("on the 50 yard line, 1 yard in from the front sideline, 1.7 m up");
  });

  it("reads yards as written: 27.3 yards behind is 24.96 m behind", () => {
    const r = listeningPointFromWords("on the 50, 27.3 yards behind the front sideline, 18 m up");
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.y).toBeCloseTo(-27.3 * 0.9144, 9);
  });

  it("writes what listeningPointFromWords reads, to a twentieth of a yard", () => {
    for (const [x, y, z] of [[0, -25, 18], [-20 * STEP, 20, 1.7], [16 * STEP, WIDTH + 10, 12], [8 * STEP, WIDTH - 5, 0]] as const) {
      const back = listeningPointFromWords(describeListeningPoint(x, y, z, "college"));
      expect(back.ok, `${x},${y},${z}`).toBe(true);
      if (!back.ok) continue;
      expect(back.x).toBeCloseTo(x, 6);
      expect(Math.abs(back.y - y)).toBeLessThanOrEqual(0.05 * 0.9144 + 1e-9);
      expect(back.z).toBeCloseTo(z, 6);
    }
  });
});
