import { describe, expect, it } from "vitest";
import type { PerformerInput, PointResult } from "@/lib/acoustics/types";
import { analyzeSet, DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { backgroundOctaveDb } from "@/lib/listen/background";
import { normalisationOffsetDb, TARGET_MIX_DBFS } from "@/lib/listen/normalise";
import { listenParts } from "@/lib/listen/parts";
import { ABSENT_BELOW_DB, transitionCurves } from "@/lib/listen/transition";
import type { ListenAnswer, ListenPart } from "@/lib/listen/types";

const flat = (l: number) => new Array(8).fill(l);
const performer = (id: string, instrument: string, section: string, voice: PerformerInput["voice"]): PerformerInput => ({ id, instrument, section, voice, dynamic: "mf", x: 0, y: 0, facingDeg: 0 });

describe("listen: a set's parts at the point", () => {
  const point: PointResult = {
    listeningPointId: "lp",
    totalDbA: 0,
    voices: {},
    sections: {},
    arrivalSpreadMs: 0,
    performers: [
      { id: "t1", dbA: 80, bandsDb: flat(70), arrivalMs: 100 },
      { id: "t2", dbA: 80, bandsDb: flat(70), arrivalMs: 110 },
      { id: "t3", dbA: 70, bandsDb: flat(60), arrivalMs: 400 },
      { id: "b1", dbA: 75, bandsDb: flat(65), arrivalMs: 120 },
      { id: "x", dbA: -Infinity, bandsDb: flat(-Infinity), arrivalMs: 0 },
    ],
  };
  const performers = [performer("t1", "trumpet", "Trumpets", "melody"), performer("t2", "trumpet", "Trumpets", "melody"), performer("t3", "trumpet", "Trumpets", "tacet"), performer("b1", "tuba", "Low brass", "bass"), performer("x", "tuba", "Low brass", "bass")];
  const parts = () => listenParts(point, performers, [{ performerIds: ["t1"], changeDb: 6 }], DEFAULT_INSTRUMENTS);

  it("groups players by section and voice, leaves out tacet and silent players, and takes family and register from the instrument", () => {
    const p = parts();
    expect(p.map((x) => x.key).sort()).toEqual(["Low brass|bass", "Trumpets|melody"]);
    const tp = p.find((x) => x.key === "Trumpets|melody")!;
    expect([tp.family, tp.register]).toEqual(["brass", "soprano"]);
  });

  it("two equal players add to 3.01 dB above one (incoherent sources add in energy: ISO 9613-2 eq. 5's energetic sum)", () => {
    expect(parts().find((x) => x.key === "Trumpets|melody")!.bandsDb[3]).toBeCloseTo(73.01, 2);
  });

  it("the arrival is the energy-weighted mean: two equal players at 100 and 110 ms arrive at 105 ms", () => {
    expect(parts().find((x) => x.key === "Trumpets|melody")!.arrivalMs).toBeCloseTo(105, 9);
  });

  it("the plan's change is energy-weighted: one of two equal players 6 dB up raises the part by 10·lg((1 + 10^0.6)/2) = 3.96 dB", () => {
    const p = parts();
    expect(p.find((x) => x.key === "Trumpets|melody")!.planChangeDb).toBeCloseTo(3.963, 2);
    expect(p.find((x) => x.key === "Low brass|bass")!.planChangeDb).toBe(0);
  });

  it("on a set the engine computes, every sounding section appears and the melody arrives after its nearest player", () => {
    const input = {
      performers: [{ ...performer("a", "trumpet", "Trumpets", "melody"), y: 10 }, { ...performer("b", "trumpet", "Trumpets", "melody"), y: 40 }, { ...performer("c", "tuba", "Tubas", "bass"), y: 20 }],
      listeningPoints: [{ id: "lp", x: 0, y: -40, z: 18 }],
      conditions: { temperatureC: 20, relativeHumidityPct: 50, pressureKPa: 101.325, groundFactor: 1 },
    };
    const pr = analyzeSet(input).points[0]!;
    const p = listenParts(pr, input.performers, []);
    expect(p.map((x) => x.section).sort()).toEqual(["Trumpets", "Tubas"]);
    const arrivals = pr.performers.filter((r) => r.id !== "c").map((r) => r.arrivalMs);
    const tp = p.find((x) => x.section === "Trumpets")!;
    expect(tp.arrivalMs).toBeGreaterThan(Math.min(...arrivals));
    expect(tp.arrivalMs).toBeLessThan(Math.max(...arrivals));
  });
});

const part = (key: string, level: number, arrivalMs: number, planChangeDb = 0): ListenPart => ({ key, section: key, voice: "melody", family: "brass", register: "soprano", bandsDb: flat(level), planChangeDb, arrivalMs });
const answer = (parts: ListenPart[]): ListenAnswer => ({ listeningPointId: "lp", parts, backgroundOctaveDb: null });

describe("listen: a transition count by count", () => {
  it("levels and the plan's change move in dB, the arrival in ms, along count / counts", () => {
    const [c] = transitionCurves(answer([part("A", 80, 200, 0)]), answer([part("A", 90, 300, 4)]), 8);
    expect(c!.bandsDb[4]![0]).toBeCloseTo(85, 9);
    expect(c!.planChangeDb[2]).toBeCloseTo(1, 9);
    // Delays count from the earliest arrival of any part in either set (200 ms here).
    expect(c!.delayMs[0]).toBeCloseTo(0, 9);
    expect(c!.delayMs[8]).toBeCloseTo(100, 9);
  });

  it("a part that plays in only one set fades from ABSENT_BELOW_DB under its level", () => {
    const curves = transitionCurves(answer([part("A", 80, 200)]), answer([part("A", 80, 200), part("B", 70, 250)]), 4);
    const b = curves.find((c) => c.key === "B")!;
    expect(b.bandsDb[0]![0]).toBeCloseTo(70 - ABSENT_BELOW_DB, 9);
    expect(b.bandsDb[4]![0]).toBeCloseTo(70, 9);
  });

  it("the opening set (no from-set) holds its own values", () => {
    const [c] = transitionCurves(null, answer([part("A", 80, 250)]), 8);
    expect(c!.bandsDb.every((b) => b[0] === 80)).toBe(true);
    expect(c!.delayMs.every((d) => d === 0)).toBe(true);
  });
});

describe("listen: playback level", () => {
  it("the loudest count's total lands on the target: 8 bands at 85 dB total 94.03 dB", () => {
    const offset = normalisationOffsetDb([[flat(85)], [flat(80)]], flat(40));
    expect(offset).toBeCloseTo(TARGET_MIX_DBFS - 94.03, 2);
  });
  it("a louder prediction is played at the same level: the offset follows the levels, not their SPL", () => {
    expect(normalisationOffsetDb([[flat(95)]], null) + 95).toBeCloseTo(normalisationOffsetDb([[flat(75)]], null) + 75, 9);
  });
  it("the background sets the level only when no part sounds", () => {
    expect(normalisationOffsetDb([[flat(-Infinity)]], flat(50))).toBeCloseTo(TARGET_MIX_DBFS - 59.03, 2);
  });
});

describe("listen: the listening point's background in octaves", () => {
  it("custom octave levels come back as given (the third-octave split keeps each octave's energy)", () => {
    const octaves = [52, 47, 43, 40, 37, 33, 28, 22];
    backgroundOctaveDb({ octaveDb: octaves })!.forEach((l, k) => expect(l).toBeCloseTo(octaves[k]!, 6));
  });
  it("the crowd preset's octaves total its 55 dBA within 1 dB once A-weighted (IEC 61672-1:2013 Table 3 octave weights)", () => {
    const A = [-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1];
    const o = backgroundOctaveDb({ preset: "crowd-during-performance" })!;
    const dbA = 10 * Math.log10(o.reduce((s, l, k) => s + 10 ** ((l + A[k]!) / 10), 0));
    expect(Math.abs(dbA - 55)).toBeLessThan(1);
    expect(backgroundOctaveDb(null)).toBeNull();
  });
});
