// The body of GET …/sets/{setId}/listen: the set's parts at a listening point as written, with the stored
// analysis's balance plan as a change per part, and the point's background.
import "server-only";
import { loadSetContext } from "@/db/queries/set-context";
import type { Show } from "@/db/schema";
import { createSetEvaluator } from "@/lib/acoustics/evaluator";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import { notFound } from "@/lib/http/errors";
import { backgroundOctaveDb } from "@/lib/listen/background";
import { listenParts } from "@/lib/listen/parts";
import type { ListenAnswer } from "@/lib/listen/types";
import { setInputs } from "./balance-inputs";
import { showConditions } from "./set-input";
import { storedAnalysis } from "./stored-analysis";

/** `show` and `set` as the access check read them (storedAnalysis needs their revisions). */
export async function listenAnswer(show: Show, set: { id: string; order: number; inputsRevision: number }, listeningPointId: string): Promise<ListenAnswer> {
  const ctx = await loadSetContext(show, set);
  const point = ctx.listeningPoints.find((l) => l.id === listeningPointId);
  if (!point) throw notFound("No such listening point in this show.");
  const { result } = await storedAnalysis(show, set, listeningPointId);
  const instruments = (ctx.catalog?.instruments as InstrumentCatalog | undefined) ?? undefined;
  const { written } = setInputs(
    { roster: ctx.roster, music: ctx.music, listeningPoints: ctx.listeningPoints, conditions: showConditions(show), ...(instruments ? { instruments } : {}) },
    { order: set.order, positions: ctx.positions },
  );
  // The engine as written at this one point (no loudness: Listen needs levels and arrivals only).
  const evaluator = createSetEvaluator({ ...written, listeningPoints: [point] });
  evaluator.evaluate();
  const atPoint = evaluator.result().points[0]!;
  return { listeningPointId, parts: listenParts(atPoint, written.performers, result.plan, instruments), backgroundOctaveDb: backgroundOctaveDb(point.background) };
}
