// Gathers the stored analyses of every set the chosen phrases or sets span, and builds the plan.
import "server-only";
import { loadMusic } from "@/db/queries/music";
import { findProgram } from "@/db/queries/programs";
import { listListeningPoints, listSets } from "@/db/queries/shows";
import type { Show } from "@/db/schema";
import { runPhrasePlan } from "@/lib/analysis/run-phrase-plan";
import { loadShowBalance } from "@/lib/analysis/show-context";
import { planWork, withProgress } from "@/lib/analysis/work-progress";
import { storedAnalysis } from "@/lib/analysis/stored-analysis";
import { describeListeningPoint } from "@/lib/field/point-words";
import { badRequest } from "@/lib/http/errors";
import { shareMinutes } from "@/lib/rehearsal/budget";
import { buildRehearsalPlan, type RehearsalItemInput, type SetAnalysis } from "@/lib/rehearsal/plan";
import { UNASSIGNED, phraseAt } from "@/lib/music/voicing";
import type { RehearsalChoice } from "@/lib/validation/rehearsal";

/** Stadium time when the director gives none: half an hour (common practice, no source). */
export const DEFAULT_BUDGET_MINUTES = 30;

export async function assembleRehearsalPlan(show: Show, choice: RehearsalChoice) {
  const [sets, music, points, program] = await Promise.all([listSets(show.id), loadMusic(show.id), listListeningPoints(show.id), findProgram(show.programId)]);
  const point = choice.listeningPointId ? points.find((p) => p.id === choice.listeningPointId) : (points.find((p) => p.name === "Press box") ?? points[0]);
  if (!point) throw badRequest("This show has no such listening point.", { listeningPointId: ["Choose one of the show's listening points."] });
  const unknown = [...choice.phraseIds.filter((id) => !music.phrases.some((p) => p.id === id)), ...choice.setIds.filter((id) => !sets.some((s) => s.id === id))];
  if (unknown.length) throw badRequest("Some chosen phrases or sets are not in this show.", { phraseIds: unknown.map((id) => `unknown id ${id}`) });

  const cache = new Map<string, SetAnalysis>();
  const analysisOf = async (set: (typeof sets)[number]) => {
    if (!cache.has(set.id)) {
      const { result } = await storedAnalysis(show, set, point.id);
      cache.set(set.id, { setNumber: set.number, checks: result.checks, plan: result.plan, planUnmet: result.planUnmet });
    }
    return cache.get(set.id)!;
  };
  const sectionsOf = (phraseId: string | null) => {
    const names = [...new Set(music.assignments.filter((a) => a.phraseId === phraseId).map((a) => a.section))];
    return names.map((section) => {
      const a = music.assignments.find((x) => x.phraseId === phraseId && x.section === section)!;
      return { section, voice: a.voice, writtenDynamic: a.writtenDynamic, playedDynamic: a.playedDynamic };
    });
  };

  // The same plan and words as the music page: each phrase's plan over all its sets. One phrase's
  // plan can take a second on a large band, so the page can show how many are done.
  const balance = choice.phraseIds.length || choice.setIds.length ? await loadShowBalance(show) : null;
  const chosenPhrases = music.phrases.filter((p) => choice.phraseIds.includes(p.id));
  const chosenSets = sets.filter((s) => choice.setIds.includes(s.id));
  const planned = new Set([...chosenPhrases.map((p) => p.id), ...chosenSets.flatMap((s) => phraseAt(music.phrases, s.order)?.id ?? [])]);
  const items = await withProgress(planWork(show.id), async (report) => {
    const plans = new Map<string, RehearsalItemInput["plan"]>();
    const planOf = async (phraseId: string | undefined) => {
      if (!phraseId || !balance) return undefined;
      if (!plans.has(phraseId)) {
        const p = await runPhrasePlan(balance, phraseId, point.id);
        plans.set(phraseId, { entries: p.entries, unmet: p.unmet.map((u) => u.detail) });
        report(plans.size, planned.size);
      }
      return plans.get(phraseId);
    };
    report(0, planned.size);
    const items: RehearsalItemInput[] = [];
    for (const phrase of chosenPhrases) {
      const span = sets.filter((s) => s.order >= phrase.firstOrder && s.order <= phrase.lastOrder);
      items.push({ kind: "phrase", name: phrase.name, sets: await Promise.all(span.map(analysisOf)), sections: sectionsOf(phrase.id), plan: await planOf(phrase.id) });
    }
    for (const set of chosenSets) {
      const phrase = phraseAt(music.phrases, set.order);
      const sections = sectionsOf(phrase?.id ?? null);
      items.push({
        kind: "set",
        name: `Set ${set.number}${phrase ? ` (in ${phrase.name})` : ""}`,
        sets: [await analysisOf(set)],
        sections: sections.length ? sections : [],
        plan: await planOf(phrase?.id),
      });
    }
    return items;
  });
  const budgetMinutes = choice.budgetMinutes ?? DEFAULT_BUDGET_MINUTES;
  const built = buildRehearsalPlan(items);
  const minutes = shareMinutes(built.map((it) => ({ severity: it.severity, buildUpSteps: it.buildUp.length })), budgetMinutes);
  return {
    programName: program?.name ?? "",
    show: { id: show.id, name: show.name },
    listenFrom: { id: point.id, name: point.name, x: point.x, y: point.y, z: point.z, words: describeListeningPoint(point.x, point.y, point.z, show.fieldRules) },
    budgetMinutes,
    // A key per item (its place in the plan) so a kept plan's items can be marked done.
    items: built.map((it, i) => ({ ...it, key: `item-${i + 1}`, minutes: minutes[i]! })),
    unassigned: UNASSIGNED,
  };
}

export type AssembledPlan = Awaited<ReturnType<typeof assembleRehearsalPlan>>;
