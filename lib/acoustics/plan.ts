// The balance plan: per section, written dynamic → played dynamic that best meets the targets at one
// listening point (melody lead, bass-up pyramid, the battery with the winds, every voice heard), within
// the musical limits (plan-limits.ts) and as close as it can to what is written. The objective and its exact
// minimum over whole dynamic steps are in plan-search.ts.
import { loudnessOfPoint } from "./analyze";
import { checkBalance } from "./checks";
import { AcousticsInputError } from "./errors";
import { createSetEvaluator } from "./evaluator";
import { resolveLimits, type MusicalLimits } from "./plan-limits";
import { buildPlanModel, levelsAtSteps, rawResiduals, sharesOf, unitChangeDb, type PlanModel, type Residual, type TargetKind } from "./plan-model";
import { costAtSteps, searchPlan } from "./plan-search";
import { resolveTargets, type BalanceTargets } from "./targets";
import { DYNAMICS, type AnalysisInput, type Dynamic, type PlanEntry, type Voice } from "./types";

/** A target is reported unmet when missed by more than this (dB). */
export const UNMET_TOLERANCE_DB = 0.1;

export interface PlanEntryDetail extends PlanEntry {
  voice: Voice;
  /** The players the change applies to (the section's players of that voice and written dynamic). */
  performerIds: string[];
  /** Battery and front ensemble (planned within their own limits) or winds. */
  kind: "winds" | "percussion";
  /** One player of a section that otherwise rests or plays something else (a soloist). */
  solo: boolean;
  /** Set when the section stops at the end of what it may play (pp, fff or the musical limits) while a target still asks for more. */
  atLimit?: Dynamic;
  /** Targets involving this section that the plan cannot meet. */
  unreachable?: string[];
  /** Why the section changes (set only where it does). */
  reason?: PlanReason;
}

/** What a change serves, in a director's words (the words layer adds the listening point and the section). */
export type PlanReason =
  | { kind: TargetKind; key: string; /** As written: "the melody is 6 dB under the accompaniment in loudness". */ state: string; aim: string; set: string }
  /** The change keeps a target met as written while other sections move: "the lower voices should be at least as present as the higher ones". */
  | { kind: "keep"; aim: string; set: string }
  /** The change keeps the written shape with the sections that move for a target. */
  | { kind: "shape" };

export interface UnmetTarget {
  kind: TargetKind;
  /** Identifies the target (the same across sets). */
  key: string;
  shortDb: number;
  /** "The melody leads the percussion by only 1 dB (set 4); the melody should lead every other voice by 3 dB." */
  detail: string;
  /** The parts of detail: with the plan, the state; the target; the set. */
  state: string;
  aim: string;
  set: string;
  sections: string[];
}

export interface BalancePlan {
  listeningPointId: string;
  entries: PlanEntryDetail[];
  unmet: UnmetTarget[];
  /** The objective of the plan (planCost of its entries). */
  cost: number;
  /** False only when the search stopped at its node cap before proving the plan best. */
  proven: boolean;
  /** Every balance check passes as written in every set: the plan keeps what is written. */
  nothingToChange: boolean;
  limits: MusicalLimits;
}

export type PlanInput = Pick<AnalysisInput, "performers" | "listeningPoints" | "conditions" | "instruments">;

/** An entry as planCost reads it. */
export type PlanCostEntry = Pick<PlanEntryDetail, "section" | "voice" | "writtenDynamic" | "playedDynamic">;

/** The plan's model at one listening point: units, targets, limits, and each unit's change at each step. */
export function planProblem(
  inputs: readonly PlanInput[],
  listeningPointId: string,
  targets?: Partial<BalanceTargets> | null,
  limits?: Partial<MusicalLimits> | null,
  setLabels?: readonly string[],
) {
  const t = resolveTargets(targets);
  const l = resolveLimits(limits);
  const full: AnalysisInput[] = inputs.map((input) => {
    const point = input.listeningPoints.find((p) => p.id === listeningPointId);
    if (!point) throw new AcousticsInputError("listeningPointId", `"${listeningPointId}" is not a listening point of the input`);
    return { ...input, listeningPoints: [point] };
  });
  const points = full.map((input) => {
    const evaluator = createSetEvaluator(input);
    evaluator.evaluate();
    const point = evaluator.result().points[0]!;
    // Loudness and masking as written, once: the checks and the plan's "heard" targets read it.
    point.loudness = loudnessOfPoint(input, point, input.listeningPoints[0]!.background);
    return point;
  });
  // A plan only where some check fails as written somewhere in the phrase.
  const failing = new Set(full.flatMap((input, n) => checkBalance(input, points[n]!, t).filter((c) => !c.passed).map((c) => c.id)));
  const nothingToChange = full.length > 0 && failing.size === 0;
  // Every target, not only those of the failing checks: one met as written costs nothing there and keeps
  // the plan from breaking it while it mends another (a drum feature's brass brought up must not bury it).
  const model = buildPlanModel(full, points, t, l, nothingToChange, setLabels);
  const change = unitChangeDb(model);
  return {
    model,
    change,
    limits: l,
    nothingToChange,
    /** Steps per unit for a list of entries: a unit without an entry plays as written. */
    stepsOf(entries: readonly PlanCostEntry[]): number[] {
      const k = model.units.map(() => 0);
      entries.forEach((e, i) => {
        const u = model.units.findIndex((x) => x.section === e.section);
        const unit = model.units[u];
        if (!unit || unit.voice !== e.voice || unit.writtenDynamic !== e.writtenDynamic) {
          throw new AcousticsInputError(`entries[${i}]`, `does not match what ${e.section} plays in the input`);
        }
        k[u] = DYNAMICS.indexOf(e.playedDynamic) - unit.base;
      });
      return k;
    },
  };
}

/**
 * The plan's objective for any list of entries (see plan-search.ts): target residuals, change and shape;
 * Infinity for a plan outside the musical limits. Sections without an entry play as written.
 */
export function planCost(
  inputs: readonly PlanInput[],
  listeningPointId: string,
  targets: Partial<BalanceTargets> | null | undefined,
  entries: readonly PlanCostEntry[],
  limits?: Partial<MusicalLimits> | null,
): number {
  const p = planProblem(inputs, listeningPointId, targets, limits);
  return costAtSteps(p.model, p.change, p.stepsOf(entries));
}

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const setTag = (set: string) => (set ? ` (set ${set})` : "");

/** Targets missed by more than the tolerance at steps k, worst over the sets, with the units involved. */
export function unmetAtSteps(m: PlanModel, k: readonly number[]) {
  const share = sharesOf(m);
  const raw = rawResiduals(m, levelsAtSteps(m, k, share));
  const push = new Array<number>(m.units.length).fill(0); // ∂(target cost)/∂(uniform shift of the unit)
  const byKey = new Map<string, { res: Residual; v: number; units: Set<number> }>();
  m.residuals.forEach((res, i) => {
    const v = raw[i]!;
    if (v <= 0) return;
    for (const term of res.terms) m.groupUnits[term.group]!.forEach((u, j) => (push[u]! += 2 * v * term.coef * share[term.group]![j]!));
    if (v <= UNMET_TOLERANCE_DB) return;
    const seen = byKey.get(res.key);
    const units = new Set([...(seen?.units ?? []), ...res.units]);
    if (!seen || seen.v < v) byKey.set(res.key, { res, v, units });
    else res.units.forEach((u) => seen.units.add(u));
  });
  const unmet = [...byKey.values()].map(({ res, v, units }) => {
    const state = res.state(v);
    return {
      kind: res.kind,
      key: res.key,
      shortDb: v,
      detail: `${capital(state)}${setTag(res.set)}; ${res.aim}.`,
      state,
      aim: res.aim,
      set: res.set,
      units: [...units],
      sections: [...units].map((u) => m.units[u]!.section),
    };
  });
  return { unmet, push };
}

/**
 * Why each changed unit changes: of the targets it takes part in, the one its change helps most (the plan
 * with that unit back at its written dynamic misses it by more), described as written, a target missed as
 * written before one met as written ("keep": the change holds it while others move); "shape" when no
 * target gains, so the change only keeps the written shape with sections that moved.
 */
function reasonsAtSteps(m: PlanModel, k: readonly number[]): (PlanReason | undefined)[] {
  const written = rawResiduals(m, levelsAtSteps(m, m.units.map(() => 0)));
  const planned = rawResiduals(m, levelsAtSteps(m, k));
  const sq = (v: number) => (v > 0 ? v * v : 0);
  return m.units.map((_, u) => {
    if (k[u] === 0) return undefined;
    const back = [...k];
    back[u] = 0;
    const without = rawResiduals(m, levelsAtSteps(m, back));
    // The target it helps most among those missed as written, else among those met as written.
    const helpsMost = (missed: boolean) => {
      let best = -1;
      let gain = 1e-9;
      m.residuals.forEach((res, i) => {
        const g = sq(without[i]!) - sq(planned[i]!);
        if (written[i]! > 0 === missed && res.units.includes(u) && g > gain) {
          gain = g;
          best = i;
        }
      });
      return best;
    };
    const fixes = helpsMost(true);
    if (fixes >= 0) {
      const res = m.residuals[fixes]!;
      return { kind: res.kind, key: res.key, state: res.state(written[fixes]!), aim: res.aim, set: res.set };
    }
    const keeps = helpsMost(false);
    if (keeps >= 0) return { kind: "keep", aim: m.residuals[keeps]!.aim, set: m.residuals[keeps]!.set };
    return { kind: "shape" };
  });
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
  limits?: Partial<MusicalLimits> | null,
): BalancePlan {
  const p = planProblem(inputs, listeningPointId, targets, limits, setLabels);
  const m = p.model;
  const { k, cost, proven } = searchPlan(m, p.change);
  const found = unmetAtSteps(m, k);
  const reasons = reasonsAtSteps(m, k);
  // With every check passing as written there is nothing to report: the plan's own targets (blend) rest.
  const unmet: UnmetTarget[] = p.nothingToChange ? [] : found.unmet.map(({ units: _, ...rest }) => rest);

  const entries = m.units.map((unit, u): PlanEntryDetail => {
    const played: Dynamic = DYNAMICS[unit.base + k[u]!]!;
    const entry: PlanEntryDetail = {
      section: unit.section,
      writtenDynamic: unit.writtenDynamic,
      playedDynamic: played,
      changeDb: p.change[u]![k[u]! - unit.kMin]!,
      voice: unit.voice,
      performerIds: unit.performerIds,
      kind: unit.kind,
      solo: unit.solo,
    };
    const reason = reasons[u];
    if (reason) entry.reason = reason;
    const involved = p.nothingToChange ? [] : found.unmet.filter((x) => x.units.includes(u));
    if (involved.length) {
      entry.unreachable = involved.map((x) => x.detail);
      if (k[u] === unit.kMax && found.push[u]! < -1e-9) entry.atLimit = played;
      if (k[u] === unit.kMin && found.push[u]! > 1e-9) entry.atLimit = played;
    }
    return entry;
  });
  return { listeningPointId, entries, unmet, cost, proven, nothingToChange: p.nothingToChange, limits: p.limits };
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
