// C-weighting, IEC 61672-1:2013 Annex E analytic form: sound level meters at the box are often
// set to C for music, so readings may come in dBC.
import { AcousticsInputError, requireFinite } from "./errors";

const F1 = 20.598997;
const F4 = 12194.217;
const C1000 = -0.062;

/** C-weighting in dB at a frequency (0 dB at 1 kHz). */
export function cWeightingDb(frequencyHz: number): number {
  const f = requireFinite(frequencyHz, "frequencyHz");
  // Stryker disable next-line ConditionalExpression,EqualityOperator: refusing every frequency stops calibration.ts loading (its C-weights are built at load), which Stryker 9.6.1 counts as survived; engine-helpers.test.ts fails on both by hand
  if (f <= 0) throw new AcousticsInputError("frequencyHz", "must be above 0");
  const f2 = f * f;
  const gain = (F4 * F4 * f2) / ((f2 + F1 * F1) * (f2 + F4 * F4));
  return 20 * Math.log10(gain) - C1000;
}
