// The octave filters' width and the struck sources' mean power, as the equaliser (equaliser.ts) and the graph use them.

/** Q of a second-order filter one octave wide between its half-power points (Q = √2 / (2 − 1)). */
export const OCTAVE_Q = Math.SQRT2;

/** Mean square over one count of `countSeconds` of a burst e^(−t/τ) of variance-1 noise struck at its start. */
export function burstMeanSquare(decaySeconds: number, countSeconds: number): number {
  return ((decaySeconds / 2) * (1 - Math.exp((-2 * countSeconds) / decaySeconds))) / countSeconds;
}
