import { describe, expect, it } from "vitest";
import { heldChord, midiHz } from "@/lib/listen/chords";
import { setCountOnLine } from "@/lib/listen/count-line";
import { bpmAt, countTimes, secondsAt } from "@/lib/listen/count-times";
import { notesInSpan, scoreNotesSchema } from "@/lib/listen/score-notes";

describe("listen: counts to seconds", () => {
  it("at 120 counts a minute each count lasts half a second (one count a beat: common practice, no source)", () => {
    expect(countTimes(0, 4, [], 120)).toEqual([0, 0.5, 1, 1.5, 2]);
  });
  it("a tempo mark rules from its count on; before the first mark its tempo holds", () => {
    const marks = [{ atCount: 10, bpm: 120 }, { atCount: 12, bpm: 60 }];
    expect(bpmAt(3, marks, 90)).toBe(120);
    expect(bpmAt(12, marks, 90)).toBe(60);
    const t = countTimes(10, 14, marks, 90);
    expect(t).toEqual([0, 0.5, 1, 2, 3]);
    expect(secondsAt(t, 2.5)).toBeCloseTo(1.5, 9);
  });
  it("the opening set is count 0 and each later set adds its counts (the score's count line)", () => {
    const sets = [{ counts: 0 }, { counts: 16 }, { counts: 8 }, { counts: 12 }];
    expect([0, 1, 2, 3].map((i) => setCountOnLine(sets, i))).toEqual([0, 16, 24, 36]);
  });
});

describe("listen: notes", () => {
  it("A4 = 440 Hz and middle C (MIDI 60) = 261.63 Hz in equal temperament (ISO 16:1975 standard pitch)", () => {
    expect(midiHz(69)).toBe(440);
    expect(midiHz(60)).toBeCloseTo(261.63, 2);
  });
  it("held chords sit low to high from bass to soprano (common practice, no source)", () => {
    const mid = (r: Parameters<typeof heldChord>[0]) => heldChord(r).reduce((s, m) => s + m, 0) / heldChord(r).length;
    expect(mid("bass")).toBeLessThan(mid("tenor"));
    expect(mid("tenor")).toBeLessThan(mid("alto"));
    expect(mid("alto")).toBeLessThan(mid("soprano"));
  });
  it("the notes of a span are cut to it and counted from its start", () => {
    const notes = [
      { atCount: 14, lengthCounts: 4, midi: 60 },
      { atCount: 20, lengthCounts: 1, midi: 62 },
      { atCount: 30, lengthCounts: 2, midi: 64 },
    ];
    expect(notesInSpan(notes, 16, 24)).toEqual([
      { atCount: 0, lengthCounts: 2, midi: 60 },
      { atCount: 4, lengthCounts: 1, midi: 62 },
    ]);
  });
  it("the score route's answer is read strictly: no score, or tempo and notes in range", () => {
    expect(scoreNotesSchema.parse({ score: null })).toEqual({ score: null });
    const ok = { score: { tempo: [{ atCount: 0, bpm: 132 }], sections: { Trumpets: { notes: [{ atCount: 0, lengthCounts: 2, midi: 72 }] } } } };
    expect(scoreNotesSchema.parse(ok)).toEqual(ok);
    expect(scoreNotesSchema.safeParse({ score: { tempo: [], sections: { T: { notes: [{ atCount: 0, lengthCounts: 1, midi: 200 }] } } } }).success).toBe(false);
  });
});
