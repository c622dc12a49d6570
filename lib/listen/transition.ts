// A transition's parts count by count. The server answers each set, not each count, so between the
// from-set and the to-set every band level and the plan's change are interpolated in dB and the arrival
// in ms, along the same fraction of the counts the field animation moves the players by.
import { transitionFraction } from "@/lib/acoustics/transition";
import type { Family, Register, Voice } from "@/lib/acoustics/types";
import type { ListenAnswer, ListenPart } from "./types";

/** How far under its level (dB) a part starts or ends when it plays in only one of the two sets: it fades in or out. */
export const ABSENT_BELOW_DB = 60;

/** One part through a transition: index 0 is the from-set, the last index the to-set. */
export interface PartCurve {
  key: string;
  section: string;
  voice: Voice;
  family: Family;
  register: Register;
  /** Per count, the 8 octave-band levels as written (dB). */
  bandsDb: number[][];
  /** Per count, the plan's change (dB). */
  planChangeDb: number[];
  /** Per count, the delay (ms) after the earliest arrival of any part in either set. */
  delayMs: number[];
}

const mix = (a: number, b: number, t: number) => a + (b - a) * t;

function absentLike(p: ListenPart): ListenPart {
  return { ...p, bandsDb: p.bandsDb.map((l) => l - ABSENT_BELOW_DB) };
}

/**
 * Each part of either set, count 0 … counts. Without a from-set (the opening set) the to-set's values hold
 * for every count. Parts follow the order of the to-set, then parts that only the from-set has.
 */
export function transitionCurves(from: ListenAnswer | null, to: ListenAnswer, counts: number): PartCurve[] {
  const n = Math.max(1, Math.round(counts));
  const fromParts = new Map((from?.parts ?? []).map((p) => [p.key, p]));
  const toParts = new Map(to.parts.map((p) => [p.key, p]));
  const keys = [...new Set([...toParts.keys(), ...fromParts.keys()])];
  const earliest = Math.min(...[...fromParts.values(), ...toParts.values()].map((p) => p.arrivalMs));
  return keys.map((key) => {
    const b = toParts.get(key);
    const a = fromParts.get(key);
    const end = b ?? absentLike(a!);
    const start = from ? (a ?? absentLike(b!)) : end;
    const fractions = Array.from({ length: n + 1 }, (_, c) => transitionFraction(c, n));
    return {
      key,
      section: end.section,
      voice: end.voice,
      family: (b ?? a)!.family,
      register: (b ?? a)!.register,
      bandsDb: fractions.map((t) => start.bandsDb.map((l, k) => mix(l, end.bandsDb[k]!, t))),
      planChangeDb: fractions.map((t) => mix(start.planChangeDb, end.planChangeDb, t)),
      delayMs: fractions.map((t) => mix(start.arrivalMs, end.arrivalMs, t) - earliest),
    };
  });
}
