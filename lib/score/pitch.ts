// Written pitch to MIDI note number (MIDI 1.0: middle C, C4, is 60 and A4 is 69). Pure.

const STEP_SEMITONES: Record<string, number> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };

/** The MIDI note number of `step` (C … B) with `alter` semitones in `octave` (scientific octave numbers, C4 = middle C); null when not a pitch. */
export function midiOf(step: string, octave: number, alter = 0): number | null {
  const s = STEP_SEMITONES[step.trim().toUpperCase()];
  if (s === undefined || !Number.isFinite(octave) || !Number.isFinite(alter)) return null;
  const midi = 12 * (octave + 1) + s + Math.round(alter);
  return midi >= 0 && midi <= 127 ? midi : null;
}
