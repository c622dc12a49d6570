// The balance plan: per section, written dynamic → played dynamic that best meets the targets
// at one listening point (melody lead, bass-up pyramid, blend of doubled parts), staying as
// close as it can to what is written and within pp…fff.
//
// Solve: a bounded least-squares over each section's dB change (targets as hinge residuals,
// plus a small weight on each change), then whole dynamic steps: the continuous optimum rounded
// to the nearest step and polished by single and paired step moves on the exact step levels.
import { boundedLeastSquares, type ResidualModel, type SparseRow } from "./bounded-least-squares";
import { AcousticsInputError } from "./errors";
import { createSetEvaluator } from "./evaluator";
import {
  buildPlanModel,
  levelsAtShifts,
  levelsAtSteps,
  residualValues,
  unitChangeDb,
  stepSearch,
  type PlanModel,
  type TargetKind,
} from "./plan-model";
import { resolveTargets, type BalanceTargets } from "./targets";
import { DYNAMICS, type AnalysisInput, type Dynamic, type PlanEntry, type Voice } from "./types";

/** Weight of a dB of change against a dB of target missed: 0.01, so the targets come first and closeness to what is written decides between plans that meet them equally. */
const CHANGE_WEIGHT = 0.01;
/** A target is reported unmet when missed by more than this (dB). */
export const UNMET_TOLERANCE_DB = 0.1;

export interface PlanEntryDetail extends PlanEntry {
  voice: Voice;
  /** The players the change applies to (the section's players of that voice and written dynamic). */
  performerIds: string[];
  /** Set when the section stops at the end of its range while a target still asks for more. */
  atLimit?: "pp" | "fff";
  /** Targets involving this section that the plan cannot meet. */
  unreachable?: string[];
}

export interface UnmetTarget {
  kind: TargetKind;
  shortDb: number;
  detail: string;
  sections: string[];
}

export interface BalancePlan {
  listeningPointId: string;
  entries: PlanEntryDetail[];
  unmet: UnmetTarget[];
}

export type PlanInput = Pick<AnalysisInput, "performers" | "listeningPoints" | "conditions" | "instruments">;

function pointResultAt(input: PlanInput, listeningPointId: string) {
  const point = input.listeningPoints.find((l) => l.id === listeningPointId);
  if (!point) throw new AcousticsInputError("listeningPointId", `"${listeningPointId}" is not a listening point of the input`);
  const evaluator = createSetEvaluator({ ...input, listeningPoints: [point] });
  evaluator.evaluate();
  return evaluator.result().points[0]!;
}

/** The continuous relaxation: residuals (targets, then each change) and their sparse Jacobian. */
function relaxation(m: PlanModel): ResidualModel {
  const U = m.units.length;
  const dense = new Float64Array(U); // one row's entries, gathered before they are listed
  return {
    evaluate(x: readonly number[]) {
      const { L, share } = levelsAtShifts(m, x);
      const values = residualValues(m, L);
      const J: SparseRow[] = m.residuals.map((res, i) => {
        const cols: number[] = [];
        if (values[i]! <= 0) return { cols, vals: [] };
        for (const t of res.terms) {
          const units = m.groupUnits[t.group]!;
          const parts = share[t.group]!;
          for (let j = 0; j < units.length; j++) {
            const u = units[j]!;
            if (!cols.includes(u)) cols.push(u);
            dense[u]! += t.coef * parts[j]!;
          }
        }
        const vals = cols.map((u) => dense[u]!);
        cols.forEach((u) => (dense[u] = 0));
        return { cols, vals };
      });
      for (let u = 0; u < U; u++) J.push({ cols: [u], vals: [CHANGE_WEIGHT] });
      return { r: [...values, ...x.map((v) => CHANGE_WEIGHT * v)], J };
    },
  };
}

/** Whole steps: nearest to the continuous optimum, then single (±1, ±2) and paired (±1, ±1) moves while the cost falls. */
function polishSteps(m: PlanModel, change: number[][], start: number[]): number[] {
  const search = stepSearch(m, start);
  const cost = () => {
    let c = search.targetCost();
    search.k.forEach((s, u) => (c += (CHANGE_WEIGHT * change[u]![s - m.units[u]!.kMin]!) ** 2));
    return c;
  };
  type Move = [unit: number, steps: number][];
  const U = m.units.length;
  const singles: Move[] = [];
  for (let u = 0; u < U; u++) for (const d of [-2, -1, 1, 2]) singles.push([[u, d]]);
  const pairs: Move[] = [];
  for (let a = 0; a < U; a++) {
    for (let b = a + 1; b < U; b++) {
      for (const da of [-1, 1]) for (const db of [-1, 1]) pairs.push([[a, da], [b, db]]);
    }
  }
  let best = cost();
  /** Tries each move from the current steps, keeping those that lower the cost; true if one did. */
  const sweep = (moves: Move[]) => {
    let improved = false;
    for (const move of moves) {
      if (!search.move(move)) continue;
      const c = cost();
      if (c < best - 1e-12) {
        best = c;
        improved = true;
      } else search.undo();
    }
    return improved;
  };
  for (let round = 0; round < 100; round++) {
    if (sweep(singles)) continue;
    if (!sweep(pairs)) break;
  }
  return [...search.k];
}

/**
 * The balance plan for one or more sets played with the same voicing (a phrase) at one
 * listening point. Each performer's `dynamic` is taken as written; setLabels name the sets in notes.
 */
export function solveBalancePlan(
  inputs: readonly PlanInput[],
  listeningPointId: string,
  targets?: Partial<BalanceTargets> | null,
  setLabels?: readonly string[],
): BalancePlan {
  const t = resolveTargets(targets);
  const points = inputs.map((input) => pointResultAt(input, listeningPointId));
  const m = buildPlanModel(inputs as AnalysisInput[], points, t, setLabels);
  const U = m.units.length;
  const change = unitChangeDb(m);
  const lo = m.units.map((_, u) => change[u]![0]!);
  const hi = m.units.map((_, u) => change[u]![change[u]!.length - 1]!);
  const { x } = boundedLeastSquares(relaxation(m), new Array<number>(U).fill(0), lo, hi);
  const rounded = m.units.map((unit, u) => {
    let best = 0;
    change[u]!.forEach((d, i) => {
      if (Math.abs(d - x[u]!) < Math.abs(change[u]![best]! - x[u]!)) best = i;
    });
    return best + unit.kMin;
  });
  const k = polishSteps(m, change, rounded);

  // What stays unmet, worst over the sets, and which way each section is pushed.
  const { L, share } = levelsAtSteps(m, k);
  const values = residualValues(m, L);
  const unmetByKey = new Map<string, UnmetTarget & { units: Set<number> }>();
  const push = new Array<number>(U).fill(0); // ∂(target cost)/∂(uniform shift)
  m.residuals.forEach((res, i) => {
    const v = values[i]!;
    if (v <= 0) return;
    for (const term of res.terms) m.groupUnits[term.group]!.forEach((u, j) => (push[u]! += 2 * v * term.coef * share[term.group]![j]!));
    if (v <= UNMET_TOLERANCE_DB) return;
    const seen = unmetByKey.get(res.key);
    if (!seen || seen.shortDb < v) {
      const units = new Set([...(seen?.units ?? []), ...res.units]);
      unmetByKey.set(res.key, { kind: res.kind, shortDb: v, detail: res.describe(v), sections: [], units });
    } else res.units.forEach((u) => seen.units.add(u));
  });
  const unmet = [...unmetByKey.values()].map(({ units, ...rest }) => ({ ...rest, sections: [...units].map((u) => m.units[u]!.section) }));

  const entries = m.units.map((unit, u): PlanEntryDetail => {
    const played: Dynamic = DYNAMICS[unit.base + k[u]!]!;
    const entry: PlanEntryDetail = {
      section: unit.section,
      writtenDynamic: unit.writtenDynamic,
      playedDynamic: played,
      changeDb: change[u]![k[u]! - unit.kMin]!,
      voice: unit.voice,
      performerIds: unit.performerIds,
    };
    const involved = unmet.filter((x) => x.sections.includes(unit.section));
    if (involved.length) {
      entry.unreachable = involved.map((x) => x.detail);
      if (k[u] === unit.kMax && push[u]! < -1e-9) entry.atLimit = "fff";
      if (k[u] === unit.kMin && push[u]! > 1e-9) entry.atLimit = "pp";
    }
    return entry;
  });
  return { listeningPointId, entries, unmet };
}

/** The balance plan of one set at one listening point: one entry per section that plays. */
export function planBalance(input: PlanInput, listeningPointId: string, targets?: Partial<BalanceTargets> | null): PlanEntryDetail[] {
  return solveBalancePlan([input], listeningPointId, targets).entries;
}

/** The input with the plan's played dynamics in place of the written ones (for predicting the mix). */
export function applyPlan<T extends PlanInput>(input: T, entries: readonly Pick<PlanEntryDetail, "performerIds" | "playedDynamic">[]): T {
  const played = new Map<string, Dynamic>();
  for (const e of entries) for (const id of e.performerIds) played.set(id, e.playedDynamic);
  return { ...input, performers: input.performers.map((p) => (played.has(p.id) ? { ...p, dynamic: played.get(p.id)! } : p)) };
}
