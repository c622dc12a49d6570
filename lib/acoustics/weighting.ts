// A-weighting, IEC 61672-1:2013 Annex E analytic form (poles in Hz, normalised by A1000).
import { requireFinite, AcousticsInputError } from "./errors";

const F1 = 20.598997;
const F2 = 107.65265;
const F3 = 737.86223;
const F4 = 12194.217;
const A1000 = -2.0;

/** A-weighting in dB at a frequency (0 dB at 1 kHz). */
export function aWeightingDb(frequencyHz: number): number {
  const f = requireFinite(frequencyHz, "frequencyHz");
  if (f <= 0) throw new AcousticsInputError("frequencyHz", "must be above 0");
  const f2 = f * f;
  const gain = (F4 * F4 * f2 * f2) / ((f2 + F1 * F1) * Math.sqrt(f2 + F2 * F2) * Math.sqrt(f2 + F3 * F3) * (f2 + F4 * F4));
  return 20 * Math.log10(gain) - A1000;
}
