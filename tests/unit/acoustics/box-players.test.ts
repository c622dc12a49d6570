// box-players.ts alone: which performers of a set are joined with their result at a listening
// point, the distance measured to the right point, what it refuses (messages name the field and
// the performer), and the energetic mean per player.
import { describe, expect, it } from "vitest";
import { meanPerPlayerDb, soundingPlayers } from "@/lib/acoustics/box-players";
import type { AnalysisInput, PerformerInput, PerformerResult, PointResult } from "@/lib/acoustics";
import { AIR, BOX, performer } from "./helpers";

// A result entry written by hand: the module only copies these numbers, so no engine run is needed.
const entry = (id: string, dbA: number): PerformerResult => ({ id, dbA, bandsDb: [dbA - 9, dbA - 9, dbA - 9, dbA - 9, dbA - 9, dbA - 9, dbA - 9, dbA - 9], arrivalMs: 100 });
const pointResult = (listeningPointId: string, performers: PerformerResult[]): PointResult => ({
  listeningPointId,
  totalDbA: 0,
  voices: {},
  sections: {},
  performers,
  arrivalSpreadMs: 0,
});
// A second point: 12 m in front of T1 (x 3, y 10) and 5 m above its default source height of
// 1.5 m, so 13 m away (a 5-12-13 triangle). The box is sqrt(3² + 35² + 16.5²) ≈ 38.8 m from it.
const END = { id: "end", x: 3, y: -2, z: 6.5 };
const input = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [BOX, END], conditions: AIR });

describe("soundingPlayers", () => {
  it("measures each player's distance to the point the result is for, not the first point", () => {
    const players = soundingPlayers(input([performer({ id: "T1", x: 3, y: 10 })]), pointResult("end", [entry("T1", 70)]));
    expect(players).toHaveLength(1);
    expect(players[0]!.distanceM).toBeCloseTo(13, 12);
    expect(players[0]!.dbA).toBe(70);
  });

  it("leaves out a tacet performer, whether or not the result has an entry for them", () => {
    const set = input([performer({ id: "T1", x: 3, y: 10 }), performer({ id: "T2", voice: "tacet" })]);
    expect(soundingPlayers(set, pointResult("end", [entry("T1", 70)])).map((p) => p.id)).toEqual(["T1"]);
    expect(soundingPlayers(set, pointResult("end", [entry("T1", 70), entry("T2", 65)])).map((p) => p.id)).toEqual(["T1"]);
  });

  it("leaves out a performer whose level at the point is -Infinity (nothing arrives)", () => {
    const set = input([performer({ id: "T1", x: 3, y: 10 }), performer({ id: "T2" })]);
    expect(soundingPlayers(set, pointResult("end", [entry("T1", 70), entry("T2", -Infinity)])).map((p) => p.id)).toEqual(["T1"]);
  });

  it("refuses a result with no entry for a sounding performer, naming the performer", () => {
    const set = input([performer({ id: "T1", x: 3, y: 10 }), performer({ id: "T2" })]);
    expect(() => soundingPlayers(set, pointResult("end", [entry("T1", 70)]))).toThrow(/^pointResult\.performers has no entry for performer "T2"$/);
  });

  it("refuses an instrument missing from the catalog, naming it", () => {
    const set = input([performer({ id: "T1", instrument: "no-such-horn" })]);
    expect(() => soundingPlayers(set, pointResult("end", [entry("T1", 70)]))).toThrow(/^performers\.instrument "no-such-horn" is not in the instrument catalog$/);
  });
});

describe("meanPerPlayerDb", () => {
  it("gives the energetic mean: four players at 90 dB average 90 dB, 80 and 90 dB average 87.40 dB", () => {
    expect(meanPerPlayerDb([90, 90, 90, 90])).toBeCloseTo(90, 9);
    // 10·lg((10^8 + 10^9) / 2) = 10·lg(5.5e8) = 87.4036 (hand calculation).
    expect(meanPerPlayerDb([80, 90])).toBeCloseTo(87.4036, 4);
  });
});
