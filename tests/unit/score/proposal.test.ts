// Written dynamics per set and the phrases an import proposes, on hand-made scores. Rules as the
// import states them: a marking holds until the next; a wedge (MusicXML 4.0 <wedge>) moves between the
// marking before it and the next one, read at the set's count and rounded to the nearest step of
// pp … fff (common practice, no source); several parts in one section give the loudest marking; a
// part without dynamics leaves its section as it is; a later anchor resets where the music is.
import { describe, expect, it } from "vitest";
import { segmentsOf, scoreCountOf, type PartMap, type ScoreAnchor } from "@/lib/score/anchors";
import { levelAt } from "@/lib/score/dynamics";
import { ScoreError } from "@/lib/score/errors";
import { parseScore } from "@/lib/score/parse-score";
import { proposeImport, type OldPhrase, type OldRow } from "@/lib/score/proposal";
import { attrs, dyn, note, partwise, rehearsal, rest, wedge } from "./build-xml";

const parse = (s: string) => parseScore(new TextEncoder().encode(s));
const bar = (inner = "") => inner + rest(4);

describe("levelAt", () => {
  const marks = [
    { atCount: 0, level: 1 },
    { atCount: 8, level: 5 },
  ];
  it("holds a marking until the next and is null before the first", () => {
    expect(levelAt(marks, [], -1)).toBeNull();
    expect(levelAt(marks, [], 7.9)).toBe(1);
    expect(levelAt(marks, [], 8)).toBe(5);
  });
  it("rises along a crescendo from p to ff, rounded to the nearest step", () => {
    const w = [{ kind: "crescendo" as const, startCount: 4, stopCount: 8 }];
    // p (1) to ff (5) over 4 counts: one step a count.
    expect([3, 4, 5, 6, 7, 8].map((c) => levelAt(marks, w, c))).toEqual([1, 1, 2, 3, 4, 5]);
    expect(levelAt(marks, w, 4.5)).toBe(2); // 1.5 rounds up
  });
  it("moves one step when no marking follows the wedge", () => {
    expect(levelAt([{ atCount: 0, level: 3 }], [{ kind: "diminuendo", startCount: 0, stopCount: 4 }], 10)).toBe(2);
    expect(levelAt([{ atCount: 0, level: 6 }], [{ kind: "crescendo", startCount: 0, stopCount: 4 }], 10)).toBe(6);
  });
});

// Two trumpet parts and a tuba part without a single dynamic, 4/4 with one count a beat.
const xml = partwise([
  { id: "T1", name: "Trumpet 1", measures: [attrs(1, 4, 4) + dyn("p") + rest(4), bar(), bar(wedge("crescendo")), bar(wedge("stop")), bar(rehearsal("B") + dyn("ff")), bar()] },
  { id: "T2", name: "Trumpet 2", measures: [attrs(1, 4, 4) + dyn("mf") + rest(4), bar(dyn("pp")), bar(), bar(), bar(dyn("pp")), bar()] },
  { id: "TU", name: "Tuba", measures: [attrs(1, 4, 4) + note("B1", 4), note("B1", 4), note("B1", 4), note("B1", 4), note("B1", 4), note("B1", 4)] },
]);
const score = parse(xml);
const sets = [0, 4, 2, 4, 2, 4].map((counts, i) => ({ id: `s${i + 1}`, number: String(i + 1), counts, order: i + 1 }));
// Sets 1…6 at counts 0, 4, 6, 10, 12, 16.
const phrases: OldPhrase[] = [{ id: "old", name: "Opener", order: 1, firstOrder: 1, lastOrder: 6, planLimits: { windSteps: 3 } }];
const rows: OldRow[] = [
  { phraseId: "old", section: "Trumpets", voice: "melody", writtenDynamic: "f", playedDynamic: "mf" },
  { phraseId: "old", section: "Tubas", voice: "bass", writtenDynamic: "mp", playedDynamic: null },
  { phraseId: "old", section: "Drums", voice: "percussion", writtenDynamic: "mf", playedDynamic: null },
];
const map: PartMap = { T1: "Trumpets", T2: "Trumpets", TU: "Tubas" };
const propose = (anchors: ScoreAnchor[], partMap = map) =>
  proposeImport({ score, partMap, segments: segmentsOf(score, anchors, sets), setsInOrder: sets, sections: ["Trumpets", "Tubas", "Drums"], phrases, rows, overrides: [{ phraseId: "old", performerId: "T2" }] });

describe("proposeImport", () => {
  const p = propose([{ setId: "s1", measure: "1", beat: 1 }]);

  it("writes the loudest marking of a section's parts at each set, through the wedge", () => {
    // count 0: p vs mf → mf; 4: p vs pp → p; 6: p, the wedge not begun;
    // the wedge runs over measure 3 (counts 8 to 12) toward the ff of measure 5: at 10 halfway from
    // p (1) to ff (5) = 3 (mf); from its end at 12 the ff it leads to; 16: the ff itself.
    expect(p.sets.map((s) => s.written.Trumpets)).toEqual(["mf", "p", "p", "mf", "ff", "ff"]);
  });

  it("leaves a section whose parts have no dynamics as it is, and says so", () => {
    expect(p.sets.every((s) => s.written.Tubas === null)).toBe(true);
    expect(p.phrases.every((ph) => ph.rows.Tubas!.writtenDynamic === "mp" && ph.rows.Tubas!.voice === "bass")).toBe(true);
    expect(p.notes.join(" ")).toMatch(/Tuba has no dynamics: Tubas keep the written dynamics/);
  });

  it("splits phrases where a section's dynamic changes or a rehearsal mark falls, keeping voices and unmapped sections", () => {
    // Sets 5 and 6 are both ff, but rehearsal letter B (measure 5, count 16) starts a phrase at set 6.
    expect(p.phrases.map((ph) => [ph.firstSetNumber, ph.lastSetNumber])).toEqual([["1", "1"], ["2", "3"], ["4", "4"], ["5", "5"], ["6", "6"]]);
    expect(p.phrases.map((ph) => ph.name)).toEqual(["Opener", "Opener, from set 2", "Opener, from set 4", "Opener, from set 5", "Rehearsal B"]);
    for (const ph of p.phrases) {
      expect(ph.rows.Trumpets!.voice).toBe("melody");
      expect(ph.rows.Drums).toEqual({ voice: "percussion", writtenDynamic: "mf", playedDynamic: null });
      // Each lies inside the old phrase, so it keeps its limits and overrides.
      expect(ph.keepsFrom).toBe("old");
    }
    // The adopted plan on the trumpets was made for f, which no phrase keeps.
    expect(p.replaces.plansCleared).toBe(1);
    expect(p.replaces.phrases).toEqual([{ name: "Opener", firstOrder: 1, lastOrder: 6 }]);
  });

  it("restarts the music at a later anchor (set 5 back at measure 2)", () => {
    const again = propose([
      { setId: "s1", measure: "1", beat: 1 },
      { setId: "s5", measure: "2", beat: 1 },
    ]);
    expect(again.sets.map((s) => s.at)).toEqual([
      { measure: "1", beat: 1 },
      { measure: "2", beat: 1 },
      { measure: "2", beat: 3 },
      { measure: "3", beat: 3 },
      { measure: "2", beat: 1 },
      { measure: "3", beat: 1 },
    ]);
    expect(again.sets[4]!.written.Trumpets).toBe("p");
  });

  it("refuses a missing anchor, an unknown measure and a beat past the measure", () => {
    expect(() => segmentsOf(score, [], sets)).toThrow(/Anchor the drill to the music/);
    expect(() => scoreCountOf(score, { measure: "9", beat: 1 })).toThrow(ScoreError);
    expect(() => scoreCountOf(score, { measure: "2", beat: 5 })).toThrow(/has 4 counts; beat 5/);
    expect(() => segmentsOf(score, [{ setId: "nope", measure: "1", beat: 1 }], sets)).toThrow(/not in this show/);
  });

  it("ignores a part left unmapped", () => {
    const only1 = propose([{ setId: "s1", measure: "1", beat: 1 }], { T1: "Trumpets", T2: null, TU: null });
    expect(only1.sets.map((s) => s.written.Trumpets)).toEqual(["p", "p", "p", "mf", "ff", "ff"]);
  });
});
