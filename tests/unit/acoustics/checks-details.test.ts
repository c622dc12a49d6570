// Details of the balance checks that mutation runs found unchecked (npm run mutation over checks.ts,
// confidence.ts and group-loudness.ts): the loudness of a group and of its average player, the median a
// stand-out is measured from, the pyramid across the choirs, the background heard on the sweeps' path,
// and which instruments the confidence cases shift. Values are hand calculations named beside each.
import { describe, expect, it } from "vitest";
import { analyzeSet, checkBalance, DEFAULT_INSTRUMENTS, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { DEPTH_MIN_SPAN_M, medianWithout } from "@/lib/acoustics/checks";
import { checkConfidence } from "@/lib/acoustics/confidence";
import { groupLoudness, octaveLoudness } from "@/lib/acoustics/group-loudness";
import { AIR, BOX, facingToward, performer } from "./helpers";

const BANDS = [60, 62, 64, 63, 60, 55, 50, 42];
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) => performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
const row = (prefix: string, n: number, y: number, over: Partial<PerformerInput> = {}, x0 = 0) =>
  Array.from({ length: n }, (_, k) => at({ id: `${prefix}${k}`, x: x0 + 2 * k, y, ...over }));
const input = (performers: PerformerInput[], point: AnalysisInput["listeningPoints"][number] = BOX): AnalysisInput => ({ performers, listeningPoints: [point], conditions: AIR });

describe("groupLoudness", () => {
  it("two equal players sound as one player 10·lg 2 ≈ 3.01 dB louder in every band (incoherent energy sum, hand calculation)", () => {
    const two = groupLoudness([{ bandsDb: BANDS }, { bandsDb: BANDS }]);
    expect(two.sone).toBeCloseTo(octaveLoudness(BANDS.map((l) => l + 10 * Math.log10(2))).sone, 9);
    expect(two.sone).toBeGreaterThan(octaveLoudness(BANDS).sone);
  });

  it("per player, a group is its average player: two equal players are one; players 10 dB apart average to 10·lg(11/2) dB over the softer", () => {
    expect(groupLoudness([{ bandsDb: BANDS }, { bandsDb: BANDS }], true).sone).toBeCloseTo(octaveLoudness(BANDS).sone, 9);
    const louder = BANDS.map((l) => l + 10);
    expect(groupLoudness([{ bandsDb: BANDS }, { bandsDb: louder }], true).sone).toBeCloseTo(octaveLoudness(BANDS.map((l) => l + 10 * Math.log10(11 / 2))).sone, 9);
  });

  it("no players is silence, per player too", () => {
    expect(groupLoudness([]).sone).toBe(0);
    expect(groupLoudness([], true).sone).toBe(0);
  });
});

describe("medianWithout: the median of the rest of a section (hand values)", () => {
  it("leaves out the element at the index, with odd and even counts left", () => {
    expect(medianWithout([1, 2, 3, 10], 3)).toBe(2);
    expect(medianWithout([1, 2, 3, 10], 0)).toBe(3);
    expect(medianWithout([1, 2, 3, 4, 5], 2)).toBe(3);
    expect(medianWithout([1, 2, 3, 4, 5], 4)).toBe(2.5);
    expect(medianWithout([1, 2, 3, 4, 5], 0)).toBe(3.5);
  });
});

describe("depth-support's span", () => {
  it("is 10 yd, 9.144 m (1 yd = 0.9144 m exactly, international yard of 1959)", () => {
    expect(DEPTH_MIN_SPAN_M).toBeCloseTo(9.144, 12);
  });
});

describe("melody-forward's detail", () => {
  it("names the wind voice closest to the melody when it passes", () => {
    const band = [
      ...row("T", 8, 10, { dynamic: "ff" }),
      ...row("M", 2, 14, { instrument: "mellophone", section: "mellophones", voice: "countermelody", dynamic: "p" }),
      at({ id: "F0", x: 20, y: 20, instrument: "flute", section: "flutes", voice: "accompaniment", dynamic: "pp" }),
    ];
    const i = input(band);
    const c = checkBalance(i, analyzeSet(i).points[0]!).find((x) => x.id === "melody-forward")!;
    expect(c.status).toBe("pass");
    expect(c.detail).toMatch(/next loudest wind voice \(countermelody\)/);
  });
});

describe("bass-up-pyramid across the band", () => {
  const band = (bari: PerformerInput["dynamic"]) => [
    ...row("B", 2, 12, { instrument: "bari-sax", section: "bari sax", voice: "accompaniment", dynamic: bari }),
    ...row("T", 4, 12, { voice: "accompaniment", dynamic: "ff" }, 8),
  ];
  const pyramid = (players: PerformerInput[]) => {
    const i = input(players);
    return checkBalance(i, analyzeSet(i).points[0]!).find((x) => x.id === "bass-up-pyramid")!;
  };

  it("a woodwind bass under brass sopranos fails across the band (one register per choir), naming and marking both", () => {
    const c = pyramid(band("pp"));
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(/^Across the band, the bass register \(bari sax\)/);
    expect(c.performerIds.sort()).toEqual(["B0", "B1", "T0", "T1", "T2", "T3"]);
  });

  it("with one choir only there is no pair across the band", () => {
    expect(pyramid(row("T", 4, 12, { voice: "accompaniment" })).status).toBe("not-applicable");
  });
});

describe("heard-at-box on the sweeps' path (a point result without loudness)", () => {
  it("hears the listening point's background as the analysis does", () => {
    const flutes = row("F", 2, 10, { instrument: "flute", section: "flutes", dynamic: "mp" });
    for (const preset of ["quiet-field", "stadium-between-bands"] as const) {
      const i = input(flutes, { ...BOX, background: { preset } } as typeof BOX);
      const full = analyzeSet(i).points[0]!;
      const levelsOnly = { ...full, loudness: undefined };
      const verdict = (p: typeof full) => checkBalance(i, p).find((x) => x.id === "heard-at-box")!.status;
      expect(verdict(levelsOnly)).toBe(verdict(full));
    }
    expect(checkBalance(input(flutes, { ...BOX, background: { preset: "stadium-between-bands" } } as typeof BOX), { ...analyzeSet(input(flutes)).points[0]!, loudness: undefined }).find((x) => x.id === "heard-at-box")!.status).toBe("fail");
  });
});

describe("checkConfidence's cases", () => {
  const trumpets = row("T", 4, 12);
  it("shifts each sounding instrument by its uncertainty both ways, and not one known exactly", () => {
    const sure = input(trumpets);
    sure.instruments = { trumpet: { ...DEFAULT_INSTRUMENTS.trumpet!, uncertaintyDb: 0 } };
    expect(checkConfidence(sure, BOX.id).every((c) => c.cases === 1)).toBe(true);
    sure.instruments = { trumpet: { ...DEFAULT_INSTRUMENTS.trumpet!, uncertaintyDb: 2 } };
    expect(checkConfidence(sure, BOX.id).every((c) => c.cases === 3)).toBe(true);
  });

  it("refuses a listening point the input does not have", () => {
    expect(() => checkConfidence(input(trumpets), "nowhere")).toThrow(/no listening point "nowhere"/);
  });
});
