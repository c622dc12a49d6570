// The MusicXML reader on hand-made scores. Element meanings per the W3C MusicXML 4.0 reference
// (w3.org/2021/06/musicxml40, element pages named per test); MIDI numbers per the MIDI 1.0
// specification's note numbering (middle C = 60, A4 = 69).
import { zipSync, strToU8 } from "fflate";
import { describe, expect, it } from "vitest";
import { ScoreError } from "@/lib/score/errors";
import { parseScore } from "@/lib/score/parse-score";
import { midiOf } from "@/lib/score/pitch";
import { attrs, backup, barline, dyn, metronome, note, partwise, rehearsal, rest, time, words } from "./build-xml";

const bytes = (s: string) => new TextEncoder().encode(s);
const parse = (s: string) => parseScore(bytes(s));

describe("pitch to MIDI", () => {
  it("puts A4 at 69, middle C at 60 and follows <alter> (MIDI 1.0 note numbers; MusicXML 4.0 <pitch>, <alter>)", () => {
    expect(midiOf("A", 4)).toBe(69);
    expect(midiOf("C", 4)).toBe(60);
    expect(midiOf("B", 3, 1)).toBe(60);
    expect(midiOf("B", 4, -1)).toBe(70);
    expect(midiOf("C", -1)).toBe(0);
    expect(midiOf("H", 4)).toBeNull();
  });
});

describe("measures and counts", () => {
  it("counts a pickup (<measure implicit=\"yes\">) by its real length and 4/4 as four counts", () => {
    const xml = partwise([
      { id: "P1", name: "Trumpet", measureAttrs: { 0: ' implicit="yes"' }, measures: [attrs(2, 4, 4) + note("G4", 2), note("C5", 8), note("D5", 8)] },
    ]);
    const s = parse(xml);
    expect(s.measures.map((m) => [m.startCount, m.counts])).toEqual([[0, 1], [1, 4], [5, 4]]);
    expect(s.totalCounts).toBe(9);
    expect(s.parts[0]!.notes).toEqual([
      { atCount: 0, lengthCounts: 1, midi: 67 },
      { atCount: 1, lengthCounts: 4, midi: 72 },
      { atCount: 5, lengthCounts: 4, midi: 74 },
    ]);
  });

  it("counts 6/8 and 12/8 in dotted quarters, 3/4 and 2/2 in their denominator's note (meter rule: common practice, no source; <time>)", () => {
    const xml = partwise([
      { id: "P1", name: "Flute", measures: [attrs(2, 3, 4) + rest(6), time(6, 8) + rest(6), time(12, 8) + rest(12), time(2, 2) + rest(8), time(3, 8) + rest(3)] },
    ]);
    const s = parse(xml);
    expect(s.measures.map((m) => m.counts)).toEqual([3, 2, 4, 2, 3]);
    expect(s.measures.map((m) => m.startCount)).toEqual([0, 3, 5, 9, 11]);
  });

  it("reads a multi-staff part with <backup> and chords (<chord/>) and joins tied notes (<tie>)", () => {
    const staff1 = note("C4", 2, "<tie type=\"start\"/><voice>1</voice><staff>1</staff>") + note("E4", 2, "<chord/><voice>1</voice><staff>1</staff>");
    const staff2 = note("C3", 4, "<voice>5</voice><staff>2</staff>");
    const xml = partwise([
      { id: "P1", name: "Marimba", measures: [attrs(1, 4, 4) + "<attributes><staves>2</staves></attributes>" + staff1 + note("C4", 2, "<tie type=\"stop\"/><voice>1</voice><staff>1</staff>") + backup(4) + staff2] },
    ]);
    const notes = parse(xml).parts[0]!.notes;
    expect(notes).toEqual([
      { atCount: 0, lengthCounts: 4, midi: 48 },
      { atCount: 0, lengthCounts: 4, midi: 60 },
      { atCount: 0, lengthCounts: 2, midi: 64 },
    ]);
  });
});

describe("tempo", () => {
  it("gives counts a minute from <sound tempo> (quarter notes a minute) and from <metronome>, and changes with the beat at a meter change", () => {
    const xml = partwise([
      { id: "P1", name: "Snare", measures: [attrs(1, 4, 4) + metronome("quarter", 100, false, 100) + rest(4), time(6, 8) + rest(3), metronome("quarter", 80, true) + rest(3)] },
    ]);
    // 6/8 counts dotted quarters: 100 quarters a minute is 66.67 dotted quarters; a dotted-quarter metronome of 80 is 80 counts.
    expect(parse(xml).tempo).toEqual([
      { atCount: 0, bpm: 100 },
      { atCount: 4, bpm: 66.67 },
      { atCount: 6, bpm: 80 },
    ]);
  });
});

describe("repeats and jumps", () => {
  it("plays a repeat with 1st and 2nd endings in order (<repeat>, <ending>)", () => {
    const fwd = barline("left", '<repeat direction="forward"/>');
    const e1 = barline("left", '<ending number="1" type="start"/>');
    const e1end = barline("right", '<ending number="1" type="stop"/><repeat direction="backward"/>');
    const e2 = barline("left", '<ending number="2" type="start"/>');
    const e2end = barline("right", '<ending number="2" type="discontinue"/>');
    const xml = partwise([{ id: "P1", name: "Tuba", measures: [attrs(1, 2, 4) + rest(2), fwd + rest(2), e1 + rest(2) + e1end, e2 + rest(2) + e2end, rest(2)] }]);
    expect(parse(xml).measures.map((m) => `${m.number}.${m.pass}`)).toEqual(["1.1", "2.1", "3.1", "2.2", "4.2", "5.1"]);
  });

  it("refuses D.S. and coda jumps with a message that says to write them out (<sound dalsegno>, <coda>)", () => {
    const ds = partwise([{ id: "P1", name: "Tuba", measures: [attrs(1, 2, 4) + rest(2), rest(2) + '<direction><direction-type><words>D.S. al Coda</words></direction-type><sound dalsegno="s1"/></direction>'] }]);
    expect(() => parse(ds)).toThrow(ScoreError);
    expect(() => parse(ds)).toThrow(/measure 2 .*write the jump out/i);
  });
});

describe("what the file is", () => {
  it("refuses a timewise score and a file that is not MusicXML, saying what to do", () => {
    expect(() => parse('<?xml version="1.0"?><score-timewise version="4.0"><part-list/></score-timewise>')).toThrow(/partwise/);
    expect(() => parse("label,instrument\nT1,trumpet\n")).toThrow(ScoreError);
    expect(() => parse("<html><body/></html>")).toThrow(/not a MusicXML score/);
  });

  it("does not expand entities a file defines for itself (nested <!ENTITY> of a billion-laughs file)", () => {
    const defs = ["a", "b", "c", "d", "e", "f"].map((n, i, all) => `<!ENTITY ${n} "${i === 0 ? "aaaaaaaaaa" : `&${all[i - 1]};`.repeat(10)}">`).join("");
    const xml = `<?xml version="1.0"?><!DOCTYPE score-partwise [${defs}]><score-partwise><part-list><score-part id="P1"><part-name>&f;&f;</part-name></score-part></part-list><part id="P1"><measure number="1">${attrs(1, 4, 4)}${rest(4)}</measure></part></score-partwise>`;
    const name = parse(xml).parts[0]!.name;
    expect(name.length).toBeLessThan(100);
  });

  it("reads a compressed .mxl through META-INF/container.xml's rootfile (MusicXML 4.0 container.xml, <rootfile full-path>)", () => {
    const xml = partwise([{ id: "P1", name: "Alto", measures: [attrs(1, 4, 4) + note("A4", 4)] }]);
    const container = '<?xml version="1.0"?><container><rootfiles><rootfile full-path="score/piece.musicxml" media-type="application/vnd.recordare.musicxml+xml"/></rootfiles></container>';
    const mxl = zipSync({ mimetype: strToU8("application/vnd.recordare.musicxml"), "META-INF/container.xml": strToU8(container), "score/piece.musicxml": strToU8(xml) });
    const s = parseScore(mxl);
    expect(s.parts[0]!.notes).toEqual([{ atCount: 0, lengthCounts: 4, midi: 69 }]);
    expect(s.title).toBe("Test piece");
  });
});

describe("marks", () => {
  it("collects rehearsal marks, double bars and solo/divisi words (<rehearsal>, <bar-style>, <words>)", () => {
    const xml = partwise([
      { id: "P1", name: "Trumpet in B&#9837; 1", measures: [attrs(1, 4, 4) + rest(4), rehearsal("A") + words("Solo") + dyn("mp") + rest(4) + barline("right", "<bar-style>light-light</bar-style>"), rest(4)] },
    ]);
    const s = parse(xml);
    expect(s.parts[0]!.name).toBe("Trumpet in B♭ 1");
    expect(s.boundaries).toEqual([
      { atCount: 4, kind: "rehearsal", label: "A", measure: "2" },
      { atCount: 8, kind: "double-bar", label: "after m. 2", measure: "3" },
    ]);
    expect(s.parts[0]!.hints).toEqual([{ atCount: 4, measure: "2", text: "Solo" }]);
    expect(s.parts[0]!.marks).toEqual([{ atCount: 4, level: 2 }]);
  });
});
