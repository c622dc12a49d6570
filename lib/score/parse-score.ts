// A MusicXML score (partwise; .musicxml, .xml or .mxl) read into Farfield's Score: measures as
// played with their counts, tempo in counts a minute, each part's notes, dynamics, wedges and hints,
// and the rehearsal marks and double bars that suggest phrases. Pure.
import { MAX_SCORE_MEASURES, MAX_SCORE_NOTES } from "@/lib/limits";
import { ScoreError } from "./errors";
import { beatQuarters, measureQuarters } from "./meter";
import { readMeasure, type MeasureEvents, type PartState } from "./part-events";
import { scoreText } from "./read-file";
import { measureFlow, playingOrder } from "./repeats";
import type { Score, ScoreBoundary, ScoreMeasure, ScorePart, TempoMark } from "./types";
import { child, childrenNamed, childText, parseXml, type XmlElement } from "./xml-tree";

// When a score gives no tempo at all (common practice, no source: a moderate march tempo).
const DEFAULT_QUARTERS_PER_MINUTE = 120;
const HINT_WORDS = /\b(solo|soli|div\.?|divisi|a ?2|a ?3|unis\.?|unison|tutti)\b/i;

function rootOf(bytes: Uint8Array): XmlElement {
  const root = parseXml(scoreText(bytes));
  if (root.name === "score-timewise")
    throw new ScoreError("This score is saved measure by measure (MusicXML timewise). Export it again as ordinary (partwise) MusicXML, which every notation program writes by default.");
  if (root.name !== "score-partwise") throw new ScoreError(`The file is XML but not a MusicXML score (it starts with <${root.name}>, not <score-partwise>).`);
  return root;
}

function partNames(root: XmlElement): Map<string, string> {
  const names = new Map<string, string>();
  for (const sp of childrenNamed(child(root, "part-list"), "score-part")) {
    const id = sp.attrs.id ?? "";
    names.set(id, (childText(sp, "part-name") || childText(sp, "part-abbreviation") || id).replace(/\s+/g, " ").trim());
  }
  return names;
}

/** Each part's measures read once in document order, with the time signature each measure is in. */
function readPart(measures: XmlElement[]) {
  const state: PartState = { divisions: 1, beats: 4, beatType: 4 };
  return measures.map((m) => {
    const events = readMeasure(m, state);
    return { events, beats: state.beats, beatType: state.beatType };
  });
}

const round6 = (x: number) => Math.round(x * 1e6) / 1e6;

/** The score in the uploaded bytes; ScoreError with a message a director can act on when it cannot be used. */
export function parseScore(bytes: Uint8Array): Score {
  const root = rootOf(bytes);
  const names = partNames(root);
  const partEls = childrenNamed(root, "part");
  if (!partEls.length) throw new ScoreError("The score has no parts.");
  const docMeasures = partEls.map((p) => childrenNamed(p, "measure"));
  const first = docMeasures[0]!;
  if (!first.length) throw new ScoreError("The score has no measures.");
  docMeasures.forEach((ms, i) => {
    if (ms.length !== first.length) throw new ScoreError(`Part "${names.get(partEls[i]!.attrs.id ?? "") ?? i + 1}" has ${ms.length} measures where the first part has ${first.length}; export the score again.`);
  });
  // Jumps may be written in any part; repeats are read from the first.
  docMeasures.slice(1).forEach((ms) => ms.forEach(measureFlow));
  const order = playingOrder(first.map(measureFlow), MAX_SCORE_MEASURES);
  const read = docMeasures.map(readPart);
  const meterOf = read[0]!;

  // Measures as played: a pickup (implicit="yes") counts its real length, the longest any part fills.
  const measures: ScoreMeasure[] = [];
  const beatOf: number[] = [];
  let count = 0;
  for (const { index, pass } of order) {
    const { beats, beatType } = meterOf[index]!;
    const bq = beatQuarters(beats, beatType);
    const played = Math.max(...read.map((r) => r[index]!.events.length));
    const quarters = first[index]!.attrs.implicit === "yes" && played > 0 ? played : measureQuarters(beats, beatType);
    measures.push({ number: first[index]!.attrs.number ?? String(index + 1), pass, startCount: round6(count), counts: round6(quarters / bq), beats, beatType });
    beatOf.push(bq);
    count += quarters / bq;
  }
  const at = (k: number, quarters: number) => round6(measures[k]!.startCount + quarters / beatOf[k]!);

  let noteCount = 0;
  const parts: ScorePart[] = partEls.map((p, pi) => {
    const id = p.attrs.id ?? String(pi + 1);
    const part: ScorePart = { id, name: names.get(id) ?? id, notes: [], marks: [], wedges: [], hints: [] };
    const tied = new Map<string, ScorePart["notes"][number]>();
    const openWedges = new Map<string, { kind: "crescendo" | "diminuendo"; startCount: number }>();
    order.forEach(({ index }, k) => {
      const ev: MeasureEvents = read[pi]![index]!.events;
      for (const n of ev.notes) {
        const key = `${n.voice}/${n.midi}`;
        const open = tied.get(key);
        const lengthCounts = n.length / beatOf[k]!;
        if (n.tieStop && open) {
          open.lengthCounts = round6(open.lengthCounts + lengthCounts);
          if (!n.tieStart) tied.delete(key);
          continue;
        }
        const note = { atCount: at(k, n.at), lengthCounts: round6(lengthCounts), midi: n.midi };
        part.notes.push(note);
        if (n.tieStart) tied.set(key, note);
      }
      for (const m of ev.marks) part.marks.push({ atCount: at(k, m.at), level: m.level });
      for (const w of ev.wedges) {
        if (w.type === "stop") {
          const open = openWedges.get(w.number);
          if (open) part.wedges.push({ ...open, stopCount: at(k, w.at) });
          openWedges.delete(w.number);
        } else openWedges.set(w.number, { kind: w.type, startCount: at(k, w.at) });
      }
      for (const w of ev.words) if (HINT_WORDS.test(w.text)) part.hints.push({ atCount: at(k, w.at), measure: measures[k]!.number, text: w.text });
    });
    noteCount += part.notes.length;
    part.notes.sort((a, b) => a.atCount - b.atCount || a.midi - b.midi);
    part.marks.sort((a, b) => a.atCount - b.atCount);
    return part;
  });
  if (noteCount > MAX_SCORE_NOTES) throw new ScoreError(`The score holds ${noteCount} notes; at most ${MAX_SCORE_NOTES} can be imported.`);

  return {
    title: childText(child(root, "work"), "work-title") || childText(root, "movement-title"),
    parts,
    measures,
    tempo: tempoLine(order, read, measures, beatOf),
    boundaries: boundariesOf(order, read, measures, at),
    totalCounts: round6(count),
  };
}

function tempoLine(order: { index: number }[], read: ReturnType<typeof readPart>[], measures: ScoreMeasure[], beatOf: number[]): TempoMark[] {
  const line: TempoMark[] = [];
  const push = (atCount: number, bpm: number) => {
    const mark = { atCount: round6(atCount), bpm: Math.round(bpm * 100) / 100 };
    if (line.length && line[line.length - 1]!.atCount === mark.atCount) line.pop();
    if (!line.length || line[line.length - 1]!.bpm !== mark.bpm) line.push(mark);
  };
  let quarters = DEFAULT_QUARTERS_PER_MINUTE;
  order.forEach(({ index }, k) => {
    const bq = beatOf[k]!;
    // A meter change with no new tempo mark keeps the quarter note's speed, so the counts' speed changes.
    push(measures[k]!.startCount, quarters / bq);
    const marks = read.flatMap((r) => r[index]!.events.tempos).sort((a, b) => a.at - b.at);
    for (const t of marks) {
      quarters = t.quarters;
      push(measures[k]!.startCount + t.at / bq, quarters / bq);
    }
  });
  return line;
}

function boundariesOf(order: { index: number }[], read: ReturnType<typeof readPart>[], measures: ScoreMeasure[], at: (k: number, q: number) => number): ScoreBoundary[] {
  const out: ScoreBoundary[] = [];
  const seen = new Set<string>();
  const add = (b: ScoreBoundary) => {
    const key = `${b.kind}@${b.atCount}`;
    if (seen.has(key)) return;
    out.push(b);
    seen.add(key);
  };
  order.forEach(({ index }, k) => {
    const m = measures[k]!;
    for (const r of read) {
      const ev = r[index]!.events;
      for (const reh of ev.rehearsals) add({ atCount: at(k, reh.at), kind: "rehearsal", label: reh.text, measure: m.number });
      // A double bar closes this measure: the new passage starts with the next.
      if (ev.doubleBar && k + 1 < measures.length) add({ atCount: measures[k + 1]!.startCount, kind: "double-bar", label: `after m. ${m.number}`, measure: measures[k + 1]!.number });
    }
  });
  return out.sort((a, b) => a.atCount - b.atCount);
}
