// Transition playback: the tempo a transition plays at and the counts it can show. Pure.

/** Tempos the player offers, in beats (counts) per minute; a field show sits well inside (common practice, no source). */
export const TEMPO_RANGE_BPM = [40, 240] as const;
export const DEFAULT_TEMPO_BPM = 120;

/** Milliseconds one count lasts at a tempo (beats per minute), the tempo brought into TEMPO_RANGE_BPM. */
export function msPerCount(bpm: number): number {
  const [lo, hi] = TEMPO_RANGE_BPM;
  const t = Number.isFinite(bpm) ? Math.min(hi, Math.max(lo, bpm)) : DEFAULT_TEMPO_BPM;
  return 60_000 / t;
}

/** A count of a transition of `counts` counts: a whole number from 0 (the previous set) to `counts` (this set). */
export function clampCount(count: number, counts: number): number {
  if (!Number.isFinite(count)) return 0;
  return Math.min(Math.max(0, counts), Math.max(0, Math.round(count)));
}
