// analyzeSet: the box mix of one set at every listening point.
import { backgroundThirdOctaves, type Background } from "./background";
import { catalogOf } from "./box-players";
import { createSetEvaluator } from "./evaluator";
import { pointLoudness, type PointLoudness } from "./point-loudness";
import type { AnalysisInput, AnalysisResult, PointResult } from "./types";

/** Families whose sound masks as noise rather than as tones (audibility.ts): the battery's drums and cymbals. */
export const NOISE_LIKE_FAMILIES: readonly string[] = ["percussion"];

/** Per voice, the octave levels (dB) of its noise-like players at a point; voices without any are absent. */
export function noiseLikeVoiceBands(input: AnalysisInput, point: PointResult): Record<string, number[]> {
  const catalog = catalogOf(input);
  const byId = new Map(point.performers.map((p) => [p.id, p]));
  const energy: Record<string, number[]> = {};
  for (const perf of input.performers) {
    const res = byId.get(perf.id);
    if (perf.voice === "tacet" || !res || !NOISE_LIKE_FAMILIES.includes(catalog[perf.instrument]?.family ?? "")) continue;
    const e = (energy[perf.voice] ??= res.bandsDb.map(() => 0));
    res.bandsDb.forEach((l, b) => (e[b] += 10 ** (l / 10)));
  }
  return Object.fromEntries(Object.entries(energy).map(([voice, e]) => [voice, e.map((x) => 10 * Math.log10(x))]));
}

/** The loudness at a point (ISO 532-1, point-loudness.ts) of its voices' levels over the point's background. */
export function loudnessOfPoint(input: AnalysisInput, point: PointResult, background: Background | null | undefined): PointLoudness {
  const voiceBands: Record<string, number[]> = {};
  for (const [voice, level] of Object.entries(point.voices)) if (level) voiceBands[voice] = level.bandsDb;
  return pointLoudness(voiceBands, backgroundThirdOctaves(background), "free", noiseLikeVoiceBands(input, point));
}

/**
 * Predicted levels of every performer, section, voice and the whole band at each listening
 * point, per octave band and A-weighted, with arrival times, and the loudness of the band and of
 * each voice with the point's background (ISO 532-1, point-loudness.ts). Tacet performers are
 * listed with dbA and bandsDb at -Infinity (not JSON-safe: see toJsonSafe) and an arrivalMs, and
 * are left out of every sum and of the arrival spread. A voice no one plays is absent from
 * `voices`; a section whose players are all tacet is present at -Infinity.
 */
export function analyzeSet(input: AnalysisInput): AnalysisResult {
  const evaluator = createSetEvaluator(input);
  evaluator.evaluate();
  const result = evaluator.result();
  result.points.forEach((point, n) => {
    point.loudness = loudnessOfPoint(input, point, input.listeningPoints[n].background);
  });
  return result;
}
