// The balance plan's objective over whole dynamic steps, and its exact minimum by branch and bound.
//
// Objective: Σ (target residual, dB)² + Σ (CHANGE_WEIGHT · change at the point, dB)² + Σ SHAPE_WEIGHT ·
// (steps a section written softer is planned above one written louder)²; Infinity for a plan outside
// the musical limits (a step range, or the melody under its accompaniment).
//
// Branch and bound (Land and Doig, 1960): sections are fixed one at a time, depth first. Every group level
// rises or falls with each section's step only through that section's energy in it, and never falls as
// that energy rises, so with the free sections anywhere in their ranges a group's level lies between its
// levels at the sum of their smallest and of their largest energies; each target's residual is then at
// least its value at the end of those intervals that favours it. The bound is valid, so the search returns the exact optimum unless it stops at the node cap.
import { levelOfEnergy, levelsAtSteps, targetCost, type PlanModel, type ShapePair } from "./plan-model";

/** Weight of a dB of change against a dB of target missed: 0.01, so the targets come first and closeness to what is written decides between plans that meet them equally. */
export const CHANGE_WEIGHT = 0.01;
/** Weight of a step of the written shape given up: as much as a target missed by 0.5 dB (common practice, no source). */
export const SHAPE_WEIGHT = 0.25;
/** Nodes the search may visit before it settles for the best plan found (far above what the demo needs). */
export const NODE_LIMIT = 400_000;

/** Cost of one pair of the written shape at steps kl (louder) and ks (softer). */
function pairCost(m: PlanModel, pair: ShapePair, kl: number, ks: number): number {
  const louder = m.units[pair.louder]!.base;
  const softer = m.units[pair.softer]!.base;
  const gap = louder + kl - (softer + ks);
  if (pair.hard) return gap < Math.min(0, louder - softer) ? Infinity : 0;
  // Stryker disable next-line EqualityOperator: at a gap of 0 both give 0
  return gap < 0 ? SHAPE_WEIGHT * gap * gap : 0;
}

/** The objective at whole steps k per unit (see the head of this file). */
export function costAtSteps(m: PlanModel, change: readonly number[][], k: ArrayLike<number>): number {
  let cost = 0;
  for (let u = 0; u < m.units.length; u++) {
    const unit = m.units[u]!;
    const s = k[u]!;
    if (!Number.isInteger(s) || s < unit.kMin || s > unit.kMax) return Infinity;
    cost += (CHANGE_WEIGHT * change[u]![s - unit.kMin]!) ** 2;
  }
  for (const pair of m.shape) cost += pairCost(m, pair, k[pair.louder]!, k[pair.softer]!);
  // Stryker disable next-line ConditionalExpression: Infinity plus the targets' cost is Infinity; this only skips their work
  if (cost === Infinity) return cost;
  return cost + targetCost(m, levelsAtSteps(m, k));
}

/** Coordinate descent from what is written: each unit in turn takes its best step, until none improves. A first incumbent. */
function descend(m: PlanModel, change: readonly number[][]): { k: number[]; cost: number } {
  const k = m.units.map(() => 0);
  let cost = costAtSteps(m, change, k);
  // Stryker disable next-line EqualityOperator,LogicalOperator,BooleanLiteral,ConditionalExpression,UpdateOperator: a safety cap; the descent settles in a few rounds and a round more finds nothing
  for (let improved = true, round = 0; improved && round < 50; round++) {
    improved = false;
    m.units.forEach((unit, u) => {
      let bestStep = k[u]!;
      for (let s = unit.kMin; s <= unit.kMax; s++) {
        // Stryker disable next-line ConditionalExpression,EqualityOperator: trying the step it is at gives the same cost, never an improvement
        if (s === bestStep) continue;
        k[u] = s;
        const c = costAtSteps(m, change, k);
        // Stryker disable next-line EqualityOperator,ArithmeticOperator: at a tie within 1e-12 either way the descent only starts the search from another plan of the same cost
        if (c < cost - 1e-12) {
          cost = c;
          bestStep = s;
          improved = true;
        }
        k[u] = bestStep;
      }
    });
  }
  return { k, cost };
}

export interface SearchResult {
  k: number[];
  cost: number;
  /** False when the search stopped at the node cap: the plan is the best found, not proven best. */
  proven: boolean;
  nodes: number;
}

/** The plan (steps per unit) of least cost, by branch and bound. */
export function searchPlan(m: PlanModel, change: readonly number[][], nodeLimit = NODE_LIMIT): SearchResult {
  const U = m.units.length;
  const G = m.groups.length;
  const first = descend(m, change);
  let best = first.cost;
  let bestK = first.k;

  // Per group and playing unit: the least and the most energy over the unit's range.
  const tableMin = m.stepEnergy.map((tables) => tables.map((t) => Math.min(...t)));
  const tableMax = m.stepEnergy.map((tables) => tables.map((t) => Math.max(...t)));
  const unitSlots = m.units.map((): [g: number, j: number][] => []);
  m.groupUnits.forEach((units, g) => units.forEach((u, j) => unitSlots[u]!.push([g, j])));
  const groupResiduals = Array.from({ length: G }, (): number[] => []);
  m.residuals.forEach((r, i) => r.terms.forEach((t) => groupResiduals[t.group]!.push(i)));
  // Stryker disable next-line ArrayDeclaration: a stray element has no louder or softer unit, so no pair is costed from it
  const unitPairs = m.units.map((): ShapePair[] => []);
  for (const pair of m.shape) {
    unitPairs[pair.louder]!.push(pair);
    unitPairs[pair.softer]!.push(pair);
  }

  const fixed = new Uint8Array(U);
  const k = new Int32Array(U);
  const lo = new Float64Array(G); // level (dB) with every free unit at its least energy
  const hi = new Float64Array(G);
  const groupBounds = (g: number) => {
    const units = m.groupUnits[g]!;
    const tables = m.stepEnergy[g]!;
    let eLo = m.heldEnergy[g]!;
    let eHi = eLo;
    for (let j = 0; j < units.length; j++) {
      const u = units[j]!;
      if (fixed[u]) {
        const e = tables[j]![k[u]! - m.units[u]!.kMin]!;
        eLo += e;
        eHi += e;
      } else {
        eLo += tableMin[g]![j]!;
        eHi += tableMax[g]![j]!;
      }
    }
    lo[g] = levelOfEnergy(m, g, eLo);
    hi[g] = levelOfEnergy(m, g, eHi);
  };
  for (let g = 0; g < G; g++) groupBounds(g);
  const resBound = new Float64Array(m.residuals.length);
  const residualBound = (i: number) => {
    const r = m.residuals[i]!;
    let v = r.c;
    // Stryker disable next-line EqualityOperator: a term of coefficient 0 adds 0 with either end
    for (const t of r.terms) v += t.coef * (t.coef > 0 ? lo[t.group]! : hi[t.group]!);
    // Stryker disable next-line EqualityOperator: at 0 both give 0
    return v > 0 ? v * v : 0;
  };
  let resSum = 0;
  // Stryker disable next-line ConditionalExpression: without the first sum the first re-bounding counts almost every target anyway; the seeded bands of plan-search.test.ts take 16,334 nodes for 16,302, with the same plans
  for (let i = 0; i < resBound.length; i++) resSum += resBound[i] = residualBound(i);

  // Units with the most targets and shape pairs first: fixing them tightens the most bounds.
  const degree = m.units.map((_, u) => unitSlots[u]!.reduce((s, [g]) => s + groupResiduals[g]!.length, 0) + unitPairs[u]!.length);
  const order = [...m.units.keys()].sort(
    (a, b) =>
      degree[b]! - degree[a]! ||
      // Stryker disable next-line ArithmeticOperator: units of equal degree in either order give the same plans and, on the seeded bands, the same nodes
      a - b,
  );
  // Values nearest the incumbent first.
  const values = m.units.map((unit, u) => {
    const list: number[] = [];
    for (let s = unit.kMin; s <= unit.kMax; s++) list.push(s);
    // Stryker disable next-line all: the order values are tried in; without it the seeded bands of plan-search.test.ts take 3 % more nodes, with the same plans
    return list.sort((a, b) => Math.abs(a - bestK[u]!) - Math.abs(b - bestK[u]!) || a - b);
  });

  const seen = new Int32Array(m.residuals.length);
  let mark = 0;
  let nodes = 0;
  let stopped = false;
  // Stryker disable next-line ArrayDeclaration: the undo log is read back only down to where each call started
  const touched: number[] = [];
  // Stryker disable next-line ArrayDeclaration: as above
  const before: number[] = [];

  /** Fixes or frees unit u at its current k, re-bounding its groups and their residuals; returns the undo log's start. */
  const rebound = (u: number) => {
    // Stryker disable next-line UpdateOperator: counting down marks each call as uniquely
    mark++;
    const start = touched.length;
    for (const [g] of unitSlots[u]!) groupBounds(g);
    for (const [g] of unitSlots[u]!) {
      for (const i of groupResiduals[g]!) {
        // Stryker disable next-line ConditionalExpression: a residual re-bounded twice logs its value twice and is restored in reverse, to the same end
        if (seen[i] === mark) continue;
        seen[i] = mark;
        touched.push(i);
        before.push(resBound[i]!);
        const b = residualBound(i);
        resSum += b - resBound[i]!;
        resBound[i] = b;
      }
    }
    return start;
  };
  const restore = (u: number, start: number) => {
    for (const [g] of unitSlots[u]!) groupBounds(g);
    while (touched.length > start) {
      const i = touched.pop()!;
      const b = before.pop()!;
      resSum += b - resBound[i]!;
      resBound[i] = b;
    }
  };

  const dfs = (depth: number, fixedCost: number) => {
    if (depth === U) {
      const c = costAtSteps(m, change, k);
      // Stryker disable next-line EqualityOperator,ConditionalExpression: at an exact tie either plan is an optimum; and a leaf is reached only below best, since with every unit fixed the bound is the cost
      if (c < best) {
        best = c;
        bestK = [...k];
      }
      return;
    }
    const u = order[depth]!;
    const unit = m.units[u]!;
    for (const s of values[u]!) {
      if (++nodes > nodeLimit) {
        stopped = true;
        return;
      }
      k[u] = s;
      let add = (CHANGE_WEIGHT * change[u]![s - unit.kMin]!) ** 2;
      for (const pair of unitPairs[u]!) {
        const other = pair.louder === u ? pair.softer : pair.louder;
        if (fixed[other]) add += pairCost(m, pair, k[pair.louder]!, k[pair.softer]!);
      }
      // Stryker disable next-line ConditionalExpression: an infinite cost never passes the bound test below; this only skips the re-bounding
      if (add === Infinity) continue;
      fixed[u] = 1;
      const start = rebound(u);
      // A branch must beat the best plan by more than rounding (1e-12 relative).
      // Stryker disable next-line ArithmeticOperator: the tolerance decides only exact ties, where either plan is an optimum
      const bar = best - 1e-12 * (1 + best);
      // Stryker disable next-line EqualityOperator: as above
      if (fixedCost + add + resSum < bar) dfs(depth + 1, fixedCost + add);
      fixed[u] = 0;
      restore(u, start);
      if (stopped) return;
    }
  };
  // Stryker disable next-line ConditionalExpression,EqualityOperator: with no units the search would only cost the empty plan again, which is not below itself
  if (U > 0) dfs(0, 0);
  return { k: bestK, cost: best, proven: !stopped, nodes };
}
