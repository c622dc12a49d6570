// The held chord a part plays when the show has no score: a C major triad in its register.
import type { Register } from "@/lib/acoustics/types";

// Common practice, no source: a close triad around the middle of each register's marching range.
const CHORDS: Record<Register, number[]> = {
  soprano: [72, 76, 79], // C5 E5 G5
  alto: [67, 72, 76], // G4 C5 E5
  tenor: [55, 60, 64], // G3 C4 E4
  bass: [36, 43, 48], // C2 G2 C3
};

/** MIDI notes of the held chord of a register. */
export function heldChord(register: Register): number[] {
  return CHORDS[register];
}

/** Frequency (Hz) of a MIDI note, A4 = 69 = 440 Hz (equal temperament). */
export function midiHz(midi: number): number {
  return 440 * 2 ** ((midi - 69) / 12);
}
