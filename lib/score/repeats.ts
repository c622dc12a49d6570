// The order measures are played in: plain repeat barlines expanded (forward/backward, with 1st/2nd
// endings), jumps (D.C., D.S., coda, segno, fine) refused, since their meaning depends on how the
// player reads them. Elements per W3C MusicXML 4.0 reference: <repeat direction times>, <ending
// number type>, <sound dacapo dalsegno segno coda tocoda fine>, <segno>, <coda>. Pure.
import { ScoreError } from "./errors";
import type { XmlElement } from "./xml-tree";
import { child, childrenNamed } from "./xml-tree";

export interface MeasureFlow {
  number: string;
  forward: boolean;
  /** Times the repeated passage is played when a backward repeat ends this measure (null: none). */
  backwardTimes: number | null;
  /** The passes this measure belongs to when it is inside an ending (null: every pass). */
  ending: number[] | null;
  /** An ending closes at the end of this measure. */
  endingEnds: boolean;
}

const JUMP_WORDS = /\b(d\.?\s?c\.?|d\.?\s?s\.?|da capo|dal segno|to coda|al coda|al fine)\b|\bFine\b/i;

function refuseJump(measure: string, what: string): never {
  throw new ScoreError(
    `Measure ${measure} has a jump (${what}). Farfield plays plain repeats but not D.C., D.S., segno or coda jumps: write the jump out in the notation program (copy the measures in playing order) and export again.`,
  );
}

/** Repeats, endings and jumps of one measure of the score's first part; ScoreError on a jump. */
export function measureFlow(measure: XmlElement): MeasureFlow {
  const number = measure.attrs.number ?? "?";
  const flow: MeasureFlow = { number, forward: false, backwardTimes: null, ending: null, endingEnds: false };
  for (const el of measure.children) {
    if (el.name === "barline") {
      const repeat = child(el, "repeat");
      if (repeat?.attrs.direction === "forward") flow.forward = true;
      if (repeat?.attrs.direction === "backward") flow.backwardTimes = Math.max(2, Math.min(16, Number(repeat.attrs.times) || 2));
      const ending = child(el, "ending");
      if (ending?.attrs.type === "start") {
        const passes = (ending.attrs.number ?? "").split(/[,\s]+/).map(Number).filter((n) => Number.isInteger(n) && n > 0);
        flow.ending = passes.length ? passes : [1];
      }
      if (ending && (ending.attrs.type === "stop" || ending.attrs.type === "discontinue")) flow.endingEnds = true;
    }
    if (el.name === "barline" || el.name === "direction" || el.name === "sound") {
      const sounds = el.name === "sound" ? [el] : childrenNamed(el, "sound");
      for (const s of sounds) for (const a of ["dacapo", "dalsegno", "tocoda", "segno", "coda", "fine"]) if (a in s.attrs) refuseJump(number, a === "dacapo" ? "D.C." : a === "dalsegno" ? "D.S." : a);
      for (const type of childrenNamed(el, "direction-type")) {
        if (child(type, "segno")) refuseJump(number, "segno");
        if (child(type, "coda")) refuseJump(number, "coda");
        for (const w of childrenNamed(type, "words")) if (JUMP_WORDS.test(w.text)) refuseJump(number, `“${w.text}”`);
      }
      if (child(el, "segno")) refuseJump(number, "segno");
      if (child(el, "coda")) refuseJump(number, "coda");
    }
  }
  return flow;
}

/** Indices of `flows` in playing order, each with its pass; ScoreError past `maxMeasures` played. */
export function playingOrder(flows: readonly MeasureFlow[], maxMeasures: number): { index: number; pass: number }[] {
  // Which measures each ending covers: from its start up to the measure that closes it.
  const ending: (number[] | null)[] = [];
  let open: number[] | null = null;
  for (const f of flows) {
    if (f.ending) open = f.ending;
    ending.push(open);
    if (f.endingEnds || (open && f.backwardTimes)) open = null;
  }
  const order: { index: number; pass: number }[] = [];
  let start = 0;
  let pass = 1;
  let i = 0;
  while (i < flows.length) {
    const f = flows[i]!;
    if (f.forward && i !== start) {
      start = i;
      pass = 1;
    }
    const passes = ending[i];
    if (passes && !passes.includes(pass)) {
      // Skip this ending: to the measure after the one that closes it.
      while (i < flows.length && ending[i] === passes) i++;
      continue;
    }
    order.push({ index: i, pass });
    if (order.length > maxMeasures) throw new ScoreError(`The score plays more than ${maxMeasures} measures with its repeats; import a shorter arrangement or split it.`);
    if (f.backwardTimes && pass < f.backwardTimes) {
      pass++;
      i = start;
      continue;
    }
    if (f.backwardTimes || (passes && (f.endingEnds || ending[i + 1] !== passes))) {
      // The repeated passage is done: a later backward repeat without a forward one goes back to here.
      start = i + 1;
      pass = 1;
    }
    i++;
  }
  return order;
}
