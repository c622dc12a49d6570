// Ground by region, ISO 9613-2:1996 7.3.1, against the ISO/TR 17534-3:2015 test cases with three
// kinds of ground, as transcribed in jmrplens/phonometry
// tests/environment/propagation/test_iso17534_3.py @ 001d785c0ad1dd769831112dd3205c1f04cf685b.
import { describe, expect, it } from "vitest";
import { analyzeSet, regionGroundFactors } from "@/lib/acoustics";
import { PATH_PIECES, meanGroundOver, pathGroundInto } from "@/lib/acoustics/ground-regions";
import { HALF_LENGTH_M, WIDTH_M } from "@/lib/validation/positions";
import { handSource, performer } from "./helpers";

// Tables 7, 8 (T04) and 14 (T06): the projected path of 194.16 m spends 40.88, 102.19 and
// 51.10 m over three areas; source 1 m up, receiver 4 m up.
const SEGMENTS = [40.88, 102.19, 51.1];

describe("regionGroundFactors: G_s, G_m, G_r as length-weighted means over the regions", () => {
  it("T04 (Table 8): areas of G 0.2, 0.5, 0.9 give G_s 0.20, G_m 0.43, G_r 0.67", () => {
    const f = regionGroundFactors(SEGMENTS, [0.2, 0.5, 0.9], 1, 4);
    expect(f.source).toBeCloseTo(0.2, 2);
    expect(f.middle).toBeCloseTo(0.43, 2);
    expect(f.receiver).toBeCloseTo(0.67, 2);
  });

  it("T06 (Table 14): the same areas reversed give G_s 0.90, G_m 0.60, G_r 0.37", () => {
    const f = regionGroundFactors(SEGMENTS, [0.9, 0.5, 0.2], 1, 4);
    expect(f.source).toBeCloseTo(0.9, 2);
    expect(f.middle).toBeCloseTo(0.6, 2);
    expect(f.receiver).toBeCloseTo(0.37, 2);
  });

  it("weights by length, not by count (hand calculation): 5 m of G 0 and 25 m of G 1 under a 30 m source region give 25/30", () => {
    expect(regionGroundFactors([5, 25, 170], [0, 1, 0], 1, 0).source).toBeCloseTo(25 / 30, 12);
    expect(regionGroundFactors([15, 15, 170], [0, 1, 0], 1, 0).source).toBeCloseTo(0.5, 12);
  });

  it("gives one kind of ground to all three regions, and a region of no length the ground it stands on", () => {
    expect(regionGroundFactors([200], [0.42], 1, 4)).toEqual({ source: 0.42, middle: 0.42, receiver: 0.42 });
    const onGround = regionGroundFactors([50, 50], [0.3, 0.8], 0, 0);
    expect(onGround.source).toBe(0.3);
    expect(onGround.receiver).toBe(0.8);
  });

  it("rejects stretches and factors that do not fit", () => {
    expect(() => regionGroundFactors([], [], 1, 4)).toThrow("lengthsM");
    expect(() => regionGroundFactors([10, 10], [0.5], 1, 4)).toThrow("factors");
    expect(() => regionGroundFactors([10], [1.5], 1, 4)).toThrow("factors[0]");
    expect(() => regionGroundFactors([-1], [0.5], 1, 4)).toThrow("lengthsM[0]");
    expect(() => regionGroundFactors([10], [0.5], -1, 4)).toThrow("sourceHeightM");
  });

  it("refuses a height or a stretch that is not a number, naming it", () => {
    expect(() => regionGroundFactors([10], [0.5], 1, Number.NaN)).toThrow(/^receiverHeightM must be a finite number$/);
    expect(() => regionGroundFactors([10, Number.NaN], [0.5, 0.5], 1, 4)).toThrow(/^lengthsM\[1\] must be a finite number$/);
  });

  it("takes a stretch of no length: a source on the ground at its end stands on the next ground", () => {
    // Lengths 0 and 50 m: the first ground has no extent, so the source (hs = 0, a source region of
    // no length) stands at 0 m on the second ground, G 0.8; so does everything after it.
    expect(regionGroundFactors([0, 50], [0.3, 0.8], 0, 1)).toEqual({ source: 0.8, middle: 0.8, receiver: 0.8 });
  });

  it("gives a path of no length (a point straight above the source) the last ground, under the receiver", () => {
    expect(regionGroundFactors([0, 0], [0.3, 0.8], 1, 1)).toEqual({ source: 0.8, middle: 0.8, receiver: 0.8 });
  });

  it("regions that just meet (dp = 30(hs + hr)) leave no middle region: G_m is the mean over the whole path", () => {
    // hs = hr = 1 m, dp = 60 m: the source region is 0–30 m (G 0), the receiver region 30–60 m
    // (G 1); 7.3.1 has no middle region, and G_m is then the path's mean, (30·0 + 30·1)/60 = 0.5.
    expect(regionGroundFactors([30, 30], [0, 1], 1, 1)).toEqual({ source: 0, middle: 0.5, receiver: 1 });
  });
});

describe("meanGroundOver", () => {
  it("reads only the pieces it is told of, in arrays that may be longer", () => {
    // Two pieces (0–10 m G 0.1, 10–20 m G 0.2) in arrays holding a third (20–30 m G 0.9) left from
    // other use: at the path's end, 20 m, the ground is the last of the two, 0.2.
    const cuts = Float64Array.of(0, 10, 20, 30);
    const g = Float64Array.of(0.1, 0.2, 0.9);
    expect(meanGroundOver(20, 20, cuts, g, 2)).toBe(0.2);
    expect(meanGroundOver(10, 10, cuts, g, 2)).toBe(0.2);
    expect(meanGroundOver(5, 5, cuts, g, 2)).toBe(0.1);
  });
});

describe("pathGroundInto: where the path crosses the field (x within ±HALF_LENGTH_M, y from 0 to WIDTH_M)", () => {
  // Ground factors told apart: between 0.5, field 1, the point's surroundings 0.
  const path = (sx: number, sy: number, rx: number, ry: number, surroundingsM: number) => {
    const cuts = new Float64Array(PATH_PIECES + 1);
    const g = new Float64Array(PATH_PIECES);
    pathGroundInto(cuts, g, sx, sy, rx, ry, Math.hypot(rx - sx, ry - sy), 1, 0.5, 0, surroundingsM);
    return { cuts: Array.from(cuts), g: Array.from(g) };
  };
  const expectCuts = (got: number[], want: number[]) => {
    expect(got).toHaveLength(want.length);
    want.forEach((w, i) => expect(got[i], `cuts[${i}]`).toBeCloseTo(w, 9));
  };

  it("a performer 15 m onto the field heard 25 m behind the front sideline: field to the sideline, then between, then the surroundings", () => {
    // Straight back along y: dp = 40 m, the path leaves the field at y = 0 after 15 m; the point's
    // last 10 m are its own, so cuts 0, 0, 15, 30, 40.
    const p = path(0, 15, 0, -25, 10);
    expect(p.g).toEqual([0.5, 1, 0.5, 0]);
    expectCuts(p.cuts, [0, 0, 15, 30, 40]);
  });

  it("a source behind the sideline heard on the field: between ground first, the field from where the path enters", () => {
    // (0, −10) to (0, 30): dp = 40 m, entering the field at y = 0 after 10 m; surroundings 5 m.
    expectCuts(path(0, -10, 0, 30, 5).cuts, [0, 10, 35, 35, 40]);
  });

  it("leaves the field over the back sideline and over an end line where they are", () => {
    // (0, 40) to (0, 60): out at y = WIDTH_M, WIDTH_M − 40 m along; no surroundings.
    expectCuts(path(0, 40, 0, 60, 0).cuts, [0, 0, WIDTH_M - 40, 20, 20]);
    // (−50, 10) to (−70, 10): out at x = −HALF_LENGTH_M, HALF_LENGTH_M − 50 m along.
    expectCuts(path(-50, 10, -70, 10, 0).cuts, [0, 0, HALF_LENGTH_M - 50, 20, 20]);
  });

  it("a path parallel to the front sideline: behind it no field, along the sideline itself all field", () => {
    // 5 m behind the sideline, 40 m long, surroundings 10 m: the field piece has no length and sits
    // where the surroundings begin (30 m).
    expectCuts(path(-20, -5, 20, -5, 10).cuts, [0, 30, 30, 30, 40]);
    // On the sideline (y = 0): the edge belongs to the field, which runs until the surroundings.
    expectCuts(path(-20, 0, 20, 0, 10).cuts, [0, 0, 30, 30, 40]);
  });

  it("a path that only touches the field where it starts has no field: between ground up to the surroundings", () => {
    // From the sideline straight out, 10 m, surroundings 4 m: the field would be [0, 0].
    expectCuts(path(0, 0, 0, -10, 4).cuts, [0, 6, 6, 6, 10]);
  });
});

describe("the engine with ground by region: ISO/TR 17534-3 T04 (Table 9)", () => {
  // T04's path: 190 m along x and 40 m along y (dp = 194.16 m), source 1 m and receiver 4 m up,
  // 20 °C, 70 % RH, 93 dB per octave. Shifted in the field frame so the path leaves the field
  // exactly 30 m from the source: the source region (30·hs = 30 m) is all field (G 0.2), the
  // middle region (30 m to dp − 120 m) all "between" ground (G 0.43), and the receiver's own
  // surroundings, 120 m deep, are its whole region (G 0.67). Printed levels and A-weighted total
  // of Table 9: ±0.05 dB.
  const PRINTED = [39.9, 36.24, 35.23, 36.04, 36.95, 36.57, 33.87, 23.45];
  const DP = Math.hypot(190, 40);
  const SX = 54.864 - (30 * 190) / DP; // the end line of the field frame is at x = 54.864 m
  const tr = (fieldG: number, betweenG: number, pointG: number, surroundingsM: number) =>
    analyzeSet({
      performers: [performer({ id: "S", instrument: "flat93", x: SX, y: 5, z: 1, facingDeg: 0 })],
      listeningPoints: [{ id: "R", x: SX + 190, y: 45, z: 4, groundFactor: pointG, surroundingsM }],
      conditions: { temperatureC: 20, relativeHumidityPct: 70, pressureKPa: 101.325, groundFactor: fieldG, betweenGroundFactor: betweenG },
      instruments: { flat93: handSource([93, 93, 93, 93, 93, 93, 93, 93]) },
    }).points[0];

  it("reproduces Table 9 with the field at G 0.20, the ground between at 0.43 and the receiver's surroundings at 0.67", () => {
    const point = tr(0.2, 0.43, 0.67, 120);
    point.performers[0].bandsDb.forEach((l, b) => expect(Math.abs(l - PRINTED[b]), `band ${b}`).toBeLessThanOrEqual(0.05));
    expect(Math.abs(point.totalDbA - 42.23)).toBeLessThanOrEqual(0.05);
  });

  it("with one G everywhere it is the single-ground model (T03, Table 6: 32.48, 26.33, 27.03 dB at 125–500 Hz over G = 1)", () => {
    const bands = tr(1, 1, 1, 30).performers[0].bandsDb;
    [32.48, 26.33, 27.03].forEach((v, i) => expect(Math.abs(bands[i + 1] - v)).toBeLessThanOrEqual(0.05));
  });

  it("hears concrete stands around a press box (G 0) as less ground loss than grass there (Table 3 by hand)", () => {
    // Box 18 m up on the 50, 25 m behind the front sideline, its surroundings 25 m deep; a
    // performer 15 m onto a grass field (G 1). dp = 40 m: 15 m of field, then 25 m of stands.
    // 30·hs = 45 m and 30·hr = 540 m both exceed dp, so each region is the whole path (no middle
    // region, q = 0) and G_s = G_r = (15·1 + 25·G_stands)/40. At 250 Hz
    // A_gr = −3 + G·(b'(1.5) + b'(18)), b'(h) = 1.5 + 8.6·e^(−0.09h²)·(1 − e^(−dp/50)):
    // b'(1.5) = 5.367640, b'(18) = 1.500000, so stands of G 0 instead of G 1 lower G by 0.625 and
    // A_gr by 0.625 · 6.867640 = 4.292275 dB (python by hand).
    const run = (standsG: number) =>
      analyzeSet({
        performers: [performer({ id: "S", instrument: "flat93", x: 0, y: 15, z: 1.5, facingDeg: 180 })],
        listeningPoints: [{ id: "box", x: 0, y: -25, z: 18, groundFactor: standsG, surroundingsM: 25 }],
        conditions: { temperatureC: 20, relativeHumidityPct: 70, pressureKPa: 101.325, groundFactor: 1, betweenGroundFactor: 0 },
        instruments: { flat93: handSource([93, 93, 93, 93, 93, 93, 93, 93]) },
      }).points[0].performers[0].bandsDb;
    expect(run(0)[2] - run(1)[2]).toBeCloseTo(4.292275, 4);
    // Above 2 kHz Table 3 gives −1.5(1 − G) per region: 2 · 1.5 · 0.625 = 1.875 dB.
    expect(run(0)[6] - run(1)[6]).toBeCloseTo(1.875, 6);
  });
});
