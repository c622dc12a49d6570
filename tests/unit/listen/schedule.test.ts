import { describe, expect, it } from "vitest";
import { audibleParts, NO_SOLO_MUTE } from "@/lib/listen/audible";
import { heldChord } from "@/lib/listen/chords";
import { TARGET_MIX_DBFS } from "@/lib/listen/normalise";
import { HOLD_COUNTS, scheduleListen } from "@/lib/listen/schedule";
import type { ListenAnswer, ListenPart } from "@/lib/listen/types";

const flat = (l: number) => new Array(8).fill(l);
const part = (section: string, voice: ListenPart["voice"], family: ListenPart["family"], level: number): ListenPart => ({ key: `${section}|${voice}`, section, voice, family, register: "tenor", bandsDb: flat(level), planChangeDb: 0, arrivalMs: 300 });
const answer = (parts: ListenPart[]): ListenAnswer => ({ listeningPointId: "lp", parts, backgroundOctaveDb: null });

describe("listen: solo and mute", () => {
  const parts = [part("Trumpets", "melody", "brass", 80), part("Trumpets", "accompaniment", "brass", 80), part("Tubas", "bass", "brass", 80)];
  const keys = (s: Partial<typeof NO_SOLO_MUTE>) => [...audibleParts(parts, { ...NO_SOLO_MUTE, ...s })].sort();
  it("with nothing pressed every part sounds", () => expect(keys({})).toHaveLength(3));
  it("soloing a voice leaves only that voice; soloing a section adds the section's other parts", () => {
    expect(keys({ soloVoices: ["melody"] })).toEqual(["Trumpets|melody"]);
    expect(keys({ soloVoices: ["bass"], soloSections: ["Trumpets"] })).toEqual(["Trumpets|accompaniment", "Trumpets|melody", "Tubas|bass"]);
  });
  it("a mute wins over a solo", () => {
    expect(keys({ soloSections: ["Trumpets"], mutedVoices: ["melody"] })).toEqual(["Trumpets|accompaniment"]);
    expect(keys({ mutedSections: ["Tubas"] })).toEqual(["Trumpets|accompaniment", "Trumpets|melody"]);
  });
});

describe("listen: a transition's schedule", () => {
  it("the opening set is held HOLD_COUNTS counts; winds hold their register's chord, the battery strikes every count", () => {
    const s = scheduleListen({ from: null, to: answer([part("Trombones", "accompaniment", "brass", 80), part("Battery", "percussion", "percussion", 85)]), counts: 0, spanStartOnLine: 0, score: null, fallbackBpm: 120 });
    expect(s.counts).toBe(HOLD_COUNTS);
    expect(s.times).toHaveLength(HOLD_COUNTS + 1);
    const [winds, battery] = s.parts;
    expect(winds!.notes.map((n) => n.midi)).toEqual(heldChord("tenor"));
    expect(winds!.notes.every((n) => n.atCount === 0 && n.lengthCounts === HOLD_COUNTS)).toBe(true);
    expect(battery!.struck).toBe(true);
    expect(battery!.notes.map((n) => n.atCount)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it("with a score, a section plays its notes of the span at the score's tempo; a section the score does not name holds its chord", () => {
    const score = {
      tempo: [{ atCount: 0, bpm: 60 }],
      sections: { Trombones: { notes: [{ atCount: 14, lengthCounts: 4, midi: 58 }, { atCount: 40, lengthCounts: 2, midi: 60 }] } },
    };
    const to = answer([part("Trombones", "accompaniment", "brass", 80), part("Horns", "melody", "brass", 80)]);
    const s = scheduleListen({ from: answer(to.parts), to, counts: 8, spanStartOnLine: 16, score, fallbackBpm: 120 });
    expect(s.times[8]).toBeCloseTo(8, 9); // 60 counts a minute: a second a count
    expect(s.parts[0]!.notes).toEqual([{ atCount: 0, lengthCounts: 2, midi: 58 }]);
    expect(s.parts[1]!.notes.map((n) => n.midi)).toEqual(heldChord("tenor"));
  });

  it("the playback level puts the loudest count as written on the target", () => {
    const s = scheduleListen({ from: answer([part("A", "melody", "brass", 70)]), to: answer([part("A", "melody", "brass", 90)]), counts: 4, spanStartOnLine: 0, score: null, fallbackBpm: 120 });
    expect(s.offsetDb).toBeCloseTo(TARGET_MIX_DBFS - (90 + 10 * Math.log10(8)), 9);
  });
});
