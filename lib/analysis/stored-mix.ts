// The box mix of a set at a listening point: the stored result while its inputs are unchanged, else recomputed and stored.
import "server-only";
import { createHash } from "node:crypto";
import { findStoredAnalysis, storeAnalysis } from "@/db/queries/set-context";
import { analyzeSet, toJsonSafe } from "@/lib/acoustics";
import type { AnalysisInput, PointResult } from "@/lib/acoustics/types";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { notFound } from "@/lib/http/errors";
import { setAnalysisInput } from "./set-input";

export function inputsHash(input: AnalysisInput, listeningPointId: string): string {
  return createHash("sha256").update(JSON.stringify({ input, listeningPointId })).digest("hex");
}

/** The API's `mix` object (shared/API.md), with band levels added. */
export function mixOf(point: PointResult) {
  const pick = (o: Record<string, { dbA: number; bandsDb: number[] } | undefined>) =>
    Object.fromEntries(Object.entries(o).flatMap(([k, v]) => (v ? [[k, { dbA: v.dbA, bandsDb: v.bandsDb }]] : [])));
  return toJsonSafe({
    totalDbA: point.totalDbA,
    voices: pick(point.voices),
    sections: pick(point.sections),
    performers: point.performers.map((p) => ({ performerId: p.id, dbA: p.dbA, arrivalMs: p.arrivalMs })),
    arrivalSpreadMs: point.arrivalSpreadMs,
  });
}

export async function storedMix(
  show: Parameters<typeof setAnalysisInput>[0],
  set: { id: string; order: number },
  listeningPointId: string,
) {
  const { input } = await setAnalysisInput(show, set);
  const point = input.listeningPoints.find((l) => l.id === listeningPointId);
  if (!point) throw notFound("No such listening point in this show.");
  const hash = inputsHash(input, listeningPointId);
  const stored = await findStoredAnalysis(set.id, listeningPointId);
  if (stored && stored.inputsHash === hash && stored.modelVersion === MODEL_VERSION) {
    return { result: stored.result as ReturnType<typeof mixOf>, computedAt: stored.computedAt, reused: true };
  }
  const analysis = analyzeSet({ ...input, listeningPoints: [point] });
  const result = mixOf(analysis.points[0]!);
  const computedAt = await storeAnalysis({ setId: set.id, listeningPointId, inputsHash: hash, modelVersion: MODEL_VERSION, result });
  return { result, computedAt, reused: false };
}
