// Noise exposure limits: the daily time allowed at a level and the dose of a given time.
// NIOSH 98-126 (1998): 85 dBA for 8 h, 3 dB exchange rate. OSHA 29 CFR 1910.95 (Table G-16):
// 90 dBA for 8 h, 5 dB exchange rate. Estimates for cautions only; local rules and licensed
// audiologists decide.
import { AcousticsInputError, requireFinite } from "./errors";

export type ExposureStandard = "niosh" | "osha";

const CRITERIA: Record<ExposureStandard, { levelDbA: number; exchangeDb: number }> = {
  niosh: { levelDbA: 85, exchangeDb: 3 },
  osha: { levelDbA: 90, exchangeDb: 5 },
};
const WORKDAY_MIN = 480;

function criterion(standard: ExposureStandard) {
  const c = Object.hasOwn(CRITERIA, standard) ? CRITERIA[standard] : undefined;
  if (!c) throw new AcousticsInputError("standard", 'must be "niosh" or "osha"');
  return c;
}

/** Minutes per day allowed at a steady level: T = 480 / 2^((L − criterion) / exchange); Infinity for -Infinity dBA. */
export function exposureLimitMinutes(dbA: number, standard: ExposureStandard): number {
  const { levelDbA, exchangeDb } = criterion(standard);
  if (typeof dbA !== "number" || Number.isNaN(dbA) || dbA === Infinity) {
    throw new AcousticsInputError("dbA", "must be a number below Infinity");
  }
  return WORKDAY_MIN / 2 ** ((dbA - levelDbA) / exchangeDb);
}

/** Daily noise dose of `minutes` at a steady level as a fraction of the allowed dose (1 = 100 %). */
export function dailyDose(dbA: number, minutes: number, standard: ExposureStandard): number {
  const m = requireFinite(minutes, "minutes");
  if (m < 0) throw new AcousticsInputError("minutes", "must not be negative");
  return m / exposureLimitMinutes(dbA, standard);
}
