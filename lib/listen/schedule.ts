// Everything the Listen graph plays for one transition, worked out before any audio node exists.
import { heldChord, midiHz } from "./chords";
import { countTimes } from "./count-times";
import { normalisationOffsetDb } from "./normalise";
import { notesInSpan, type ScoreNote, type ScoreNotes } from "./score-notes";
import { transitionCurves, type PartCurve } from "./transition";
import type { ListenAnswer } from "./types";

/** Counts the opening set (no transition into it) is held for. */
export const HOLD_COUNTS = 8;

export interface ListenInput {
  /** The set before, or null for the opening set. */
  from: ListenAnswer | null;
  to: ListenAnswer;
  /** Counts of the transition (the to-set's counts). */
  counts: number;
  /** The to-set's place on the show's count line minus `counts`: where the transition starts. */
  spanStartOnLine: number;
  /** The score's notes and tempo, or null without a score. */
  score: NonNullable<ScoreNotes["score"]> | null;
  /** Counts a minute without a score. */
  fallbackBpm: number;
}

export interface PartPlan {
  curve: PartCurve;
  /** Notes from the transition's count 0 (pitched parts), or strikes (battery: midi unused). */
  notes: ScoreNote[];
  /** Battery and cymbals sound as struck noise; the rest as a chord of harmonic tones. */
  struck: boolean;
  /** Frequencies the band gains are worked out for: the register's held chord. */
  calibrationHz: number[];
}

export interface ListenSchedule {
  parts: PartPlan[];
  /** Seconds from count 0 to every count 0 … counts of the transition. */
  times: number[];
  counts: number;
  /** Added to every level (dB) to reach full-scale units (normalise.ts). */
  offsetDb: number;
  backgroundOctaveDb: number[] | null;
}

/** The plan of a transition: each part's levels count by count, its notes, the timing and the playback level. */
export function scheduleListen(input: ListenInput): ListenSchedule {
  const counts = input.from ? Math.max(1, Math.round(input.counts)) : Math.max(HOLD_COUNTS, Math.round(input.counts));
  const curves = transitionCurves(input.from, input.to, counts);
  const times = countTimes(input.spanStartOnLine, input.spanStartOnLine + counts, input.score?.tempo ?? [], input.fallbackBpm);
  const parts = curves.map((curve): PartPlan => {
    const struck = curve.family === "percussion";
    const chord = heldChord(curve.register);
    const scored = input.score?.sections[curve.section];
    let notes: ScoreNote[];
    if (scored) notes = notesInSpan(scored.notes, input.spanStartOnLine, input.spanStartOnLine + counts);
    else if (struck) notes = Array.from({ length: counts }, (_, c) => ({ atCount: c, lengthCounts: 1, midi: 0 }));
    else notes = chord.map((midi) => ({ atCount: 0, lengthCounts: counts, midi }));
    return { curve, notes, struck, calibrationHz: chord.map(midiHz) };
  });
  const perCount = Array.from({ length: counts + 1 }, (_, c) => curves.map((p) => p.bandsDb[c]!));
  return { parts, times, counts, offsetDb: normalisationOffsetDb(perCount, input.to.backgroundOctaveDb), backgroundOctaveDb: input.to.backgroundOctaveDb };
}
