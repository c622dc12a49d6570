// The balance plan against exhaustive search of its own objective: on seeded random bands of 2–5
// sections (sections mixing registers included, e.g. trumpets and tubas in one section), every
// combination of whole dynamic steps the musical limits allow is tried, and the production solver
// must reach the least cost found there and never report a target unmet that the optimum meets.
// The exhaustive search is the check (a plain enumeration, no bounds); the objective is the one
// planCost exposes, as the issue defines it.
import { describe, expect, it } from "vitest";
import { planCost, solveBalancePlan } from "@/lib/acoustics";
import { planProblem, unmetAtSteps } from "@/lib/acoustics/plan";
import { costAtSteps } from "@/lib/acoustics/plan-search";
import { BOX } from "./helpers";
import { randomCase } from "./plan-cases";

/** Least cost over every allowed combination of steps, by plain enumeration. */
function exhaustive(problem: ReturnType<typeof planProblem>) {
  const m = problem.model;
  const k = m.units.map((u) => u.kMin);
  let best = Infinity;
  let bestK = [...k];
  for (;;) {
    const c = costAtSteps(m, problem.change, k);
    if (c < best) {
      best = c;
      bestK = [...k];
    }
    let u = 0;
    while (u < k.length && k[u] === m.units[u]!.kMax) k[u] = m.units[u++]!.kMin;
    if (u === k.length) break;
    k[u]!++;
  }
  return { cost: best, k: bestK };
}

describe("balance plan: the exhaustive optimum of its own cost", () => {
  // npm test: 1,000 cases. Mutation runs (tests/unit/mutation-setup.ts) take fewer, so that every mutant
  // of the solver meets the exhaustive check without the run taking days.
  const CASES = Number(process.env.FARFIELD_PLAN_CASES ?? 1000);
  it(`reaches it on at least 99.5 % of ${CASES} seeded cases and never reports a target unmet that the optimum meets`, () => {
    let agree = 0;
    let unmetWrongly = 0;
    let mixedCases = 0;
    const misses: string[] = [];
    for (let seed = 1; seed <= CASES; seed++) {
      const { input, limits } = randomCase(seed);
      const problem = planProblem([input], BOX.id, null, limits);
      const optimum = exhaustive(problem);
      const plan = solveBalancePlan([input], BOX.id, null, undefined, limits);
      if (problem.model.units.some((u) => new Set(u.performerIds.map((id) => input.performers.find((p) => p.id === id)!.instrument)).size > 1)) mixedCases++;
      // The reported cost is the objective of the entries reported.
      expect(plan.cost).toBeCloseTo(planCost([input], BOX.id, null, plan.entries, limits), 9);
      if (plan.cost <= optimum.cost + 1e-9 * (1 + optimum.cost)) agree++;
      else misses.push(`seed ${seed}: ${plan.cost.toFixed(4)} vs ${optimum.cost.toFixed(4)}`);
      const metByOptimum = new Set(problem.model.residuals.map((r) => r.key));
      for (const u of unmetAtSteps(problem.model, optimum.k).unmet) metByOptimum.delete(u.key);
      if (plan.unmet.some((u) => metByOptimum.has(u.key))) unmetWrongly++;
    }
    const share = (100 * agree) / CASES;
    console.log(`balance plan vs exhaustive search: ${agree} of ${CASES} cases at the optimum (${share.toFixed(2)} %), ${mixedCases} with a section mixing registers; targets reported unmet that the optimum meets: ${unmetWrongly}${misses.length ? `; misses: ${misses.slice(0, 5).join("; ")}` : ""}`);
    expect(mixedCases).toBeGreaterThan(CASES / 10);
    expect(share).toBeGreaterThanOrEqual(99.5);
    expect(unmetWrongly).toBe(0);
  }, 120_000);
});
