// Performer marks: the wedge's spread comes from the catalog's directivity tables (lib/acoustics/
// catalog.ts; its patterns follow Pätynen & Lokki, Acta Acustica united with Acustica 96 (2010),
// as the catalog notes), read at 2 kHz where the level falls 3 dB (the half-power beam edge; the
// convention from memory). Expected angles are worked by hand from the tables' numbers.
import { describe, expect, it } from "vitest";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { instrumentSpreadDeg, soundSpreadDeg, spreadKind, wedgePath, wedgePoints } from "@/lib/field/marks";

const spread = (key: string) => soundSpreadDeg(DEFAULT_INSTRUMENTS[key]!.directivity);

describe("soundSpreadDeg", () => {
  it("reads the trumpet's 2 kHz row (0, −3 at 45°): the beam edge at 45°", () => {
    expect(spread("trumpet")).toBeCloseTo(45, 9);
  });

  it("interpolates the saxophone's row (−1.5 at 45°, −4 at 90°): 45 + 1.5/2.5 × 45 = 72°", () => {
    expect(spread("alto-sax")).toBeCloseTo(72, 9);
  });

  it("gives the flute 105° (−2.5 at 90°, −4 at 135°) and drums all round (never 3 dB down)", () => {
    expect(spread("flute")).toBeCloseTo(105, 9);
    expect(spread("snare")).toBe(180);
  });

  it("orders the families as the trade knows them: bells-forward brass narrow, woodwinds wide, drums all round", () => {
    for (const k of ["trumpet", "mellophone", "trombone", "tuba"]) expect(spreadKind(spread(k)), k).toBe("narrow");
    for (const k of ["flute", "clarinet", "piccolo"]) expect(spreadKind(spread(k)), k).toBe("wide");
    for (const k of ["snare", "tenors", "bass-drum", "cymbals"]) expect(spreadKind(spread(k)), k).toBe("all round");
  });
});

describe("wedgePoints", () => {
  it("points down the screen for facing the press box and right for side 2, with the apex at the dot", () => {
    const down = wedgePoints(0, 45, 10);
    expect(down[0]).toEqual([0, 0]);
    const mid = down[Math.floor(down.length / 2) + 0]!;
    expect(mid[0]).toBeCloseTo(0, 9);
    expect(mid[1]).toBeCloseTo(10, 9);
    const right = wedgePoints(90, 45, 10);
    const rmid = right[Math.floor(right.length / 2)]!;
    expect(rmid[0]).toBeCloseTo(10, 9);
    expect(rmid[1]).toBeCloseTo(0, 9);
    // The arc's ends are 45° either side of the facing.
    const first = down[1]!;
    expect(Math.atan2(first[0], first[1]) * (180 / Math.PI)).toBeCloseTo(-45, 9);
  });

  it("draws the whole circle, without an apex, when the instrument sounds all round", () => {
    const circle = wedgePoints(30, 180, 5);
    for (const [x, y] of circle) expect(Math.hypot(x, y)).toBeCloseTo(5, 9);
    expect(wedgePath(0, 0, 30, 180, 5)).toMatch(/^M.* Z$/);
  });
});

describe("instrumentSpreadDeg", () => {
  it("reads the catalog's instrument, and draws one it lacks all round", () => {
    expect(instrumentSpreadDeg("trumpet")).toBeCloseTo(45, 9);
    expect(instrumentSpreadDeg("kazoo")).toBe(180);
    expect(instrumentSpreadDeg("toString")).toBe(180);
  });
});
