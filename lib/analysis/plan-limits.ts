// The musical limits in force for a phrase: the defaults, the show's stored limits, then the phrase's.
import { DEFAULT_LIMITS, resolveLimits, type MusicalLimits } from "@/lib/acoustics/plan-limits";

/** Stored values that no longer validate (a range tightened later) are left out, field by field. */
export function storedLimits(stored: unknown): Partial<MusicalLimits> {
  if (!stored || typeof stored !== "object") return {};
  const out: Partial<MusicalLimits> = {};
  for (const key of Object.keys(DEFAULT_LIMITS)) {
    const value = (stored as Record<string, unknown>)[key];
    if (value === undefined) continue;
    try {
      const one = { [key]: value } as Partial<MusicalLimits>;
      resolveLimits(one);
      Object.assign(out, one);
    } catch {
      // keep the default for this field
    }
  }
  return out;
}

/** The limits of a phrase (or of a set outside any phrase: phrase null). */
export function limitsFor(showStored: unknown, phraseStored: unknown): MusicalLimits {
  return resolveLimits(storedLimits(showStored), storedLimits(phraseStored));
}
