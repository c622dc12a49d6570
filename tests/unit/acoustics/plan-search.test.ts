// The plan's search on models small enough to work out by hand: the objective at given steps (the
// written shape's cost, soft and hard), the coordinate descent that gives the first plan, the node cap,
// and how little of the tree the bounds let the search visit. The exhaustive check in
// plan-optimum.test.ts judges the search's results with the same objective; these tests pin the
// objective itself and the search's own steps. Hand calculations, checked line by line in the comments.
import { describe, expect, it } from "vitest";
import { planProblem } from "@/lib/acoustics/plan";
import type { PlanModel, PlanUnit, Residual, ShapePair } from "@/lib/acoustics/plan-model";
import { CHANGE_WEIGHT, SHAPE_WEIGHT, costAtSteps, searchPlan } from "@/lib/acoustics/plan-search";
import { BOX } from "./helpers";
import { randomCase } from "./plan-cases";

/** A unit written at `base` (index in pp…fff), allowed kMin…kMax steps. */
const unit = (section: string, base: number, kMin = -2, kMax = 2, voice: PlanUnit["voice"] = "accompaniment"): PlanUnit => ({
  section,
  voice,
  writtenDynamic: "mf",
  base,
  performerIds: [section],
  kind: "winds",
  solo: false,
  kMin,
  kMax,
});

/** A group level read as the change of energy itself (dB): level = 10·log10(energy), written at 0 dB. */
const DB = { read: (db: number) => db } as PlanModel["loudness"][number];

/**
 * A model whose group g holds unit g alone, at the given levels (dB) for steps kMin…kMax, with the
 * residuals and shape given. No players: the search reads only units, groups, tables, residuals and shape.
 */
function model(units: PlanUnit[], levels: number[][], residuals: Residual[], shape: ShapePair[]): PlanModel {
  return {
    units,
    playerUnit: new Int32Array(0),
    playerBase: new Int32Array(0),
    playerEnergy: [],
    groups: units.map(() => []),
    heldEnergy: new Float64Array(units.length),
    groupUnits: units.map((_, g) => Int32Array.of(g)),
    stepEnergy: levels.map((l) => [Float64Array.from(l, (db) => 10 ** (db / 10))]),
    writtenDb: new Float64Array(units.length),
    loudness: units.map(() => DB),
    isLoudness: units.map(() => false),
    residuals,
    shape,
  };
}

/** The target "group g at least `db` dB": residual max(0, db − L[g]). */
const atLeast = (g: number, db: number): Residual => ({ kind: "heard", terms: [{ group: g, coef: -1 }], c: db, key: `g${g}`, set: "", state: () => "", aim: "", units: [g] });

/** Change at the point per step: 3 dB a step, as a wind's step is about (common practice, no source). */
const change = (units: PlanUnit[]) => units.map((u) => Array.from({ length: u.kMax - u.kMin + 1 }, (_, i) => 3 * (u.kMin + i)));
/** Levels 3 dB a step around `written` dB, steps −2…2. */
const around = (written: number) => [-6, -3, 0, 3, 6].map((d) => written + d);

describe("the plan's objective at given steps (costAtSteps)", () => {
  // Trumpets written mf (3) over horns written mp (2): a soft pair of the written shape. No targets.
  const soft = [unit("trumpets", 3), unit("horns", 2)];
  const softModel = model(soft, [around(70), around(70)], [], [{ louder: 0, softer: 1, hard: false }]);

  it("is zero as written, with the written shape kept and nothing changed", () => {
    expect(costAtSteps(softModel, change(soft), [0, 0])).toBe(0);
  });

  it("costs each step a softer section is planned above a louder one, squared, at SHAPE_WEIGHT; and each dB of change at CHANGE_WEIGHT, squared", () => {
    // k = (−1, +1): trumpets at 3 − 1 = 2, horns at 2 + 1 = 3, one step above: 0.25 · 1² = 0.25;
    // changes −3 and +3 dB: (0.01 · 3)² · 2 = 0.0018. Total 0.2518.
    expect(costAtSteps(softModel, change(soft), [-1, 1])).toBeCloseTo(0.2518, 12);
    // k = (−2, +2): trumpets at 1, horns at 4, three steps above: 0.25 · 9 = 2.25; changes ±6 dB: (0.06)² · 2 = 0.0072.
    expect(costAtSteps(softModel, change(soft), [-2, 2])).toBeCloseTo(2.2572, 12);
    // Level with each other (trumpets at 2, horns at 2): the shape is given up by nothing; changes −3 and 0 dB.
    expect(costAtSteps(softModel, change(soft), [-1, 0])).toBeCloseTo(0.0009, 12);
    // Both up one step: the shape stays.
    expect(costAtSteps(softModel, change(soft), [1, 1])).toBeCloseTo(0.0018, 12);
    expect(SHAPE_WEIGHT).toBe(0.25);
    expect(CHANGE_WEIGHT).toBe(0.01);
  });

  it("refuses (Infinity) the melody planned further under a harmony voice than written, and steps outside the range or between whole steps", () => {
    // The melody (flutes, written mp = 2) under the accompaniment (mf = 3): a hard pair that allows
    // the written one step under, no more.
    const units = [unit("flutes", 2, -2, 2, "melody"), unit("horns", 3)];
    const m = model(units, [around(70), around(70)], [], [{ louder: 0, softer: 1, hard: true }]);
    const ch = change(units);
    expect(costAtSteps(m, ch, [0, 0])).toBeCloseTo(0, 12); // one step under, as written
    expect(costAtSteps(m, ch, [-1, 0])).toBe(Infinity); // two steps under
    expect(costAtSteps(m, ch, [0, 1])).toBe(Infinity);
    expect(costAtSteps(m, ch, [1, 0])).toBeCloseTo(0.0009, 12); // level: allowed
    expect(costAtSteps(m, ch, [2, 0])).toBeCloseTo(0.0036, 12); // above: allowed, and no shape cost
    // Written level with each other (both mf): the melody may not go under at all.
    const even = [unit("flutes", 3, -2, 2, "melody"), unit("horns", 3)];
    const evenModel = model(even, [around(70), around(70)], [], [{ louder: 0, softer: 1, hard: true }]);
    expect(costAtSteps(evenModel, change(even), [0, 0])).toBe(0);
    expect(costAtSteps(evenModel, change(even), [0, 1])).toBe(Infinity);
    expect(costAtSteps(evenModel, change(even), [-1, -1])).toBeCloseTo(0.0018, 12);
    // Outside a unit's range, or not a whole step.
    expect(costAtSteps(m, ch, [3, 0])).toBe(Infinity);
    expect(costAtSteps(m, ch, [0, -3])).toBe(Infinity);
    expect(costAtSteps(m, ch, [0.5, 0])).toBe(Infinity);
  });

  it("adds each missed target's shortfall in dB, squared", () => {
    // Horns alone, written at 77 dB (steps −2…2: 71, 74, 77, 80, 83), asked for at least 80 dB.
    const units = [unit("horns", 3)];
    const m = model(units, [around(77)], [atLeast(0, 80)], []);
    const ch = change(units);
    expect(costAtSteps(m, ch, [0])).toBeCloseTo(9, 9); // 3 dB short
    expect(costAtSteps(m, ch, [-1])).toBeCloseTo(36 + 0.0009, 9); // 6 dB short, 3 dB changed
    expect(costAtSteps(m, ch, [1])).toBeCloseTo(0.0009, 9); // met, 3 dB changed
    expect(costAtSteps(m, ch, [2])).toBeCloseTo(0.0036, 9); // met with room, 6 dB changed
  });
});

describe("the search (searchPlan)", () => {
  // Trumpets (mf) over horns (mp), soft pair; the horns are asked for 6 dB more than written.
  const units = [unit("trumpets", 3), unit("horns", 2)];
  const m = model(units, [around(80), around(70)], [atLeast(1, 76)], [{ louder: 0, softer: 1, hard: false }]);
  const ch = change(units);

  it("starts from a coordinate descent that goes round until no section improves", () => {
    // With no node to visit, the plan is the descent's. Round 1: the trumpets stay (any step only costs
    // change); the horns take +2 (cost 0.25 for one step over the trumpets + 0.0036) rather than stay
    // (6 dB short: 36) or +1 (3 dB short: 9 + 0.0009 + 0). Round 2: the trumpets take +1, which ends the
    // shape's cost (0.0009 + 0.0036 = 0.0045 < 0.2536). Round 3: nothing improves.
    const first = searchPlan(m, ch, 0);
    expect(first.k).toEqual([1, 2]);
    expect(first.cost).toBeCloseTo(0.0045, 12);
    expect(first.proven).toBe(false);
    expect(first.nodes).toBe(1);
  });

  it("finds the optimum the descent cannot reach when a hard pair blocks every single step", () => {
    // Flutes (melody) and horns both written mf, the melody never under the horns; the horns are
    // asked for 6 dB more. One section at a time, nothing improves: the horns alone would go over the
    // melody (Infinity), the flutes alone only cost change. Both up two steps meets the target.
    const u2 = [unit("flutes", 3, -2, 2, "melody"), unit("horns", 3)];
    const m2 = model(u2, [around(80), around(70)], [atLeast(1, 76)], [{ louder: 0, softer: 1, hard: true }]);
    const ch2 = change(u2);
    expect(searchPlan(m2, ch2, 0).k).toEqual([0, 0]);
    const best = searchPlan(m2, ch2);
    expect(best.k).toEqual([2, 2]);
    expect(best.cost).toBeCloseTo(0.0072, 12);
    expect(best.proven).toBe(true);
  });

  it("stops at its node cap and says the plan is not proven, and not one node before", () => {
    const u2 = [unit("flutes", 3, -2, 2, "melody"), unit("horns", 3)];
    const m2 = model(u2, [around(80), around(70)], [atLeast(1, 76)], [{ louder: 0, softer: 1, hard: true }]);
    const ch2 = change(u2);
    const full = searchPlan(m2, ch2);
    expect(full.nodes).toBeGreaterThan(2);
    const atCap = searchPlan(m2, ch2, full.nodes);
    expect(atCap).toEqual(full);
    // Under any smaller cap: the node over the cap is counted, and the search ends there at every depth.
    for (let cap = 0; cap < full.nodes; cap++) {
      const short = searchPlan(m2, ch2, cap);
      expect(short.proven, `cap ${cap}`).toBe(false);
      expect(short.nodes, `cap ${cap}`).toBe(cap + 1);
    }
  });

  it("returns what is written, proven, for a model with no sections", () => {
    expect(searchPlan(model([], [], [], []), [])).toEqual({ k: [], cost: 0, proven: true, nodes: 0 });
  });

  it("with the optimum at what is written, visits only the first section's steps", () => {
    // Nothing to gain: the descent's plan (as written, cost 0) is the bound every branch must beat.
    const quiet = model(units, [around(80), around(70)], [atLeast(1, 60)], [{ louder: 0, softer: 1, hard: false }]);
    const r = searchPlan(quiet, ch);
    expect(r).toMatchObject({ k: [0, 0], cost: 0, proven: true, nodes: 5 });
  });

  it("proves every optimum of 200 seeded bands while visiting a small part of their trees", () => {
    // Measured when written: 16,302 nodes over the 200 cases, of 500,242 in their trees (3.3 %). The cap
    // below is 7 % over that. Without the first plan from the descent the search visits 29,390; with the
    // sections in their own order instead of the most constrained first, 40,944; with a bound that
    // counts the free sections' targets less than it may, 18,200–19,000. A change to the plan's model
    // moves these counts: measure again and keep the cap near the new figure.
    let nodes = 0;
    let tree = 0;
    for (let seed = 1; seed <= 200; seed++) {
      const { input, limits } = randomCase(seed);
      const p = planProblem([input], BOX.id, null, limits);
      const r = searchPlan(p.model, p.change);
      expect(r.proven, `seed ${seed}`).toBe(true);
      nodes += r.nodes;
      tree += p.model.units.reduce((t, u) => t * (u.kMax - u.kMin + 1), 1);
    }
    expect(nodes).toBeLessThan(17_500);
    expect(nodes).toBeLessThan(tree / 20);
  }, 60_000);
});
