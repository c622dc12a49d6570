import { describe, expect, it } from "vitest";
import { AcousticsInputError, analyzeSet, type AnalysisInput } from "@/lib/acoustics";
import { noiseLikeVoiceBands, sectionLoudness } from "@/lib/acoustics/analyze";
import { AIR, BOX, performer } from "./helpers";

const band = (background?: AnalysisInput["listeningPoints"][number]["background"]): AnalysisInput => ({
  performers: [
    performer({ id: "F1", instrument: "flute", section: "flutes", voice: "melody", dynamic: "mp", y: 30 }),
    performer({ id: "F2", instrument: "flute", section: "flutes", voice: "melody", dynamic: "mp", x: 2, y: 30 }),
    ...Array.from({ length: 8 }, (_, i) => performer({ id: `B${i}`, instrument: "tuba", section: "tubas", voice: "bass", dynamic: "ff", x: i - 4, y: 8 })),
    performer({ id: "T1", section: "trumpets", voice: "tacet", y: 10 }),
  ],
  listeningPoints: [{ ...BOX, background }],
  conditions: AIR,
});

describe("analyzeSet: loudness at each listening point", () => {
  it("gives the band's loudness and, for every sounding voice and only those (a tacet player adds none), its loudness, share and audibility", () => {
    const point = analyzeSet(band()).points[0];
    expect(point.loudness).toBeDefined();
    expect(Object.keys(point.loudness!.voices).sort()).toEqual(Object.keys(point.voices).sort());
    expect(point.loudness!.totalSone).toBeGreaterThan(0);
    expect(point.loudness!.totalPhon).toBeGreaterThan(40);
    for (const v of Object.values(point.loudness!.voices)) expect(v.shareSone).toBeLessThanOrEqual(point.loudness!.totalSone);
  });

  it("a stadium crowd at the point takes from each voice's share and can hide a soft voice, without changing the band's own loudness", () => {
    const quiet = analyzeSet(band()).points[0].loudness!;
    const crowd = analyzeSet(band({ preset: "stadium-between-bands" })).points[0].loudness!;
    expect(crowd.totalSone).toBeCloseTo(quiet.totalSone, 9);
    expect(crowd.backgroundSone).toBeGreaterThan(0);
    expect(crowd.voices.melody.shareSone).toBeLessThan(quiet.voices.melody.shareSone);
    expect(crowd.voices.melody.marginDb).toBeLessThan(quiet.voices.melody.marginDb);
  });

  it("refuses a bad background, naming the listening point", () => {
    expect(() => analyzeSet(band({ preset: "thunder" } as never))).toThrow(AcousticsInputError);
    expect(() => analyzeSet(band({ preset: "thunder" } as never))).toThrow(/listeningPoints\[0\]\.background/);
  });

  it("judges each point against its own background: two points at one place, one quiet and one with a crowd", () => {
    // Same place, so the band's levels are the same at both; only the background differs.
    const input: AnalysisInput = { ...band(), listeningPoints: [{ ...BOX, id: "quiet" }, { ...BOX, id: "crowd", background: { preset: "stadium-between-bands" } }] };
    const [quiet, crowd] = analyzeSet(input).points;
    expect(crowd!.loudness!.backgroundSone).toBeGreaterThan(0);
    expect(quiet!.loudness!.backgroundSone).toBe(0);
    expect(crowd!.loudness!.voices.melody.marginDb).toBeLessThan(quiet!.loudness!.voices.melody.marginDb);
    const sectionsQuiet = sectionLoudness(input, quiet!);
    const sectionsCrowd = sectionLoudness(input, crowd!);
    expect(sectionsCrowd.flutes!.marginDb).toBeLessThan(sectionsQuiet.flutes!.marginDb);
    expect(sectionsCrowd.flutes!.shareSone).toBeLessThan(sectionsQuiet.flutes!.shareSone);
  });

  it("counts the battery's drums, and only them, as noise-like maskers, by voice and by section", () => {
    const input: AnalysisInput = {
      ...band(),
      performers: [
        ...band().performers,
        performer({ id: "S1", instrument: "snare", section: "snares", voice: "percussion", dynamic: "f", y: 12 }),
        performer({ id: "S2", instrument: "snare", section: "snares", voice: "percussion", dynamic: "f", x: 1, y: 12 }),
      ],
    };
    const point = analyzeSet(input).points[0]!;
    const byVoice = noiseLikeVoiceBands(input, point);
    expect(Object.keys(byVoice)).toEqual(["percussion"]);
    expect(Object.keys(noiseLikeVoiceBands(input, point, "section"))).toEqual(["snares"]);
    // Two snares' energies summed, band by band, from their own levels at the point.
    const s1 = point.performers.find((p) => p.id === "S1")!.bandsDb;
    const s2 = point.performers.find((p) => p.id === "S2")!.bandsDb;
    byVoice.percussion!.forEach((l, b) => expect(l).toBeCloseTo(10 * Math.log10(10 ** (s1[b]! / 10) + 10 ** (s2[b]! / 10)), 9));
  });
});
