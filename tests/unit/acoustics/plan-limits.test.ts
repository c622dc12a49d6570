// The musical limits of the balance plan (common practice, no source): each limit holds on seeded
// random bands and bites where it should, and the deterministic cases a director would recognise.
import { describe, expect, it } from "vitest";
import {
  DYNAMICS,
  analyzeSet,
  applyPlan,
  checkBalance,
  planCost,
  resolveLimits,
  solveBalancePlan,
  type AnalysisInput,
  type MusicalLimits,
  type PerformerInput,
  type PlanEntryDetail,
} from "@/lib/acoustics";
import { AIR, BOX, facingToward, lazy, performer } from "./helpers";
import { randomCase } from "./plan-cases";

const input = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [BOX], conditions: AIR });
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) => performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
const idx = (d: string) => DYNAMICS.indexOf(d as (typeof DYNAMICS)[number]);
const steps = (e: PlanEntryDetail) => idx(e.playedDynamic) - idx(e.writtenDynamic);
const HARMONY = ["countermelody", "accompaniment", "bass"];

/** Pairs of the same kind where one written louder is planned softer (the written shape given up). */
function inversions(entries: PlanEntryDetail[]) {
  let n = 0;
  for (const a of entries) {
    for (const b of entries) {
      if (a === b || a.kind !== b.kind || idx(a.writtenDynamic) <= idx(b.writtenDynamic)) continue;
      if (b.voice === "melody" && HARMONY.includes(a.voice)) continue; // the melody may rise over its accompaniment
      if (idx(a.playedDynamic) < idx(b.playedDynamic)) n++;
    }
  }
  return n;
}

/** Melody entries planned further under a harmony entry of the same kind than written. */
function melodyUnder(entries: PlanEntryDetail[]) {
  return entries.filter((m) => m.voice === "melody").flatMap((m) =>
    entries.filter((a) => a.kind === m.kind && HARMONY.includes(a.voice) && idx(m.playedDynamic) - idx(a.playedDynamic) < Math.min(0, idx(m.writtenDynamic) - idx(a.writtenDynamic))),
  );
}

const SEEDS = Array.from({ length: 250 }, (_, i) => 5000 + i);
const plans = (limits: Partial<MusicalLimits>) => SEEDS.map((seed) => solveBalancePlan([randomCase(seed).input], BOX.id, null, undefined, limits));

describe("musical limits on seeded random bands", () => {
  // Computed inside the tests (lazy), never while vitest collects the file: see helpers.ts.
  const defaults = lazy(() => plans({}));
  const free = lazy(() => plans({ windSteps: 6, percussionSteps: 6, keepShape: false }));

  it("moves winds at most 2 steps and the battery and front ensemble at most 1 by default, where the full range would move them further", () => {
    for (const plan of defaults()) for (const e of plan.entries) expect(Math.abs(steps(e))).toBeLessThanOrEqual(e.kind === "winds" ? 2 : 1);
    expect(free().some((p) => p.entries.some((e) => e.kind === "winds" && Math.abs(steps(e)) > 2))).toBe(true);
    expect(free().some((p) => p.entries.some((e) => e.kind === "percussion" && Math.abs(steps(e)) > 1))).toBe(true);
  });

  it("never plans the melody under its accompaniment, which a plan without the shape does", () => {
    for (const plan of defaults()) expect(melodyUnder(plan.entries)).toEqual([]);
    expect(free().some((p) => melodyUnder(p.entries).length > 0)).toBe(true);
  });

  it("keeps the written shape unless a target needs it: fewer inversions than without the shape, and each one pays for itself", () => {
    const wide = plans({ windSteps: 6, percussionSteps: 6 });
    let fewer = 0;
    wide.forEach((plan, n) => {
      if (inversions(plan.entries) < inversions(free()[n]!.entries)) fewer++;
      // An inversion kept is worth more to the targets than the shape it costs: the plan costs less than
      // what is written, which has none.
      if (inversions(plan.entries) > 0) {
        const { input } = randomCase(SEEDS[n]!);
        const written = plan.entries.map((e) => ({ ...e, playedDynamic: e.writtenDynamic }));
        expect(plan.cost).toBeLessThan(planCost([input], BOX.id, null, written, { windSteps: 6, percussionSteps: 6 }));
      }
    });
    expect(fewer).toBeGreaterThan(0);
  });

  it("prices any plan outside the limits at Infinity", () => {
    const { input } = randomCase(SEEDS[0]!);
    const plan = solveBalancePlan([input], BOX.id);
    const e = plan.entries[0]!;
    const far = e.writtenDynamic === "pp" || e.writtenDynamic === "p" || e.writtenDynamic === "mp" ? "fff" : "pp";
    expect(planCost([input], BOX.id, null, [{ ...e, playedDynamic: far }])).toBe(Infinity);
    expect(planCost([input], BOX.id, null, plan.entries)).toBeCloseTo(plan.cost, 9);
  });
});

describe("musical limits: the cases a director would recognise", () => {
  it("plans a clarinet melody written p over a p brass chorale up to mf (two steps) and no further, and says it stops there", () => {
    const clarinets = [-6, -4, -2, 0, 2, 4, 6, 8].map((x, k) => at({ id: `C${k}`, x, y: 18, instrument: "clarinet", section: "Clarinets", voice: "melody", dynamic: "p" }));
    const brass = [
      ...[-8, -6, -4, -2, 0, 2, 4, 6].map((x, k) => at({ id: `T${k}`, x, y: 26, section: "Trumpets", voice: "accompaniment", dynamic: "p" })),
      ...[-4, 0, 4, 8].map((x, k) => at({ id: `M${k}`, x, y: 28, instrument: "mellophone", section: "Mellophones", voice: "accompaniment", dynamic: "p" })),
      ...[-3, 3].map((x, k) => at({ id: `U${k}`, x, y: 32, instrument: "tuba", section: "Tubas", voice: "bass", dynamic: "p" })),
    ];
    const band = input([...clarinets, ...brass]);
    const plan = solveBalancePlan([band], BOX.id);
    const c = plan.entries.find((e) => e.section === "Clarinets")!;
    expect(c).toMatchObject({ writtenDynamic: "p", playedDynamic: "mf", atLimit: "mf" });
    expect(plan.unmet.some((u) => u.kind === "melody-lead")).toBe(true);
    // With the whole range allowed the melody gets its lead: the limit, not the solver, stopped it.
    const wide = solveBalancePlan([band], BOX.id, null, undefined, { windSteps: 6 });
    const applied = applyPlan(band, wide.entries);
    expect(checkBalance(applied, analyzeSet(applied).points[0]!)[0]).toMatchObject({ id: "melody-forward", passed: true });
  });

  it("asks cymbals written fff over a soft melody for one step back, not fff → pp", () => {
    const band = input([
      ...[-2, 0, 2].map((x, k) => at({ id: `F${k}`, x, y: 30, instrument: "flute", section: "Flutes", voice: "melody", dynamic: "mp" })),
      ...[-1, 1].map((x, k) => at({ id: `Y${k}`, x, y: 4, instrument: "cymbals", section: "Cymbals", voice: "percussion", dynamic: "fff" })),
    ]);
    const cymbals = solveBalancePlan([band], BOX.id).entries.find((e) => e.section === "Cymbals")!;
    expect(cymbals).toMatchObject({ kind: "percussion", writtenDynamic: "fff", playedDynamic: "ff", atLimit: "ff" });
    expect(solveBalancePlan([band], BOX.id, null, undefined, { percussionSteps: 6 }).entries.find((e) => e.section === "Cymbals")!.playedDynamic).toBe("pp");
  });

  it("changes nothing when every balance check passes as written, even with a target of its own (blend) missed", () => {
    const band = input([
      // A trumpet melody at mp: at f it would mask the woodwinds' accompaniment (heard-at-box).
      ...[-2, 0, 2].map((x, k) => at({ id: `T${k}`, x, y: 8, voice: "melody", dynamic: "mp" })),
      ...[-3, -1, 1, 3].map((x, k) => at({ id: `A${k}`, x, y: 14, instrument: "alto-sax", section: "Alto Saxes", voice: "accompaniment", dynamic: "mp" })),
      ...[-3, -1, 1, 3].map((x, k) => at({ id: `F${k}`, x, y: 14, instrument: "flute", section: "Flutes", voice: "accompaniment", dynamic: "p" })),
    ]);
    expect(checkBalance(band, analyzeSet(band).points[0]!).every((c) => c.passed)).toBe(true);
    const plan = solveBalancePlan([band], BOX.id);
    expect(plan.nothingToChange).toBe(true);
    expect(plan.entries.every((e) => e.playedDynamic === e.writtenDynamic && e.changeDb === 0)).toBe(true);
    expect(plan.unmet).toEqual([]);
    // The blend is missed as written: without the rule the plan would move a section.
    const flutesUp = plan.entries.map((e) => (e.section === "Flutes" ? { ...e, playedDynamic: "mp" as const } : e));
    expect(planCost([band], BOX.id, null, flutesUp)).toBe(Infinity);
  });

  it("reads limits over the defaults and refuses values a director could not mean", () => {
    expect(resolveLimits(null, { windSteps: 3 }, { keepShape: false })).toEqual({ windSteps: 3, percussionSteps: 1, keepShape: false });
    expect(() => resolveLimits({ windSteps: 7 })).toThrow(/windSteps/);
    expect(() => resolveLimits({ percussionSteps: 1.5 })).toThrow(/whole number/);
  });

  it("names the limit that is not a whole number of steps, and refuses a keep-shape that is not true or false", () => {
    expect(() => resolveLimits({ windSteps: 2 }, { percussionSteps: 0.5 })).toThrow(/^limits\.percussionSteps must be a whole number of steps$/);
    for (const keepShape of ["no", 0, null]) {
      expect(() => resolveLimits({ keepShape } as unknown as Partial<MusicalLimits>)).toThrow(/^limits\.keepShape must be true or false$/);
    }
  });
});
