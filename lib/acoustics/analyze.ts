// analyzeSet: the box mix of one set at every listening point.
import { backgroundThirdOctaves } from "./background";
import { createSetEvaluator } from "./evaluator";
import { pointLoudness } from "./point-loudness";
import type { AnalysisInput, AnalysisResult } from "./types";

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
    const voiceBands: Record<string, number[]> = {};
    for (const [voice, level] of Object.entries(point.voices)) if (level) voiceBands[voice] = level.bandsDb;
    point.loudness = pointLoudness(voiceBands, backgroundThirdOctaves(input.listeningPoints[n].background));
  });
  return result;
}
