// Counts to seconds: the score's tempo marks (or one tempo) over the show's count line.
import { msPerCount } from "@/lib/editor/playback";

/** A tempo mark on the show's count line: from `atCount` on, `bpm` counts a minute. */
export interface TempoMark {
  atCount: number;
  bpm: number;
}

/** The tempo (counts a minute) in force at a count: the last mark at or before it, the first mark before any, `fallbackBpm` with none. */
export function bpmAt(count: number, marks: readonly TempoMark[], fallbackBpm: number): number {
  if (marks.length === 0) return fallbackBpm;
  const sorted = [...marks].sort((a, b) => a.atCount - b.atCount);
  let bpm = sorted[0]!.bpm;
  for (const m of sorted) if (m.atCount <= count) bpm = m.bpm;
  return bpm;
}

/**
 * Seconds from count `start` to every whole count start … end (index 0 = start), each count lasting a beat
 * at the tempo in force when it begins (the field animation steps the same way), the tempo kept in the
 * player's range.
 */
export function countTimes(start: number, end: number, marks: readonly TempoMark[], fallbackBpm: number): number[] {
  const out = [0];
  for (let c = start; c < end; c++) out.push(out[out.length - 1]! + msPerCount(bpmAt(c, marks, fallbackBpm)) / 1000);
  return out;
}

/** Seconds from the span's start at a count `x` counts into it (fractions within a count are linear), from countTimes' answer. */
export function secondsAt(times: readonly number[], x: number): number {
  if (x <= 0) return 0;
  const last = times.length - 1;
  if (x >= last) return times[last]! + (x - last) * (last > 0 ? times[last]! - times[last - 1]! : 0.5);
  const i = Math.floor(x);
  return times[i]! + (x - i) * (times[i + 1]! - times[i]!);
}
