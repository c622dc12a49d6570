// The director's balance targets of a show: the stored thresholds over the documented defaults.
import { DEFAULT_TARGETS, resolveTargets, type BalanceTargets } from "@/lib/acoustics/targets";

/** Stored values that no longer validate (a range tightened later) fall back to the default, field by field. */
export function showTargets(stored: unknown): BalanceTargets {
  const out = resolveTargets(null);
  if (!stored || typeof stored !== "object") return out;
  for (const key of Object.keys(DEFAULT_TARGETS) as (keyof BalanceTargets)[]) {
    const value = (stored as Record<string, unknown>)[key];
    if (value === undefined) continue;
    try {
      Object.assign(out, { [key]: resolveTargets({ [key]: value } as Partial<BalanceTargets>)[key] });
    } catch {
      // keep the default for this field
    }
  }
  return out;
}
