// Loudness per section at a listening point (sectionLoudness, lib/acoustics/analyze.ts): each section's
// own loudness, share and audibility, by the same method as each voice's (ISO 532-1 loudness; the
// masked threshold of ISO/IEC 11172-3 Annex D, point-loudness.ts).
import { describe, expect, it } from "vitest";
import { analyzeSet, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { sectionLoudness } from "@/lib/acoustics/analyze";
import { octaveLoudness } from "@/lib/acoustics/group-loudness";
import { AIR, BOX, performer } from "./helpers";

const at = (players: PerformerInput[], point: AnalysisInput["listeningPoints"][number] = BOX): AnalysisInput => ({ performers: players, listeningPoints: [point], conditions: AIR });

describe("sectionLoudness", () => {
  it("a section alone with no background: its loudness is ISO 532-1 of its own levels, and its share is all of it (the whole less silence)", () => {
    const input = at([performer({ id: "t1" }), performer({ id: "t2", x: 2 })]);
    const point = analyzeSet(input).points[0]!;
    const s = sectionLoudness(input, point).trumpets!;
    expect(s.sone).toBeCloseTo(octaveLoudness(point.sections.trumpets!.bandsDb).sone, 9);
    expect(s.phon).toBeCloseTo(octaveLoudness(point.sections.trumpets!.bandsDb).phon, 9);
    expect(s.shareSone).toBeCloseTo(s.sone, 9);
    expect(s.heard).toBe(true);
  });

  it("two sections on one voice are judged apart: each has its own loudness and share, each less than the voice's", () => {
    const input = at([
      performer({ id: "t1", voice: "accompaniment" }),
      performer({ id: "m1", instrument: "mellophone", section: "mellophones", voice: "accompaniment", x: 4 }),
      performer({ id: "f1", instrument: "flute", section: "flutes", voice: "melody", x: -4 }),
    ]);
    const point = analyzeSet(input).points[0]!;
    const sections = sectionLoudness(input, point);
    expect(Object.keys(sections).sort()).toEqual(["flutes", "mellophones", "trumpets"]);
    const voice = point.loudness!.voices.accompaniment!;
    for (const name of ["trumpets", "mellophones"]) {
      expect(sections[name]!.sone).toBeGreaterThan(0);
      expect(sections[name]!.sone).toBeLessThan(voice.sone);
      expect(sections[name]!.shareSone).toBeLessThan(voice.shareSone);
    }
  });

  it("where each section plays a voice of its own, each section's loudness, share and audibility are its voice's (battery included, masking as noise)", () => {
    const input = at(
      [
        performer({ id: "t1", voice: "melody" }),
        performer({ id: "tu1", instrument: "tuba", section: "tubas", voice: "bass", y: 20 }),
        performer({ id: "s1", instrument: "snare", section: "snares", voice: "percussion", y: 30 }),
      ],
      { ...BOX, background: { preset: "crowd-during-performance" } },
    );
    const point = analyzeSet(input).points[0]!;
    const sections = sectionLoudness(input, point);
    const voices = point.loudness!.voices;
    for (const [section, voice] of [["trumpets", "melody"], ["tubas", "bass"], ["snares", "percussion"]] as const) {
      expect(sections[section]!.sone).toBeCloseTo(voices[voice]!.sone, 9);
      expect(sections[section]!.shareSone).toBeCloseTo(voices[voice]!.shareSone, 9);
      expect(sections[section]!.marginDb).toBeCloseTo(voices[voice]!.marginDb, 9);
      expect(sections[section]!.heard).toBe(voices[voice]!.heard);
    }
  });

  it("a single far flute under a near brass wall is not heard as a section; a section whose players are all tacet is absent", () => {
    const brass = Array.from({ length: 12 }, (_, k) => performer({ id: `t${k}`, voice: "accompaniment", dynamic: "ff", x: k - 6, y: 0, facingDeg: 180 }));
    const input = at([
      ...brass,
      performer({ id: "f1", instrument: "flute", section: "flutes", voice: "melody", dynamic: "pp", y: 48, facingDeg: 0 }),
      performer({ id: "c1", instrument: "clarinet", section: "clarinets", voice: "tacet" }),
    ]);
    const sections = sectionLoudness(input, analyzeSet(input).points[0]!);
    expect(sections.trumpets!.heard).toBe(true);
    expect(sections.flutes!.heard).toBe(false);
    expect(sections.clarinets).toBeUndefined();
  });
});
