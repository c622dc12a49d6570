// Written dynamics on the steps Farfield knows (pp … fff) and their value at any count, with
// crescendo and diminuendo wedges as a rise or fall between two markings. Pure.
import { DYNAMICS, type Dynamic } from "@/lib/acoustics/types";
import type { DynamicMark, Wedge } from "./types";

// MusicXML 4.0 <dynamics> children onto our steps: softer than pp counts as pp and louder than fff
// as fff; fp, sfp and sfpp as the soft level that follows the accent; sf, sfz, fz, rf and the like
// are accents, not a new level, and are left out (common practice, no source).
const LEVEL_OF: Record<string, Dynamic> = {
  pppppp: "pp", ppppp: "pp", pppp: "pp", ppp: "pp", pp: "pp", p: "p", mp: "mp", mf: "mf", f: "f", ff: "ff",
  fff: "fff", ffff: "fff", fffff: "fff", ffffff: "fff", fp: "p", sfp: "p", sfpp: "pp", pf: "f", n: "pp",
};

/** The step index (0 = pp … 6 = fff) of a MusicXML dynamics element's name, or null for accents and unknown ones. */
export function levelOfMarking(element: string): number | null {
  const d = LEVEL_OF[element];
  return d ? DYNAMICS.indexOf(d) : null;
}

export const dynamicAt = (level: number): Dynamic => DYNAMICS[Math.max(0, Math.min(DYNAMICS.length - 1, level))]!;

const EPS = 1e-6;

/**
 * The written level (0 … 6) at `count`: the last marking at or before it; inside a wedge that starts
 * after that marking, the straight line from it to the next marking after the wedge's start, rounded
 * to the nearest step (a wedge with no marking after it rises or falls one step). Null before the
 * part's first marking.
 */
export function levelAt(marks: readonly DynamicMark[], wedges: readonly Wedge[], count: number): number | null {
  let last: DynamicMark | undefined;
  for (const m of marks) if (m.atCount <= count + EPS) last = m;
  if (!last) return null;
  let wedge: Wedge | undefined;
  for (const w of wedges) if (w.startCount >= last.atCount - EPS && w.startCount <= count + EPS) wedge = w;
  if (!wedge) return last.level;
  const next = marks.find((m) => m.atCount > wedge.startCount + EPS);
  const target = next ? next.level : Math.max(0, Math.min(6, last.level + (wedge.kind === "crescendo" ? 1 : -1)));
  if (count >= wedge.stopCount - EPS) return target;
  const span = wedge.stopCount - wedge.startCount;
  const t = span > EPS ? (count - wedge.startCount) / span : 1;
  return Math.round(last.level + (target - last.level) * t);
}
