// analyzeSet: the box mix of one set at every listening point.
import { createSetEvaluator } from "./evaluator";
import type { AnalysisInput, AnalysisResult } from "./types";

/**
 * Predicted levels of every performer, section, voice and the whole band at each listening
 * point, per octave band and A-weighted, with arrival times. Tacet performers are listed with
 * dbA and bandsDb at -Infinity (not JSON-safe: see toJsonSafe) and an arrivalMs, and are left out
 * of every sum and of the arrival spread. A voice no one plays is absent from `voices`; a section
 * whose players are all tacet is present at -Infinity.
 */
export function analyzeSet(input: AnalysisInput): AnalysisResult {
  const evaluator = createSetEvaluator(input);
  evaluator.evaluate();
  return evaluator.result();
}
