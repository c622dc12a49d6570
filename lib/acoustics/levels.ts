// Level arithmetic: energetic sums and spherical spreading.
import { AcousticsInputError } from "./errors";

/** 10·log10 of an energy ratio; -Infinity for zero energy. */
export function energyToDb(energy: number): number {
  return 10 * Math.log10(energy);
}

/** Energy ratio of a level in dB (10^(L/10)); 0 for -Infinity. */
export function dbToEnergy(levelDb: number): number {
  return Math.exp(levelDb * (Math.LN10 / 10));
}

/** Energetic (incoherent) sum 10·log10 Σ 10^(Li/10); -Infinity for no levels. */
export function sumLevelsDb(levels: readonly number[]): number {
  let energy = 0;
  for (let i = 0; i < levels.length; i++) {
    const l = levels[i];
    if (Number.isNaN(l) || l === Infinity) throw new AcousticsInputError(`levels[${i}]`, "must be a number below Infinity");
    energy += dbToEnergy(l);
  }
  return energyToDb(energy);
}

/** ISO 9613-2:1996 eq. (7) geometric divergence: 20·lg(d / 1 m) + 11 dB. */
export function divergenceDb(distanceM: number): number {
  // The typeof test is kept for readers; Number.isFinite refuses non-numbers too, so mutating it
  // is equivalent (mutation testing).
  if (typeof distanceM !== "number" || !Number.isFinite(distanceM) || distanceM <= 0) {
    throw new AcousticsInputError("distanceM", "must be a positive finite number");
  }
  return 20 * Math.log10(distanceM) + 11;
}
