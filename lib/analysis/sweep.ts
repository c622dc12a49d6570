// The transition sweep into a set: the box levels and the failing checks at every count from
// the previous set, the performers moving in straight lines at an even step. Pure.
import { checkBalance, createSetEvaluator, positionsBetweenInto, VOICES } from "@/lib/acoustics";
import { loudnessOfPoint } from "@/lib/acoustics/analyze";
import type { BalanceTargets } from "@/lib/acoustics/targets";
import type { AnalysisInput, CheckId, Position } from "@/lib/acoustics/types";

export interface SweepSample {
  /** Count of the transition, 1 … counts (counts = the set itself); 0 for a show's first set. */
  count: number;
  totalDbA: number | null;
  voices: Record<string, number | null>;
  /** Loudness (ISO 532-1, sone) of the band and of each voice at the point; null where nothing sounds. */
  totalSone: number | null;
  voicesSone: Record<string, number | null>;
  failing: CheckId[];
  /** Checks with nothing to judge at this count (no melody, nobody sounding…): neither a pass nor a failure. */
  notApplicable?: CheckId[];
}

const finite = (v: number) => (Number.isFinite(v) ? v : null);

/**
 * Samples at counts 1…counts of the transition into `to` (the destination's voicing throughout),
 * per listening point of `to`. With no previous positions (the first set) one sample, the set itself.
 */
export function sweepTransition(to: AnalysisInput, fromPositions: readonly Position[] | null, counts: number, targets: BalanceTargets): Record<string, SweepSample[]> {
  const out: Record<string, SweepSample[]> = Object.fromEntries(to.listeningPoints.map((l) => [l.id, []]));
  if (to.performers.length === 0) return out;
  const ev = createSetEvaluator(to);
  const end = { x: Float64Array.from(to.performers, (p) => p.x), y: Float64Array.from(to.performers, (p) => p.y), facingDeg: Float64Array.from(to.performers, (p) => p.facingDeg) };
  const start = { x: Float64Array.from(end.x), y: Float64Array.from(end.y), facingDeg: Float64Array.from(end.facingDeg) };
  const fromById = new Map((fromPositions ?? []).map((p) => [p.performerId, p]));
  to.performers.forEach((p, i) => {
    const f = fromById.get(p.id);
    if (f) {
      start.x[i] = f.x;
      start.y[i] = f.y;
      start.facingDeg[i] = f.facingDeg;
    }
  });
  const steps = fromPositions && counts > 0 ? Array.from({ length: counts }, (_, k) => k + 1) : [0];
  for (const count of steps) {
    positionsBetweenInto(start, end, count === 0 ? 1 : count / counts, ev);
    ev.evaluate();
    const result = ev.result();
    const input: AnalysisInput = { ...to, performers: to.performers.map((p, i) => ({ ...p, x: ev.x[i]!, y: ev.y[i]!, facingDeg: ev.facingDeg[i]! })) };
    for (const point of result.points) {
      const voices: Record<string, number | null> = {};
      for (const v of VOICES) voices[v] = finite(point.voices[v]?.dbA ?? -Infinity);
      // Computed once here and read again by the checks (heard at the box).
      point.loudness = loudnessOfPoint(input, point, to.listeningPoints.find((l) => l.id === point.listeningPointId)?.background);
      const voicesSone: Record<string, number | null> = {};
      for (const v of VOICES) voicesSone[v] = point.loudness.voices[v]?.sone ?? null;
      const checks = checkBalance(input, point, targets);
      out[point.listeningPointId]!.push({
        count,
        totalDbA: finite(point.totalDbA),
        voices,
        totalSone: Number.isFinite(point.totalDbA) ? point.loudness.totalSone : null,
        voicesSone,
        failing: checks.filter((c) => !c.passed).map((c) => c.id),
        notApplicable: checks.filter((c) => c.status === "not-applicable").map((c) => c.id),
      });
    }
  }
  return out;
}
