// What Listen plays for one set at one listening point: one part per section and voice.
import type { Family, Register, Voice } from "@/lib/acoustics/types";

/** One synthesized voice: a section's players of one voice, as the listening point hears them. */
export interface ListenPart {
  /** `section|voice`: the same part in every set. */
  key: string;
  section: string;
  voice: Voice;
  /** Family and register of the part's loudest player's instrument: they choose the synthesized sound. */
  family: Family;
  register: Register;
  /** Octave-band levels (63 Hz … 8 kHz, dB) of the part at the point, as written. */
  bandsDb: number[];
  /** Level change (dB) of the part with the balance plan's dynamics, energy-weighted over its players. */
  planChangeDb: number;
  /** Arrival at the point (ms from the sound leaving the field), the A-weighted energy-weighted mean of its players. */
  arrivalMs: number;
}

/** The body of GET …/sets/{setId}/listen. */
export interface ListenAnswer {
  listeningPointId: string;
  parts: ListenPart[];
  /** The listening point's background as 8 octave levels (dB), or null when it has none. */
  backgroundOctaveDb: number[] | null;
}
