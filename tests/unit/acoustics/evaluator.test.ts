// The set evaluator itself (evaluator.ts): what it refuses, how it indexes and moves performers,
// the near-field clamp and the source heights it keeps per performer. Levels are hand calculations
// from ISO 9613-2 eq. (7) (A_div = 20·lg r + 11 dB) with a flat hand source and no ground.
import { describe, expect, it } from "vitest";
import { analyzeSet, createSetEvaluator, MIN_DISTANCE_M, VOICES, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, handSource, performer } from "./helpers";

const FLAT_80 = handSource([80, 80, 80, 80, 80, 80, 80, 80]);
const input = (performers: PerformerInput[], extra: Partial<AnalysisInput> = {}): AnalysisInput => ({ performers, listeningPoints: [BOX], conditions: AIR, ...extra });

describe("createSetEvaluator refuses what it cannot evaluate", () => {
  it("an input or conditions that are not objects", () => {
    expect(() => createSetEvaluator(null as never)).toThrow("input must be an object");
    expect(() => createSetEvaluator({ ...input([]), conditions: null as never })).toThrow("conditions must be an object");
    expect(() => createSetEvaluator({ ...input([]), conditions: 3 as never })).toThrow("conditions must be an object");
  });

  it("positions that are not a list, or whose x, y or facing is not a finite number, naming the entry", () => {
    const ev = createSetEvaluator(input([performer({ id: "A" }), performer({ id: "B" })]));
    expect(() => ev.setPositions(null as never)).toThrow("positions must be an array");
    expect(() => ev.setPositions([{ performerId: "B", x: Number.NaN, y: 0, facingDeg: 0 }])).toThrow("positions[0].x must be a finite number");
    expect(() => ev.setPositions([{ performerId: "A", x: 0, y: 0, facingDeg: 0 }, { performerId: "B", x: 0, y: Infinity, facingDeg: 0 }])).toThrow("positions[1].y must be a finite number");
    expect(() => ev.setPositions([{ performerId: "B", x: 0, y: 0, facingDeg: Number.NaN }])).toThrow("positions[0].facingDeg must be a finite number");
    expect(() => ev.setPositions([null as never])).toThrow('positions[0].performerId "undefined" is not a performer of this set');
  });

  it("positions written straight into its arrays, checked at evaluate, naming the performer's index and the field", () => {
    const ev = createSetEvaluator(input([performer({ id: "A" }), performer({ id: "B" })]));
    ev.y[1] = Number.NaN;
    expect(() => ev.evaluate()).toThrow("positions[1].y must be a finite number");
    ev.y[1] = 0;
    ev.facingDeg[0] = Infinity;
    expect(() => ev.evaluate()).toThrow("positions[0].facingDeg must be a finite number");
  });
});

describe("the evaluator's performers", () => {
  it("lists them in input order, finds each by id and answers -1 for a stranger", () => {
    const ev = createSetEvaluator(input([performer({ id: "A" }), performer({ id: "B" })]));
    expect(ev.performerIds).toEqual(["A", "B"]);
    expect([ev.indexOf("A"), ev.indexOf("B"), ev.indexOf("C")]).toEqual([0, 1, -1]);
  });

  it("moves only the listed performers: a trumpet moved from 10 m to 40 m in front of the box loses 20·lg of the distance ratio (no ground, air aside)", () => {
    const at = (y: number) => performer({ id: "A", instrument: "flat", x: 0, y, facingDeg: 180 });
    const point = { id: "P", x: 0, y: 0, z: 1.5 };
    const ev = createSetEvaluator(input([at(10), performer({ id: "B", instrument: "flat", x: 5, y: 0, facingDeg: 0 })], { instruments: { flat: FLAT_80 }, listeningPoints: [point] }));
    ev.setPositions([{ performerId: "A", x: 0, y: 40, facingDeg: 180 }]);
    ev.evaluate();
    const r = ev.result().points[0]!;
    const direct = analyzeSet(input([at(40), performer({ id: "B", instrument: "flat", x: 5, y: 0, facingDeg: 0 })], { instruments: { flat: FLAT_80 }, listeningPoints: [point] })).points[0]!;
    expect(r.performers[0]!.bandsDb[0]).toBeCloseTo(direct.performers[0]!.bandsDb[0]!, 12);
    expect(r.performers[1]!.bandsDb[0]).toBeCloseTo(direct.performers[1]!.bandsDb[0]!, 12);
    // 63 Hz band: 80 − 20·lg 40 − 11 − α63·0.04 km (α ≈ 0.1 dB/km, under 0.005 dB here).
    expect(r.performers[0]!.bandsDb[0]).toBeCloseTo(80 - 20 * Math.log10(40) - 11, 2);
  });

  it("keeps the voices no one plays out of the mix at -Infinity and the sections in order of first appearance", () => {
    const ev = createSetEvaluator(input([performer({ id: "A", section: "trumpets", voice: "bass" }), performer({ id: "B", section: "cornets", voice: "bass" }), performer({ id: "C", section: "trumpets", voice: "bass" })]));
    const mix = ev.evaluate();
    expect(mix.sectionNames).toEqual(["trumpets", "cornets"]);
    VOICES.forEach((v, i) => expect(mix.voiceDbA[i] === -Infinity, v).toBe(v !== "bass"));
    expect(Object.keys(ev.result().points[0]!.voices)).toEqual(["bass"]);
  });
});

describe("distances", () => {
  it(`clamps a performer standing on the listening point to ${MIN_DISTANCE_M} m: 80 − (20·lg 0.5 + 11) = 75.02 dB`, () => {
    const point = { id: "P", x: 3, y: 7, z: 1.5 };
    const r = analyzeSet(input([performer({ id: "A", instrument: "flat", x: 3, y: 7, facingDeg: 0 })], { instruments: { flat: FLAT_80 }, listeningPoints: [point] })).points[0]!;
    // 63–500 Hz, where the air takes under 0.002 dB over half a metre (α ≤ 3 dB/km, ISO 9613-1).
    for (const l of r.performers[0]!.bandsDb.slice(0, 4)) expect(l).toBeCloseTo(80 - (20 * Math.log10(0.5) + 11), 2);
    // Arrival after 0.5 m at 343.2 m/s (20 °C, ISO 9613-1): 1.457 ms.
    expect(r.performers[0]!.arrivalMs).toBeCloseTo((0.5 / 343.2) * 1000, 2);
  });

  it("the arrival spread of one player, or of one player and a tacet one far off, is 0", () => {
    const one = analyzeSet(input([performer({ id: "A" })])).points[0]!;
    expect(one.arrivalSpreadMs).toBe(0);
    const withTacet = analyzeSet(input([performer({ id: "A" }), performer({ id: "T", voice: "tacet", y: 45 })])).points[0]!;
    expect(withTacet.arrivalSpreadMs).toBe(0);
  });

  it("keeps each performer's own height: a player raised to 3 m over ground (G = 1) at the same place differs from one at 1.5 m, and the next player at 1.5 m is heard as the first", () => {
    const ground = { ...AIR, groundFactor: 1 };
    const r = analyzeSet(
      input(
        [
          performer({ id: "L", instrument: "flat", x: 0, y: 10, facingDeg: 180 }),
          performer({ id: "H", instrument: "flat", x: 0, y: 10, z: 3, facingDeg: 180 }),
          performer({ id: "L2", instrument: "flat", x: 0, y: 10, facingDeg: 180 }),
        ],
        { instruments: { flat: FLAT_80 }, conditions: ground },
      ),
    ).points[0]!;
    const [low, high, low2] = r.performers.map((p) => p.bandsDb);
    expect(Math.max(...high!.map((l, b) => Math.abs(l - low![b]!)))).toBeGreaterThan(0.1);
    low2!.forEach((l, b) => expect(l).toBeCloseTo(low![b]!, 12));
  });
});

describe("several listening points and the mix", () => {
  const band = [
    performer({ id: "A", x: -6, y: 10, facingDeg: 180 }),
    performer({ id: "B", instrument: "tuba", section: "tubas", voice: "bass", x: 8, y: 30, facingDeg: 90 }),
    performer({ id: "C", instrument: "clarinet", section: "clarinets", voice: "countermelody", x: 0, y: 20, facingDeg: 0 }),
  ];
  const points = [BOX, { id: "side", x: -40, y: 25, z: 1.7 }, { id: "far", x: 30, y: 70, z: 10 }];
  const ground = { ...AIR, groundFactor: 0.5 };

  it("evaluates each point as if it were the only one: performers, sections, voices, total and spread", () => {
    const all = analyzeSet(input(band, { listeningPoints: points, conditions: ground })).points;
    points.forEach((pt, n) => {
      const alone = analyzeSet(input(band, { listeningPoints: [pt], conditions: ground })).points[0]!;
      expect(all[n]!.listeningPointId).toBe(pt.id);
      expect(all[n]!.totalDbA).toBeCloseTo(alone.totalDbA, 12);
      expect(all[n]!.arrivalSpreadMs).toBeCloseTo(alone.arrivalSpreadMs, 12);
      for (const s of ["trumpets", "tubas", "clarinets"]) {
        expect(all[n]!.sections[s]!.dbA).toBeCloseTo(alone.sections[s]!.dbA, 12);
        expect(all[n]!.sections[s]!.bandsDb[3]).toBeCloseTo(alone.sections[s]!.bandsDb[3]!, 12);
      }
      for (const v of ["melody", "bass", "countermelody"] as const) {
        expect(all[n]!.voices[v]!.dbA).toBeCloseTo(alone.voices[v]!.dbA, 12);
        expect(all[n]!.voices[v]!.bandsDb[5]).toBeCloseTo(alone.voices[v]!.bandsDb[5]!, 12);
      }
      all[n]!.performers.forEach((p, k) => {
        expect(p.dbA).toBeCloseTo(alone.performers[k]!.dbA, 12);
        expect(p.arrivalMs).toBeCloseTo(alone.performers[k]!.arrivalMs, 12);
        expect(p.bandsDb[2]).toBeCloseTo(alone.performers[k]!.bandsDb[2]!, 12);
      });
    });
  });

  it("gives a performer's dBA as the A-weighted energy sum of its bands (IEC 61672-1 octave A-weights −26.2 … −1.1 dB, within the 0.13 dB the nominal centres move them)", () => {
    const A = [-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1];
    const p = analyzeSet(input(band)).points[0]!.performers[1]!;
    const byHand = 10 * Math.log10(p.bandsDb.reduce((s, l, b) => s + 10 ** ((l + A[b]!) / 10), 0));
    expect(Math.abs(p.dbA - byHand)).toBeLessThan(0.15);
  });

  it("spreads arrivals from the nearest to the farthest player, in any order: players 10, 30 and 20 m from a point at their height arrive over 20 m / 343.2 m/s = 58.3 ms (20 °C)", () => {
    const point = { id: "P", x: 0, y: 0, z: 1.5 };
    const r = analyzeSet(input([10, 30, 20].map((y, k) => performer({ id: `T${k}`, x: 0, y })), { listeningPoints: [point] })).points[0]!;
    expect(r.arrivalSpreadMs).toBeCloseTo((20 / 343.2) * 1000, 6);
  });
});

describe("ground by region in the evaluator (ISO 9613-2 §7.3.1)", () => {
  // Grass (G = 1) everywhere against one region made hard (G = 0): hard ground takes less in the
  // 250 Hz–1 kHz bands (Table 3: the ground terms scale with G), so the point hears more.
  const band = [performer({ id: "A", x: -4, y: 10, facingDeg: 180 }), performer({ id: "B", x: 6, y: 30, z: 2.5, facingDeg: 180 })];
  const point = (over: object = {}) => ({ ...BOX, z: 2, y: -60, ...over });
  const run = (conditions: object, pt = point()) => analyzeSet(input(band, { conditions: { ...AIR, groundFactor: 1, ...conditions }, listeningPoints: [pt] })).points[0]!;

  it("concrete around the point alone, or a hard track between alone, each make the point louder than grass everywhere", () => {
    const grass = run({});
    const concrete = run({ betweenGroundFactor: 1 }, point({ groundFactor: 0, surroundingsM: 40 }));
    const track = run({ betweenGroundFactor: 0 }, point({ groundFactor: 1 }));
    expect(concrete.totalDbA).toBeGreaterThan(grass.totalDbA + 0.1);
    expect(track.totalDbA).toBeGreaterThan(grass.totalDbA + 0.1);
  });

  it("gives each performer on a mixed path its own source terms: each is heard as when it plays alone", () => {
    const cond = { ...AIR, groundFactor: 1, betweenGroundFactor: 0 };
    const both = analyzeSet(input(band, { conditions: cond, listeningPoints: [point()] })).points[0]!;
    band.forEach((p, k) => {
      const alone = analyzeSet(input([p], { conditions: cond, listeningPoints: [point()] })).points[0]!;
      alone.performers[0]!.bandsDb.forEach((l, b) => expect(both.performers[k]!.bandsDb[b]).toBeCloseTo(l, 12));
    });
  });
});
