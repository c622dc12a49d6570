// Octave-band energies of rendered samples, measured independently of the code under test: an FFT (fft.js 4.0.4)
// of a Hann-windowed stretch, summed between the base-2 octave edges fm·2^(∓1/2) of IEC 61260-1:2014.
import FFT from "fft.js";

/** Exact octave centres 63 Hz … 8 kHz (IEC 61260-1 base 10). */
export const OCTAVE_CENTRES = [0, 1, 2, 3, 4, 5, 6, 7].map((k) => 1000 * 10 ** ((3 * (k - 4)) / 10));

/** Energy in each octave of 65 536 samples from index `start` (missing samples count as 0). */
export function octaveEnergies(x: ArrayLike<number>, start: number, sampleRate: number): number[] {
  const n = 65_536;
  const frame = Array.from({ length: n }, (_, i) => (x[start + i] ?? 0) * (0.5 - 0.5 * Math.cos((2 * Math.PI * i) / (n - 1))));
  const fft = new FFT(n);
  const out = fft.createComplexArray();
  fft.realTransform(out, frame);
  return OCTAVE_CENTRES.map((fm) => {
    let e = 0;
    for (let k = Math.ceil((fm / Math.SQRT2) * (n / sampleRate)); k < Math.min(n / 2, (fm * Math.SQRT2 * n) / sampleRate); k++) e += out[2 * k]! ** 2 + out[2 * k + 1]! ** 2;
    return e;
  });
}
