// Where the drill meets the music. An anchor says "set S is at measure M, beat B"; the first is
// required, a later one resets the mapping from its set on (fermatas, tempo changes, cuts). Between
// anchors one count of drill is one count of music. Pure.
import { ScoreError } from "./errors";
import type { Score } from "./types";

/** Part id → the show's section it plays in, or null when it is left out. */
export type PartMap = Record<string, string | null>;

export interface ScoreAnchor {
  setId: string;
  /** The measure's number as printed. */
  measure: string;
  /** 1 = the measure's first count; 2.5 = halfway through its second. */
  beat: number;
  /** Which time through a repeat (1 when absent). */
  pass?: number;
}

export interface SetOnLine {
  id: string;
  number: string;
  /** Counts from the previous set. */
  counts: number;
}

/** Each set's count on the show's count line: the first set is at 0, each later one its counts after the one before. */
export function showCounts(setsInOrder: readonly SetOnLine[]): number[] {
  let c = 0;
  return setsInOrder.map((s, i) => (c += i === 0 ? 0 : s.counts));
}

/** The score count of `beat` in the printed measure `measure` (its `pass`-th time); ScoreError when there is no such point. */
export function scoreCountOf(score: Score, a: Pick<ScoreAnchor, "measure" | "beat" | "pass">): number {
  const m = score.measures.find((x) => x.number === a.measure.trim() && x.pass === (a.pass ?? 1));
  if (!m) throw new ScoreError(`The score has no measure ${a.measure}${a.pass && a.pass > 1 ? ` played a ${a.pass}${a.pass === 2 ? "nd" : a.pass === 3 ? "rd" : "th"} time` : ""}.`);
  if (!(a.beat >= 1 && a.beat < m.counts + 1)) throw new ScoreError(`Measure ${a.measure} has ${m.counts} count${m.counts === 1 ? "" : "s"}; beat ${a.beat} is not in it.`);
  return m.startCount + (a.beat - 1);
}

/** One stretch of the show that follows the music from an anchor: show counts [showStart, showEnd) play score counts from scoreStart on. */
export interface Segment {
  showStart: number;
  showEnd: number;
  scoreStart: number;
}

/** The stretches the anchors make, in show order; ScoreError for a missing first anchor, an unknown set or measure, or two anchors on one set. */
export function segmentsOf(score: Score, anchors: readonly ScoreAnchor[], setsInOrder: readonly SetOnLine[]): Segment[] {
  if (!anchors.length) throw new ScoreError("Anchor the drill to the music: say at which measure and beat one set falls (for example set 1 at measure 1, beat 1).");
  const counts = showCounts(setsInOrder);
  const indexOf = new Map(setsInOrder.map((s, i) => [s.id, i]));
  const seen = new Set<string>();
  const placed = anchors.map((a) => {
    const i = indexOf.get(a.setId);
    if (i === undefined) throw new ScoreError("An anchor names a set that is not in this show.");
    if (seen.has(a.setId)) throw new ScoreError(`Set ${setsInOrder[i]!.number} has two anchors; keep one.`);
    seen.add(a.setId);
    return { showStart: counts[i]!, scoreStart: scoreCountOf(score, a) };
  });
  placed.sort((a, b) => a.showStart - b.showStart);
  return placed.map((p, k) => ({ ...p, showEnd: placed[k + 1]?.showStart ?? Infinity }));
}

/** The score count heard at show count `c`, or null before the first anchor or past the music's end. */
export function scoreCountAt(segments: readonly Segment[], score: Score, c: number): number | null {
  const seg = [...segments].reverse().find((s) => s.showStart <= c);
  if (!seg) return null;
  const at = seg.scoreStart + (c - seg.showStart);
  return at <= score.totalCounts + 1e-6 ? at : null;
}
