// A set's analysis at a listening point: box mix, balance checks and balance plan, stored together
// and reused while the hash of everything they depend on is unchanged. Hashing means reading every
// input, so the row also keeps the show's and set's input revisions it matched: while those are the
// current ones, nothing has changed and the stored result is served without reading any input.
import "server-only";
import { createHash } from "node:crypto";
import { findStoredAnalysis, findStoredResult, markAnalysisCurrent, storeAnalysis, type StoredAnalysisRow } from "@/db/queries/analyses";
import { loadSetContext } from "@/db/queries/set-context";
import type { Show } from "@/db/schema";
import { analyzeSet, checkBalance, solveBalancePlan, toJsonSafe } from "@/lib/acoustics";
import { sectionLoudness } from "@/lib/acoustics/analyze";
import { checkConfidence, levelUncertainty } from "@/lib/acoustics/confidence";
import type { MusicalLimits } from "@/lib/acoustics/plan-limits";
import { BALANCE_VERSION } from "@/lib/acoustics/targets";
import type { AnalysisInput, InstrumentCatalog } from "@/lib/acoustics/types";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { notFound } from "@/lib/http/errors";
import { phraseAt } from "@/lib/music/voicing";
import { setInputs } from "./balance-inputs";
import { limitsFor } from "./plan-limits";
import { showConditions } from "./set-input";
import { showTargets } from "./show-targets";
import { mixOf } from "./mix-answer";

const STORED_VERSION = `${MODEL_VERSION}+${BALANCE_VERSION}`;

export function balanceHash(played: AnalysisInput, written: AnalysisInput, targets: unknown, listeningPointId: string): string {
  return createHash("sha256")
    .update(JSON.stringify({ played, written: written.performers.map((p) => p.dynamic), targets, listeningPointId }))
    .digest("hex");
}

/** Mix, checks and plan of one set at one listening point, computed from the two inputs. */
export function computeBalance(
  played: AnalysisInput,
  written: AnalysisInput,
  listeningPointId: string,
  targets: ReturnType<typeof showTargets>,
  limits: MusicalLimits,
) {
  const point = played.listeningPoints.find((l) => l.id === listeningPointId)!;
  const pr = analyzeSet({ ...played, listeningPoints: [point] }).points[0]!;
  const plan = solveBalancePlan([{ ...written, listeningPoints: [point] }], listeningPointId, targets, undefined, limits);
  const checks = checkBalance(played, pr, targets);
  // Each check with whether it holds across the catalog's uncertainty (clear or borderline).
  const confidence = checkConfidence(played, listeningPointId, targets, { point: pr, checks });
  return toJsonSafe({
    mix: { ...mixOf(pr), uncertainty: levelUncertainty(played, pr) },
    // Per section as per voice (sone, phon, share, heard), for set compare and outside scripts.
    loudness: { ...pr.loudness!, sections: sectionLoudness(played, pr) },
    checks: checks.map((c, n) => ({ ...c, confidence: confidence[n]!.confidence, sameInCases: confidence[n]!.sameInCases, cases: confidence[n]!.cases, turnedBy: confidence[n]!.turnedBy })),
    plan: plan.entries,
    planUnmet: plan.unmet,
  });
}

export type StoredBalance = ReturnType<typeof computeBalance>;

/** The stored row of a set at a point, with its result as text when it is current (see db/queries/analyses.ts). */
export async function storedAnalysisRow(setId: string, listeningPointId: string) {
  return findStoredAnalysis(setId, listeningPointId, STORED_VERSION);
}

/**
 * `show` and `set` must have been read before this call: their revisions are then no newer than the inputs
 * read here, so a result is never remembered under revisions of inputs it has not seen. `row` is the stored
 * row when the caller has just read it.
 */
export async function storedAnalysis(
  show: Show,
  set: { id: string; order: number; inputsRevision: number },
  listeningPointId: string,
  row?: StoredAnalysisRow | null,
) {
  const revisions = { showRevision: show.inputsRevision, setRevision: set.inputsRevision };
  const stored = row === undefined ? await storedAnalysisRow(set.id, listeningPointId) : row;
  if (stored?.currentText) return { result: JSON.parse(stored.currentText) as StoredBalance, computedAt: stored.computedAt, reused: true };
  const ctx = await loadSetContext(show, set);
  if (!ctx.listeningPoints.some((l) => l.id === listeningPointId)) throw notFound("No such listening point in this show.");
  const targets = showTargets(show.checkTargets);
  const { played, written } = setInputs(
    {
      roster: ctx.roster,
      music: ctx.music,
      listeningPoints: ctx.listeningPoints,
      conditions: showConditions(show),
      instruments: (ctx.catalog?.instruments as InstrumentCatalog | undefined) ?? undefined,
    },
    { order: set.order, positions: ctx.positions },
  );
  const limits = limitsFor(show.planLimits, phraseAt(ctx.music.phrases, set.order)?.planLimits);
  const hash = balanceHash(played, written, { targets, limits }, listeningPointId);
  if (stored?.modelVersion === STORED_VERSION && stored.inputsHash === hash) {
    const kept = await findStoredResult(set.id, listeningPointId, hash);
    if (kept) {
      await markAnalysisCurrent({ setId: set.id, listeningPointId, inputsHash: hash, modelVersion: STORED_VERSION }, revisions);
      return { result: kept.result as StoredBalance, computedAt: kept.computedAt, reused: true };
    }
  }
  const result = computeBalance(played, written, listeningPointId, targets, limits);
  const computedAt = await storeAnalysis({ setId: set.id, listeningPointId, inputsHash: hash, modelVersion: STORED_VERSION, result, ...revisions });
  return { result, computedAt, reused: false };
}
