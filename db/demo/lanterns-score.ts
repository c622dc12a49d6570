// "Lanterns on the Water", an original short arrangement written for the demo (invented music, no
// one else's), built as MusicXML 4.0 from the demo show itself: one rehearsal letter at the first set
// of each phrase, each part's written dynamic there as the demo's music writes its section, wedges
// into every change, the part's line chosen by its section's voice. 4/4 for the first two
// movements with a one-count pickup, 6/8 for the procession. `npx tsx db/demo/lanterns-score.ts`
// writes public/examples/lanterns-on-the-water.musicxml, the file the demo loads.
import { writeFileSync } from "node:fs";
import path from "node:path";
import type { VoiceOrTacet } from "@/lib/acoustics/types";
import { HARBOR_RIDGE_SETS } from "./harbor-ridge-drill";
import { HARBOR_RIDGE_PHRASES } from "./harbor-ridge-music";

export const LANTERNS_FILE = path.join(__dirname, "../../public/examples/lanterns-on-the-water.musicxml");

interface PartDef {
  id: string;
  name: string;
  section: string;
  /** Middle of the part's sounding range (MIDI), or null for unpitched drums. */
  center: number | null;
  /** Written to sounding, semitones (<transpose>). */
  transpose: number;
  clef: "G" | "F" | "percussion";
  staves?: 2;
}

const PARTS: PartDef[] = [
  { id: "P1", name: "Flute", section: "Flutes", center: 79, transpose: 0, clef: "G" },
  { id: "P2", name: "Clarinet in B♭", section: "Clarinets", center: 70, transpose: -2, clef: "G" },
  { id: "P3", name: "Alto Saxophone", section: "Alto Saxes", center: 65, transpose: -9, clef: "G" },
  { id: "P4", name: "Tenor Saxophone", section: "Tenor Sax", center: 56, transpose: -14, clef: "G" },
  { id: "P5", name: "Baritone Saxophone", section: "Bari Sax", center: 44, transpose: -21, clef: "G" },
  { id: "P6", name: "Trumpet in B♭ 1", section: "Trumpets", center: 70, transpose: -2, clef: "G" },
  { id: "P7", name: "Trumpet in B♭ 2", section: "Trumpets", center: 65, transpose: -2, clef: "G" },
  { id: "P8", name: "Mellophone in F", section: "Mellophones", center: 63, transpose: -7, clef: "G" },
  { id: "P9", name: "Trombone", section: "Trombones", center: 53, transpose: 0, clef: "F" },
  { id: "P10", name: "Baritone", section: "Baritones", center: 56, transpose: 0, clef: "F" },
  { id: "P11", name: "Tuba", section: "Tubas", center: 39, transpose: 0, clef: "F" },
  { id: "P12", name: "Snare Drum", section: "Snares", center: null, transpose: 0, clef: "percussion" },
  { id: "P13", name: "Tenor Drums", section: "Tenors", center: null, transpose: 0, clef: "percussion" },
  { id: "P14", name: "Bass Drums", section: "Bass Drums", center: null, transpose: 0, clef: "percussion" },
  { id: "P15", name: "Cymbals", section: "Cymbals", center: null, transpose: 0, clef: "percussion" },
  { id: "P16", name: "Marimba", section: "Front Ensemble", center: 75, transpose: 0, clef: "G", staves: 2 },
];

// E♭ major, concert pitch; spelled with flats.
const TONIC = 63;
const SCALE = [0, 2, 4, 5, 7, 9, 11];
const SPELL: [string, number][] = [["C", 0], ["D", -1], ["D", 0], ["E", -1], ["E", 0], ["F", 0], ["G", -1], ["G", 0], ["A", -1], ["A", 0], ["B", -1], ["B", 0]];

/** Degree 1 = the tonic nearest `center`; 8 is an octave up. */
function degreeMidi(degree: number, center: number): number {
  const base = TONIC + 12 * Math.round((center - TONIC) / 12);
  const d = degree - 1;
  return base + SCALE[((d % 7) + 7) % 7]! + 12 * Math.floor(d / 7);
}

// Lines as [degree, length in eighths]; one list entry per measure, repeated as the passage goes on.
const THEME: [number, number][][] = [
  [[5, 2], [8, 2], [7, 2], [5, 2]], [[6, 4], [5, 2], [3, 2]], [[4, 2], [5, 2], [6, 2], [8, 2]], [[7, 6], [5, 2]],
  [[8, 2], [9, 2], [10, 2], [8, 2]], [[6, 4], [4, 4]], [[5, 2], [4, 2], [3, 2], [2, 2]], [[1, 8]],
];
const SONG: [number, number][][] = [
  [[3, 6], [2, 2]], [[1, 4], [5, 4]], [[6, 6], [5, 2]], [[4, 8]], [[4, 6], [3, 2]], [[2, 4], [6, 4]], [[5, 4], [4, 2], [2, 2]], [[3, 8]],
];
const MARCH: [number, number][][] = [
  [[1, 3], [3, 2], [5, 1]], [[8, 3], [7, 3]], [[6, 2], [5, 1], [4, 2], [3, 1]], [[2, 6]], [[3, 3], [5, 2], [8, 1]], [[9, 3], [8, 3]], [[7, 2], [6, 1], [5, 2], [2, 1]], [[1, 6]],
];
// Chord roots (scale degrees) measure by measure, per movement.
const CHORDS = { theme: [1, 5, 6, 4, 1, 4, 5, 1], song: [1, 6, 2, 5, 4, 1, 2, 1], march: [1, 1, 4, 5, 6, 4, 5, 1] };

const TYPES: Record<number, [string, boolean]> = { 1: ["eighth", false], 2: ["quarter", false], 3: ["quarter", true], 4: ["half", false], 6: ["half", true], 8: ["whole", false] };

function noteXml(midi: number | null, eighths: number, opts: { transpose?: number; staff?: number; voice?: number; chord?: boolean; unpitched?: boolean } = {}): string {
  const [type, dot] = TYPES[eighths]!;
  const voice = `<voice>${opts.voice ?? 1}</voice>`;
  const tail = `<type>${type}</type>${dot ? "<dot/>" : ""}${opts.staff ? `<staff>${opts.staff}</staff>` : ""}`;
  if (midi === null) return `<note><rest/><duration>${eighths}</duration>${voice}${tail}</note>`;
  if (opts.unpitched) return `<note><unpitched><display-step>C</display-step><display-octave>5</display-octave></unpitched><duration>${eighths}</duration>${voice}${tail}</note>`;
  const written = midi - (opts.transpose ?? 0);
  const [step, alter] = SPELL[((written % 12) + 12) % 12]!;
  const octave = Math.floor(written / 12) - 1;
  return `<note>${opts.chord ? "<chord/>" : ""}<pitch><step>${step}</step>${alter ? `<alter>${alter}</alter>` : ""}<octave>${octave}</octave></pitch><duration>${eighths}</duration>${voice}${tail}</note>`;
}

const direction = (inner: string, sound = "", placement = "below") => `<direction placement="${placement}"><direction-type>${inner}</direction-type>${sound}</direction>`;

// The show's count line: set 1 at 0, then each set's counts. The music starts one count earlier (pickup).
const SET_COUNT = new Map<string, number>();
HARBOR_RIDGE_SETS.reduce((c, s, i) => (SET_COUNT.set(s.number, i === 0 ? 0 : c + s.counts), i === 0 ? 0 : c + s.counts), 0);
const MARCH_FROM = SET_COUNT.get("12")!; // the procession, in 6/8
const LAST = [...SET_COUNT.values()].pop()!;
const measureAt = (count: number) => (count < MARCH_FROM ? 1 + count / 4 : 1 + MARCH_FROM / 4 + (count - MARCH_FROM) / 2);
const MEASURES = measureAt(LAST); // the last set falls on the final measure's downbeat

const PHRASE_AT = HARBOR_RIDGE_PHRASES.map((p, i) => ({ phrase: p, measure: measureAt(SET_COUNT.get(p.firstSet)!), letter: String.fromCharCode(65 + i) }));
function phraseOf(m: number) {
  return [...PHRASE_AT].reverse().find((p) => p.measure <= m) ?? PHRASE_AT[0]!;
}
const LEVELS = ["pp", "p", "mp", "mf", "f", "ff", "fff"];

/** One measure's notes for `part` playing `voice` (eighths per measure: 8 in 4/4, 6 in 6/8). */
function measureNotes(part: PartDef, voice: VoiceOrTacet, m: number): string {
  const march = m > MARCH_FROM / 4;
  const full = march ? 6 : 8;
  const half = full / 2;
  const song = !march && m >= PHRASE_AT[3]!.measure; // the ballad and the swell
  const line = march ? MARCH : song ? SONG : THEME;
  const chords = march ? CHORDS.march : song ? CHORDS.song : CHORDS.theme;
  const root = chords[(m - 1) % chords.length]!;
  const t = { transpose: part.transpose };
  if (voice === "tacet") return noteXml(null, full);
  if (part.center === null) {
    // Drums: snares in eighths, tenors in quarter beats, bass drums and cymbals on the big beats.
    const u = { unpitched: true };
    if (part.section === "Snares") return Array.from({ length: full }, () => noteXml(0, 1, u)).join("");
    if (part.section === "Tenors") return march ? noteXml(0, 3, u) + noteXml(0, 3, u) : Array.from({ length: 4 }, () => noteXml(0, 2, u)).join("");
    if (part.section === "Cymbals") return noteXml(0, half, u) + noteXml(null, half);
    return noteXml(0, half, u) + noteXml(0, half, u);
  }
  const c = part.center;
  const staffOpts = part.staves ? { staff: 1 } : {};
  let upper: string;
  if (voice === "melody") upper = line[(m - 1) % line.length]!.map(([d, len]) => noteXml(degreeMidi(d, c), len, { ...t, ...staffOpts })).join("");
  else if (voice === "countermelody") upper = noteXml(degreeMidi(root + 2, c), half, { ...t, ...staffOpts }) + noteXml(degreeMidi(root + 4, c), half, { ...t, ...staffOpts });
  else if (voice === "bass") upper = noteXml(degreeMidi(root, c), half, { ...t, ...staffOpts }) + noteXml(degreeMidi(root + 4, c - 12), half, { ...t, ...staffOpts });
  else if (voice === "percussion") upper = Array.from({ length: full }, (_, i) => noteXml(degreeMidi(root + (i % 3) * 2, c), 1, { ...t, ...staffOpts })).join("");
  else upper = noteXml(degreeMidi(root + 2, c), full, { ...t, ...staffOpts }) + noteXml(degreeMidi(root + 4, c), full, { ...t, ...staffOpts, chord: true });
  if (!part.staves) return upper;
  // The marimba's left hand holds the chord's root on the lower staff.
  return upper + `<backup><duration>${full}</duration></backup>` + noteXml(degreeMidi(root, c - 24), full, { staff: 2, voice: 5 });
}

function partXml(part: PartDef): string {
  const out: string[] = [];
  for (let m = 0; m <= MEASURES; m++) {
    const body: string[] = [];
    if (m === 0) {
      const clef =
        part.clef === "percussion"
          ? "<clef><sign>percussion</sign></clef>"
          : part.staves
            ? '<clef number="1"><sign>G</sign><line>2</line></clef><clef number="2"><sign>F</sign><line>4</line></clef>'
            : part.clef === "G"
              ? "<clef><sign>G</sign><line>2</line></clef>"
              : "<clef><sign>F</sign><line>4</line></clef>";
      const transpose = part.transpose ? `<transpose><diatonic>${Math.round(((part.transpose % 12) * 7) / 12)}</diatonic><chromatic>${part.transpose % 12}</chromatic>${part.transpose <= -12 ? `<octave-change>${Math.trunc(part.transpose / 12)}</octave-change>` : ""}</transpose>` : "";
      body.push(`<attributes><divisions>2</divisions><key><fifths>0</fifths></key><time><beats>4</beats><beat-type>4</beat-type></time>${part.staves ? "<staves>2</staves>" : ""}${clef}${transpose}</attributes>`);
      if (part.id === "P1") body.push(direction("<metronome><beat-unit>quarter</beat-unit><per-minute>144</per-minute></metronome>", '<sound tempo="144"/>', "above"));
      body.push(direction(`<dynamics><${HARBOR_RIDGE_PHRASES[0]!.sections[part.section]!.dynamic}/></dynamics>`));
      // The pickup: trumpets and mellophones lead into set 1 on the fifth.
      body.push(part.section === "Trumpets" || part.section === "Mellophones" ? noteXml(degreeMidi(5, part.center!), 2, { transpose: part.transpose }) : noteXml(null, 2));
      out.push(`<measure number="0" implicit="yes">${body.join("")}</measure>`);
      continue;
    }
    if (m === MARCH_FROM / 4 + 1) {
      body.push("<attributes><time><beats>6</beats><beat-type>8</beat-type></time></attributes>");
      if (part.id === "P1") body.push(direction("<metronome><beat-unit>quarter</beat-unit><beat-unit-dot/><per-minute>120</per-minute></metronome>", '<sound tempo="180"/>', "above"));
    }
    const at = PHRASE_AT.find((p) => p.measure === m);
    if (at) {
      if (part.id === "P1" || part.id === "P16") body.push(direction(`<rehearsal>${at.letter}</rehearsal>`, "", "above"));
      if (m > 1) body.push(direction(`<dynamics><${at.phrase.sections[part.section]!.dynamic}/></dynamics>`));
      if (part.id === "P1" && at.letter === "D") body.push(direction("<metronome><beat-unit>quarter</beat-unit><per-minute>72</per-minute></metronome>", '<sound tempo="72"/>', "above"));
      if (part.id === "P1" && at.letter === "G") body.push(direction("<metronome><beat-unit>quarter</beat-unit><per-minute>96</per-minute></metronome>", '<sound tempo="96"/>', "above"));
      if (part.section === "Trumpets" && part.id === "P6" && at.phrase.name === "Trumpet solo") body.push(direction("<words>Solo</words>", "", "above"));
      if (part.section === "Clarinets" && at.phrase.name === "Clarinet song") body.push(direction("<words>div.</words>", "", "above"));
    }
    // A wedge over the two measures (4 in 6/8) before a phrase whose marking differs, for a part playing on both sides.
    const next = PHRASE_AT.find((p) => p.measure > m && p.measure - m <= (p.measure > MARCH_FROM / 4 + 1 ? 4 : 2) && p.measure > 1);
    const here = phraseOf(m).phrase.sections[part.section]!;
    let wedge: string | null = null;
    if (next) {
      const ahead = next.phrase.sections[part.section]!;
      const span = next.measure > MARCH_FROM / 4 + 1 ? 4 : 2;
      if (here.voice !== "tacet" && ahead.voice !== "tacet" && here.dynamic !== ahead.dynamic && next.measure - m === span)
        wedge = LEVELS.indexOf(ahead.dynamic) > LEVELS.indexOf(here.dynamic) ? "crescendo" : "diminuendo";
      if (wedge) body.push(direction(`<wedge type="${wedge}"/>`));
    }
    const voice = part.id === "P6" && phraseOf(m).phrase.name === "Trumpet solo" ? "melody" : here.voice;
    body.push(m === MEASURES ? finalChord(part) : measureNotes(part, voice, m));
    if (next && next.measure === m + 1 && out.join("").lastIndexOf('<wedge type="') > out.join("").lastIndexOf('<wedge type="stop"')) body.push(direction('<wedge type="stop"/>'));
    if (m === MARCH_FROM / 4 || m === PHRASE_AT[3]!.measure - 1) body.push('<barline location="right"><bar-style>light-light</bar-style></barline>');
    if (m === MEASURES) body.push('<barline location="right"><bar-style>light-heavy</bar-style></barline>');
    out.push(`<measure number="${m}">${body.join("")}</measure>`);
  }
  return `<part id="${part.id}">${out.join("")}</part>`;
}

/** The final downbeat, on the last set: a dotted half (the whole 6/8 measure) on the tonic chord. */
function finalChord(part: PartDef): string {
  if (part.center === null) return noteXml(0, 6, { unpitched: true });
  const top = noteXml(degreeMidi(part.section === "Tubas" || part.section === "Bari Sax" ? 1 : 3, part.center), 6, { transpose: part.transpose, ...(part.staves ? { staff: 1 } : {}) });
  return part.staves ? top + "<backup><duration>6</duration></backup>" + noteXml(degreeMidi(1, part.center - 24), 6, { staff: 2, voice: 5 }) : top;
}

/** Each part's section in the demo show. */
export const LANTERNS_PART_MAP: Record<string, string> = Object.fromEntries(PARTS.map((p) => [p.id, p.section]));

/** The whole arrangement as MusicXML 4.0 text. */
export function lanternsScoreXml(): string {
  const list = PARTS.map((p) => `<score-part id="${p.id}"><part-name>${p.name}</part-name></score-part>`).join("\n");
  return `<?xml version="1.0" encoding="UTF-8"?>
<!DOCTYPE score-partwise PUBLIC "-//Recordare//DTD MusicXML 4.0 Partwise//EN" "http://www.musicxml.org/dtds/partwise.dtd">
<score-partwise version="4.0">
<work><work-title>Lanterns on the Water</work-title></work>
<identification><creator type="arranger">Farfield demo (original, written for the demo show)</creator><rights>Invented for Farfield's demo; free to use with it.</rights></identification>
<part-list>
${list}
</part-list>
${PARTS.map(partXml).join("\n")}
</score-partwise>
`;
}

if (require.main === module) {
  writeFileSync(LANTERNS_FILE, lanternsScoreXml());
  console.log(`wrote ${LANTERNS_FILE}`);
}
