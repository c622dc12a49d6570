// The listening point's background as octave levels, the bands the synthesized noise is shaped in.
import { backgroundThirdOctaves, type Background } from "@/lib/acoustics/background";
import { BAND_COUNT } from "@/lib/acoustics/bands";
import { dbToEnergy, energyToDb } from "@/lib/acoustics/levels";

/** Index of the 50 Hz third-octave, the first of the 63 Hz octave, in the 28 thirds 25 Hz … 12.5 kHz. */
const FIRST_THIRD = 3;

/** 8 octave levels (63 Hz … 8 kHz, dB): each the energy sum of its three thirds; null for no background. */
export function backgroundOctaveDb(background: Background | null | undefined): number[] | null {
  if (!background) return null;
  const thirds = backgroundThirdOctaves(background);
  return Array.from({ length: BAND_COUNT }, (_, k) => energyToDb([0, 1, 2].reduce((s, j) => s + dbToEnergy(thirds[FIRST_THIRD + 3 * k + j]!), 0)));
}
