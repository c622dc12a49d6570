// Playback level: the whole mix at a fixed loudness in the browser, whatever the predicted SPL.
import { dbToEnergy, energyToDb } from "@/lib/acoustics/levels";

/** RMS (dB re full scale) of the whole mix as written at its loudest count: quiet, with room for the plan and peaks. */
export const TARGET_MIX_DBFS = -30;

/**
 * The offset (dB) that takes predicted levels (dB SPL) to full-scale units: the loudest count's total as
 * written (every part's bands) lands on TARGET_MIX_DBFS. The background does not move it, so mixing the crowd
 * in adds the crowd at its level under the band; it sets the level only when no part sounds. Computed from
 * the levels, never from their absolute SPL, so a loud set is not played louder; 0 when nothing sounds.
 */
export function normalisationOffsetDb(countBands: readonly (readonly (readonly number[])[])[], backgroundOctaveDb: readonly number[] | null): number {
  let loudest = 0;
  for (const parts of countBands) {
    const e = parts.reduce((s, bands) => s + bands.reduce((t, l) => t + dbToEnergy(l), 0), 0);
    if (e > loudest) loudest = e;
  }
  if (loudest === 0 && backgroundOctaveDb) loudest = backgroundOctaveDb.reduce((s, l) => s + dbToEnergy(l), 0);
  return loudest > 0 ? TARGET_MIX_DBFS - energyToDb(loudest) : 0;
}
