// Whether a box mix and its balance checks hold across the catalog's uncertainty.
//
// Levels: an instrument's values shift every player of it together, so a sum's uncertainty is
// √Σk (Ek/E · uk)², Ek the A-weighted energy of instrument k's players in the sum (first-order
// propagation of independent errors, GUM JCGM 100:2008 §5.1.2, eq. 10, with ∂L/∂δk = Ek/E).
// Checks: the likely cases are the catalog as it is and each sounding instrument alone one
// uncertainty louder or softer; a check whose verdict is the same in all of them is "clear",
// otherwise "borderline", naming the instruments that turn it. A case shifts that instrument's
// players at the point rather than evaluating the set again (instrument-shift.ts).
import { catalogOf, soundingPlayers, type BoxPlayer } from "./box-players";
import { backgroundThirdOctaves } from "./background";
import { checkBalance, checkPlayers } from "./checks";
import { createSetEvaluator } from "./evaluator";
import { memoGroupLoudness } from "./group-loudness";
import { playersLoudness, shiftInstrument } from "./instrument-shift";
import { instrumentProvenance, shownPrecisionDb } from "./provenance";
import type { BalanceTargets } from "./targets";
import type { AnalysisInput, CheckId, CheckResult, PointResult } from "./types";

export interface LevelUncertainty {
  /** About one standard deviation (dB) of the total at the point. */
  totalDb: number;
  voices: Record<string, number>;
  sections: Record<string, number>;
  /** Precision the total deserves: 0.1 dB only when its uncertainty is under 1 dB. */
  precisionDb: 0.1 | 1;
}

export type Confidence = "clear" | "borderline";

export interface CheckConfidence {
  id: CheckId;
  confidence: Confidence;
  /** Likely cases (the catalog as it is, and each sounding instrument ± its uncertainty). */
  cases: number;
  /** Cases with the same verdict as the catalog as it is. */
  sameInCases: number;
  /** Instruments whose shift by their uncertainty turns the verdict, with the direction ("+" louder). */
  turnedBy: { instrument: string; name: string; shiftDb: number }[];
}

/** Uncertainty of a level summed from players, each instrument's error shared by its players. */
function sumUncertaintyDb(players: readonly BoxPlayer[], uOf: (instrument: string) => number): number {
  const byInstrument = new Map<string, number>();
  let total = 0;
  for (const p of players) {
    const e = 10 ** (p.dbA / 10);
    // Stryker disable next-line ArithmeticOperator: the shares are squared below, so negated energies give the same
    byInstrument.set(p.instrument, (byInstrument.get(p.instrument) ?? 0) + e);
    // Stryker disable next-line AssignmentOperator: as above, a negated total gives the same squares
    total += e;
  }
  // Stryker disable next-line ConditionalExpression: a sounding player's level is finite, so the total is 0 only for no players, where the sum below is 0 too
  if (total === 0) return 0;
  let v = 0;
  for (const [k, e] of byInstrument) v += ((e / total) * uOf(k)) ** 2;
  return Math.sqrt(v);
}

/** Uncertainty of the total, each voice and each section of a point's result (A-weighted). */
export function levelUncertainty(input: AnalysisInput, point: PointResult): LevelUncertainty {
  const catalog = catalogOf(input);
  const uOf = (k: string) => instrumentProvenance(catalog[k]!).uncertaintyDb;
  const players = soundingPlayers(input, point);
  const group = (key: (p: BoxPlayer) => string) => {
    const by = new Map<string, BoxPlayer[]>();
    for (const p of players) by.set(key(p), [...(by.get(key(p)) ?? []), p]);
    return Object.fromEntries([...by].map(([k, list]) => [k, sumUncertaintyDb(list, uOf)]));
  };
  const totalDb = sumUncertaintyDb(players, uOf);
  return { totalDb, voices: group((p) => p.voice), sections: group((p) => p.section), precisionDb: shownPrecisionDb(totalDb) };
}

/** Each check's verdict across the likely cases of the catalog's uncertainty. */
export function checkConfidence(
  input: AnalysisInput,
  listeningPointId: string,
  targets?: Partial<BalanceTargets> | null,
  nominal?: { point: PointResult; checks: CheckResult[] },
): CheckConfidence[] {
  const point = input.listeningPoints.find((l) => l.id === listeningPointId);
  if (!point) throw new Error(`no listening point "${listeningPointId}" in the input`);
  const one = { ...input, listeningPoints: [point] };
  const run = (i: AnalysisInput) => {
    const ev = createSetEvaluator(i);
    ev.evaluate();
    const pr = ev.result().points[0]!;
    return { point: pr, checks: checkBalance(i, pr, targets) };
  };
  const base = nominal ?? run(one);
  const catalog = catalogOf(input);
  const players = soundingPlayers(one, base.point);
  const background = backgroundThirdOctaves(point.background);
  // Most groups the checks weigh hold none of the shifted instrument: each is computed once for all cases.
  const loudnessOf = memoGroupLoudness();
  const sounding = [...new Set(players.map((p) => p.instrument))].sort();
  const out = base.checks.map((c) => ({ id: c.id, confidence: "clear" as Confidence, cases: 1, sameInCases: 1, turnedBy: [] as CheckConfidence["turnedBy"] }));
  for (const key of sounding) {
    const spec = catalog[key]!;
    const u = instrumentProvenance(spec).uncertaintyDb;
    if (!(u > 0)) continue;
    for (const shiftDb of [u, -u]) {
      // The same as evaluating with the instrument's carryDb moved by shiftDb (instrument-shift.ts).
      const shifted = shiftInstrument(players, key, shiftDb);
      checkPlayers(shifted, playersLoudness(shifted, background), targets, loudnessOf).forEach((c, n) => {
        const o = out[n]!;
        o.cases += 1;
        if (c.passed === base.checks[n]!.passed) o.sameInCases += 1;
        else o.turnedBy.push({ instrument: key, name: spec.name, shiftDb });
      });
    }
  }
  for (const o of out) o.confidence = o.sameInCases === o.cases ? "clear" : "borderline";
  return out;
}
