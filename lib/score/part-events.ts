// One measure of one part read in document order: where each note, dynamic, wedge, word and tempo
// mark falls, in quarter notes from the measure's start. Elements per W3C MusicXML 4.0 reference:
// <note> (<pitch>, <unpitched>, <rest>, <chord>, <grace>, <cue>, <duration>, <tie>, <voice>, <staff>),
// <backup>, <forward>, <direction> (<dynamics>, <wedge>, <words>, <rehearsal>, <metronome>, <offset>,
// <sound tempo>), <attributes> (<divisions>, <time>, <transpose>). Pure.
import { levelOfMarking } from "./dynamics";
import { midiOf } from "./pitch";
import type { XmlElement } from "./xml-tree";
import { child, childNumber, childrenNamed, childText } from "./xml-tree";

export interface NoteEvent {
  at: number;
  length: number;
  midi: number;
  /** Voice and staff: a tie joins notes of the same voice. */
  voice: string;
  tieStart: boolean;
  tieStop: boolean;
}

export interface MeasureEvents {
  notes: NoteEvent[];
  marks: { at: number; level: number }[];
  wedges: { at: number; type: "crescendo" | "diminuendo" | "stop"; number: string }[];
  words: { at: number; text: string }[];
  rehearsals: { at: number; text: string }[];
  /** Quarter notes a minute. */
  tempos: { at: number; quarters: number }[];
  /** Furthest point any note or forward reached (a pickup's real length). */
  length: number;
  /** A double bar or final bar closes the measure. */
  doubleBar: boolean;
}

export interface PartState {
  divisions: number;
  beats: number;
  beatType: number;
  /** Semitones from written to sounding pitch (<transpose>: chromatic + 12 × octave-change). */
  transpose?: number;
  /** A time signature appeared in this measure. */
  timeChanged?: boolean;
}

const NOTE_UNITS: Record<string, number> = { breve: 8, whole: 4, half: 2, quarter: 1, eighth: 0.5, "16th": 0.25, "32nd": 0.125 };
const DOUBLE_BARS = new Set(["light-light", "light-heavy", "heavy-light", "heavy-heavy"]);

function metronomeQuarters(m: XmlElement): number | null {
  const perMinute = childNumber(m, "per-minute");
  const unit = NOTE_UNITS[childText(m, "beat-unit")];
  if (!perMinute || !unit || perMinute <= 0) return null;
  const dots = childrenNamed(m, "beat-unit-dot").length;
  return perMinute * unit * (2 - 1 / 2 ** dots);
}

function readDirection(el: XmlElement, at: number, out: MeasureEvents) {
  const tempo = Number(child(el, "sound")?.attrs.tempo);
  let quarters = Number.isFinite(tempo) && tempo > 0 ? tempo : null;
  for (const type of childrenNamed(el, "direction-type")) {
    for (const dyn of childrenNamed(type, "dynamics"))
      for (const d of dyn.children) {
        const level = levelOfMarking(d.name);
        if (level !== null) out.marks.push({ at, level });
      }
    for (const w of childrenNamed(type, "wedge")) {
      const t = w.attrs.type;
      if (t === "crescendo" || t === "diminuendo" || t === "stop") out.wedges.push({ at, type: t, number: w.attrs.number ?? "1" });
    }
    for (const w of childrenNamed(type, "words")) if (w.text) out.words.push({ at, text: w.text });
    for (const r of childrenNamed(type, "rehearsal")) if (r.text) out.rehearsals.push({ at, text: r.text });
    const metronome = child(type, "metronome");
    if (quarters === null && metronome) quarters = metronomeQuarters(metronome);
  }
  if (quarters !== null) out.tempos.push({ at, quarters });
}

function readNote(el: XmlElement, at: number, quarters: number, transpose: number): NoteEvent | null {
  const pitch = child(el, "pitch");
  const unpitched = child(el, "unpitched");
  // Unpitched notes (drums) keep their rhythm at the staff position they are written on.
  const midi = pitch
    ? midiOf(childText(pitch, "step"), childNumber(pitch, "octave") ?? NaN, childNumber(pitch, "alter") ?? 0)
    : unpitched
      ? midiOf(childText(unpitched, "display-step"), childNumber(unpitched, "display-octave") ?? NaN)
      : null;
  if (midi === null || quarters <= 0 || midi + transpose < 0 || midi + transpose > 127) return null;
  const ties = childrenNamed(el, "tie").map((t) => t.attrs.type);
  return {
    at,
    length: quarters,
    // Notes are kept as they sound: a B♭ trumpet's written D5 is C5.
    midi: midi + transpose,
    voice: `${childText(el, "voice") || "1"}/${childText(el, "staff") || "1"}`,
    tieStart: ties.includes("start"),
    tieStop: ties.includes("stop"),
  };
}

/** The events of one measure; `state` carries divisions and the time signature from measure to measure. */
export function readMeasure(measure: XmlElement, state: PartState): MeasureEvents {
  const out: MeasureEvents = { notes: [], marks: [], wedges: [], words: [], rehearsals: [], tempos: [], length: 0, doubleBar: false };
  state.timeChanged = false;
  let cursor = 0;
  let lastStart = 0;
  const q = (el: XmlElement) => (childNumber(el, "duration") ?? 0) / state.divisions;
  for (const el of measure.children) {
    switch (el.name) {
      case "attributes": {
        const divisions = childNumber(el, "divisions");
        if (divisions && divisions > 0) state.divisions = divisions;
        const time = child(el, "time");
        const beats = Number(childText(time, "beats").split("+").reduce((a, b) => a + Number(b), 0));
        const beatType = childNumber(time, "beat-type");
        const transpose = child(el, "transpose");
        if (transpose) state.transpose = (childNumber(transpose, "chromatic") ?? 0) + 12 * (childNumber(transpose, "octave-change") ?? 0);
        if (time && beats > 0 && beatType && beatType > 0) {
          state.beats = beats;
          state.beatType = beatType;
          state.timeChanged = true;
        }
        break;
      }
      case "note": {
        // Grace notes take no time and cue notes are not played.
        if (child(el, "grace") || child(el, "cue")) break;
        const length = q(el);
        const start = child(el, "chord") ? lastStart : cursor;
        if (!child(el, "chord")) {
          lastStart = cursor;
          cursor += length;
        }
        const note = child(el, "rest") ? null : readNote(el, start, length, child(el, "unpitched") ? 0 : (state.transpose ?? 0));
        if (note) out.notes.push(note);
        for (const n of childrenNamed(el, "notations"))
          for (const dyn of childrenNamed(n, "dynamics"))
            for (const d of dyn.children) {
              const level = levelOfMarking(d.name);
              if (level !== null) out.marks.push({ at: start, level });
            }
        break;
      }
      case "backup":
        cursor = Math.max(0, cursor - q(el));
        break;
      case "forward":
        cursor += q(el);
        break;
      case "direction":
        readDirection(el, cursor + (childNumber(el, "offset") ?? 0) / state.divisions, out);
        break;
      case "sound": {
        const tempo = Number(el.attrs.tempo);
        if (Number.isFinite(tempo) && tempo > 0) out.tempos.push({ at: cursor, quarters: tempo });
        break;
      }
      case "barline":
        if (DOUBLE_BARS.has(childText(el, "bar-style")) && (el.attrs.location ?? "right") === "right") out.doubleBar = true;
        break;
    }
    out.length = Math.max(out.length, cursor);
  }
  return out;
}
