import { describe, expect, it } from "vitest";
import { AcousticsInputError, analyzeSet, type AnalysisInput } from "@/lib/acoustics";
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
});
