// The balance plan of a phrase at a listening point: one plan over all the phrase's sets, in the director's
// words, with the box mix and the checks of each set before (as played now) and after (the plan applied to
// the written). The music page, the rehearsal plan and its e-mail all read this one.
// (No "server-only" mark: the bench runs it too.)
import { analyzeSet, applyPlan, checkBalance, solveBalancePlan, toJsonSafe } from "@/lib/acoustics";
import { catalogOf } from "@/lib/acoustics/box-players";
import type { AnalysisInput, PointResult } from "@/lib/acoustics/types";
import { notFound } from "@/lib/http/errors";
import { setInputs } from "./balance-inputs";
import { advisePlan, unmetWords } from "./plan-advice";
import { limitsFor } from "./plan-limits";
import type { ShowBalance } from "./show-context";

function summary(input: AnalysisInput, point: PointResult, targets: ShowBalance["targets"]) {
  return {
    totalDbA: point.totalDbA,
    voices: Object.fromEntries(Object.entries(point.voices).map(([v, l]) => [v, { dbA: l!.dbA }])),
    sections: Object.fromEntries(Object.entries(point.sections).map(([s, l]) => [s, { dbA: l.dbA }])),
    // Loudness (ISO 532-1) of the band and each voice: what the music page reports per set.
    loudness: point.loudness
      ? { totalSone: point.loudness.totalSone, voices: Object.fromEntries(Object.entries(point.loudness.voices).map(([v, l]) => [v, { sone: l.sone, phon: l.phon, heard: l.heard }])) }
      : null,
    checks: checkBalance(input, point, targets),
  };
}

/** The phrase and the listening point a plan is for; 404 when either is not in the show. */
export function planSubject(sb: ShowBalance, phraseId: string, listeningPointId: string) {
  const phrase = sb.music.phrases.find((p) => p.id === phraseId);
  if (!phrase) throw notFound("No such phrase.");
  const point = sb.listeningPoints.find((l) => l.id === listeningPointId);
  if (!point) throw notFound("No such listening point in this show.");
  return { phrase, point };
}

export function phrasePlan(sb: ShowBalance, phraseId: string, listeningPointId: string) {
  const { phrase, point } = planSubject(sb, phraseId, listeningPointId);
  // The point as the stored analysis sees it: with its ground and its background.
  const lp = sb.ctx.listeningPoints.filter((l) => l.id === point.id);
  const sets = sb.sets.filter((s) => s.order >= phrase.firstOrder && s.order <= phrase.lastOrder && s.positions.length > 0);
  const inputs = sets.map((s) => {
    const { played, written } = setInputs(sb.ctx, { order: s.order, positions: s.positions });
    return { played: { ...played, listeningPoints: lp }, written: { ...written, listeningPoints: lp } };
  });
  const limits = limitsFor(sb.show.planLimits, phrase.planLimits);
  const plan = solveBalancePlan(inputs.map((i) => i.written), point.id, sb.targets, sets.map((s) => s.number), limits);
  const perSet = sets.map((s, n) => {
    const { played, written } = inputs[n]!;
    const after = applyPlan(written, plan.entries);
    return {
      setId: s.id,
      number: s.number,
      before: summary(played, analyzeSet(played).points[0]!, sb.targets),
      after: summary(after, analyzeSet(after).points[0]!, sb.targets),
    };
  });
  const catalog = catalogOf(sb.ctx);
  const roster = new Map(sb.roster.map((p) => [p.id, { label: p.label, spec: catalog[p.instrument] }]));
  const words = { pointName: point.name, performer: (id: string) => roster.get(id), limits };
  return toJsonSafe({
    phrase: { id: phrase.id, name: phrase.name },
    listeningPointId,
    listeningPointName: point.name,
    entries: advisePlan(plan.entries, words),
    unmet: plan.unmet.map((u) => ({ ...u, detail: unmetWords(u, words) })),
    cost: plan.cost,
    nothingToChange: plan.nothingToChange,
    limits,
    sets: perSet,
  });
}

export type PhrasePlan = ReturnType<typeof phrasePlan>;
