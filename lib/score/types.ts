// The score as Farfield reads it: positions in score counts from the start of the music as played
// (repeats expanded), one count a beat of the meter rule in meter.ts. Pure types.

export interface ScoreMeasure {
  /** The measure's number as printed ("0" for a pickup, "12"). */
  number: string;
  /** Which pass through a repeat this is (1, then 2 …). */
  pass: number;
  startCount: number;
  counts: number;
  /** Time signature in force, e.g. 6 and 8. */
  beats: number;
  beatType: number;
}

export interface ScoreNote {
  atCount: number;
  lengthCounts: number;
  /** MIDI note number (A4 = 69). */
  midi: number;
}

export interface DynamicMark {
  atCount: number;
  /** Index on pp … fff (0 … 6). */
  level: number;
}

export interface Wedge {
  kind: "crescendo" | "diminuendo";
  startCount: number;
  stopCount: number;
}

export interface ScoreHint {
  atCount: number;
  measure: string;
  text: string;
}

export interface ScorePart {
  id: string;
  name: string;
  notes: ScoreNote[];
  marks: DynamicMark[];
  wedges: Wedge[];
  /** Solo, soli and divisi as written above the part. */
  hints: ScoreHint[];
}

export interface TempoMark {
  atCount: number;
  /** Counts (beats) a minute. */
  bpm: number;
}

export interface ScoreBoundary {
  atCount: number;
  kind: "rehearsal" | "double-bar";
  label: string;
  measure: string;
}

export interface Score {
  title: string;
  parts: ScorePart[];
  measures: ScoreMeasure[];
  tempo: TempoMark[];
  boundaries: ScoreBoundary[];
  totalCounts: number;
}
