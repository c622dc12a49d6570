// How much one show may hold and how much work one request may ask for (README, "Limits"). Past a
// size a request is refused with 413, past what a show may hold or a computation may cost with 422,
// so no single request can keep the server busy for long. Pure.

/** What one show may hold. */
export const SHOW_LIMITS = {
  performers: 500,
  sets: 200,
  /** Counts of one transition (from the previous set). */
  countsPerSet: 999,
  listeningPoints: 10,
} as const;

/** Days a deleted show can be restored before it is removed for good. */
export const SHOW_UNDO_DAYS = 14;

/** One roster or drill CSV upload: its size and rows (413 past them). */
export const MAX_UPLOAD_BYTES = 1_000_000;
export const MAX_ROSTER_ROWS = 1_000;
export const MAX_DRILL_ROWS = 20_000;

/** One MusicXML score upload (.musicxml, .xml or compressed .mxl), as sent (413 past it). */
export const MAX_SCORE_BYTES = 4_000_000;
/** A score's text once an .mxl is unzipped, its measures as played (repeats expanded) and its notes (400 past them). */
export const MAX_SCORE_TEXT_BYTES = 20_000_000;
export const MAX_SCORE_MEASURES = 2_000;
export const MAX_SCORE_NOTES = 200_000;

/** Largest show file accepted for import (bytes). */
export const MAX_SHOW_FILE_BYTES = 8_000_000;

/** Deepest nesting of arrays and objects a JSON body or file may have: ours need fewer than 10 levels. */
export const MAX_JSON_DEPTH = 32;

/**
 * Whole-show computations (the timeline and the transition sweeps) evaluate every placed performer at
 * every count of every set for every listening point: at most this many such evaluations per request
 * (about 8 s of one core), and at most this many samples (counts × listening points) in the answer.
 */
export const MAX_SHOW_WORK = 2_000_000;
export const MAX_SHOW_SAMPLES = 50_000;

type Thing = keyof typeof SHOW_LIMITS;
const NAMES: Record<Thing, string> = { performers: "performers", sets: "sets", countsPerSet: "counts in one set", listeningPoints: "listening points" };

/** The sentence that refuses `count` of `what` for a show (null when within the limit). */
export function showLimitProblem(what: Thing, count: number): string | null {
  const max = SHOW_LIMITS[what];
  return count > max ? `A show may have at most ${max} ${NAMES[what]}; this would make ${count}.` : null;
}

export interface ShowSize {
  /** Placed performers of each set, in show order, with the set's counts. */
  sets: readonly { placed: number; counts: number }[];
  listeningPoints: number;
}

/** Evaluations and samples of a whole-show sweep: a set is swept at each of its counts (one sample for the first set or 0 counts). */
export function showWork(size: ShowSize): { work: number; samples: number } {
  let work = 0;
  let counts = 0;
  size.sets.forEach((s, i) => {
    const steps = i > 0 && s.counts > 0 ? s.counts : 1;
    counts += steps;
    work += s.placed * steps;
  });
  return { work: work * size.listeningPoints, samples: counts * size.listeningPoints };
}

/** Why a whole-show computation of this show is refused, in words a director understands (null when it is within the limits). */
export function showWorkProblem(size: ShowSize): string | null {
  const { work, samples } = showWork(size);
  if (work > MAX_SHOW_WORK) {
    return `This show is too large to sweep as a whole: placed performers × counts × listening points come to ${work.toLocaleString("en-US")}, more than the ${MAX_SHOW_WORK.toLocaleString("en-US")} one request may compute. Remove listening points you do not need, or split the show.`;
  }
  if (samples > MAX_SHOW_SAMPLES) {
    return `This show is too long to sweep as a whole: counts × listening points come to ${samples.toLocaleString("en-US")}, more than ${MAX_SHOW_SAMPLES.toLocaleString("en-US")}. Remove listening points you do not need, or split the show.`;
  }
  return null;
}
