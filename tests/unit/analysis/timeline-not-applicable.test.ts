// The timeline never shows a green pass where a check has nothing to judge (issue #14: an empty or
// all-tacet set is "not applicable", not a pass). The check's own not-applicable rule is in checks.test.ts.
import { describe, expect, it } from "vitest";
import { CHECK_IDS } from "@/lib/acoustics/types";
import { DEFAULT_TARGETS } from "@/lib/acoustics/targets";
import { analyzeSet } from "@/lib/acoustics";
import { sweepTransition } from "@/lib/analysis/sweep";
import { showTimeline } from "@/lib/analysis/timeline";
import { AIR, BOX, performer } from "../acoustics/helpers";

const band = (voice: "melody" | "tacet") => ({
  performers: [performer({ id: "t1", voice }), performer({ id: "t2", voice, x: 2 }), performer({ id: "tu1", instrument: "tuba", section: "tubas", voice: voice === "tacet" ? "tacet" : "bass", y: 14 })],
  listeningPoints: [BOX],
  conditions: AIR,
});

describe("the timeline's checks", () => {
  it("marks every check not applicable, and none failing, in a set nobody stands in", () => {
    const t = showTimeline([{ setId: "s1", number: "1", order: 0, counts: 0, points: { box: [] } } as never], "box");
    expect(t.sets[0]).toMatchObject({ failing: [], notApplicable: [...CHECK_IDS] });
  });

  it("marks the melody check not applicable when everyone is tacet, and judges it when a melody sounds", () => {
    const tacet = sweepTransition(band("tacet"), null, 0, DEFAULT_TARGETS).box!;
    expect(tacet[0]!.notApplicable).toContain("melody-forward");
    expect(tacet[0]!.failing).not.toContain("melody-forward");
    const playing = sweepTransition(band("melody"), null, 0, DEFAULT_TARGETS).box!;
    expect(playing[0]!.notApplicable).not.toContain("melody-forward");
  });
});

describe("the timeline's loudness (sones)", () => {
  it("gives each sample the band's and each voice's loudness, as the set's analysis gives them at its last count; null for a voice no one plays", () => {
    const sample = sweepTransition(band("melody"), null, 0, DEFAULT_TARGETS).box![0]!;
    const loudness = analyzeSet(band("melody")).points[0]!.loudness!;
    expect(sample.totalSone).toBeCloseTo(loudness.totalSone, 9);
    expect(sample.voicesSone.melody).toBeCloseTo(loudness.voices.melody!.sone, 9);
    expect(sample.voicesSone.bass).toBeCloseTo(loudness.voices.bass!.sone, 9);
    expect(sample.voicesSone.countermelody).toBeNull();
    const silent = sweepTransition(band("tacet"), null, 0, DEFAULT_TARGETS).box![0]!;
    expect(silent.totalSone).toBeNull();
  });
});
