import { describe, expect, it } from "vitest";
import { analyzeSet, checkBalance, DEFAULT_TARGETS, resolveTargets, speedOfSound, type AnalysisInput, type CheckResult, type PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, facingToward, performer } from "./helpers";

const input = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [BOX], conditions: AIR });
const pointOf = (i: AnalysisInput) => analyzeSet(i).points[0]!;
function check(performers: PerformerInput[], id: CheckResult["id"], targets?: Parameters<typeof checkBalance>[2]): CheckResult {
  const i = input(performers);
  return checkBalance(i, pointOf(i), targets).find((c) => c.id === id)!;
}
/** A performer standing at (x, y) facing the box. */
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) =>
  performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });

describe("checkBalance: shape", () => {
  it("returns the six checks in the order of shared/API.md", () => {
    const i = input([at({ id: "T1", x: 0, y: 10 })]);
    expect(checkBalance(i, pointOf(i)).map((c) => c.id)).toEqual([
      "melody-forward",
      "bass-up-pyramid",
      "depth-support",
      "wide-form-edges",
      "stand-outs",
      "arrival-spread",
    ]);
  });
});

describe("melody-forward (default lead 3 dB: common practice, no source)", () => {
  const trumpets = [0, 2, 4].map((x, k) => at({ id: `T${k}`, x, y: 10, voice: "melody", dynamic: "ff" }));
  const clarinets = [0, 2, 4].map((x, k) => at({ id: `C${k}`, x, y: 14, instrument: "clarinet", section: "clarinets", voice: "accompaniment", dynamic: "pp" }));

  it("passes when a trumpet melody at ff sits over a clarinet accompaniment at pp", () => {
    expect(check([...trumpets, ...clarinets], "melody-forward").passed).toBe(true);
  });

  it("fails a clarinet melody at p under trumpets at f, naming both sections' players", () => {
    const band = [
      ...clarinets.map((c) => ({ ...c, voice: "melody" as const, dynamic: "p" as const })),
      ...trumpets.map((t) => ({ ...t, voice: "accompaniment" as const, dynamic: "f" as const })),
    ];
    const c = check(band, "melody-forward");
    expect(c.passed).toBe(false);
    expect(c.detail).toMatch(/below the accompaniment/);
    expect(c.performerIds.sort()).toEqual(["C0", "C1", "C2", "T0", "T1", "T2"]);
  });

  it("uses the director's margin: the boundary sits at the lead the engine predicts", () => {
    const band = [...trumpets.map((t) => ({ ...t, dynamic: "p" as const })), ...clarinets.map((c) => ({ ...c, dynamic: "f" as const }))];
    const p = pointOf(input(band));
    const lead = p.voices.melody!.dbA - p.voices.accompaniment!.dbA;
    expect(lead).toBeGreaterThan(1);
    expect(lead).toBeLessThan(19);
    expect(check(band, "melody-forward", { melodyLeadDb: lead - 0.1 }).passed).toBe(true);
    expect(check(band, "melody-forward", { melodyLeadDb: lead + 0.1 }).passed).toBe(false);
  });

  it("passes with nothing to compare when no one plays the melody", () => {
    const c = check(clarinets, "melody-forward");
    expect(c.passed).toBe(true);
    expect(c.performerIds).toEqual([]);
  });
});

describe("bass-up-pyramid (tolerance 1 dB over the accompaniment and bass: common practice, no source)", () => {
  const brass = (trumpet: PerformerInput["dynamic"], tuba: PerformerInput["dynamic"], trumpetVoice: PerformerInput["voice"] = "accompaniment") => [
    at({ id: "T1", x: -2, y: 12, voice: trumpetVoice, dynamic: trumpet }),
    at({ id: "T2", x: 0, y: 12, voice: trumpetVoice, dynamic: trumpet }),
    at({ id: "U1", x: 2, y: 12, instrument: "tuba", section: "tubas", voice: "bass", dynamic: tuba }),
  ];

  it("passes when the tubas are more present than the trumpets", () => {
    expect(check(brass("p", "f"), "bass-up-pyramid").passed).toBe(true);
  });

  it("fails trumpets at f over a tuba at p, naming both registers", () => {
    const c = check(brass("f", "p"), "bass-up-pyramid");
    expect(c.passed).toBe(false);
    expect(c.detail).toMatch(/brass, the bass register \(tubas\) is [\d.]+ dB below the soprano \(trumpets\)/);
    expect(c.performerIds.sort()).toEqual(["T1", "T2", "U1"]);
  });

  it("leaves the melody out of the pyramid, and the tolerance can be widened", () => {
    expect(check(brass("f", "p", "melody"), "bass-up-pyramid").passed).toBe(true);
    expect(check(brass("mf", "mp"), "bass-up-pyramid")).toMatchObject({ passed: false });
    expect(check(brass("mf", "mp"), "bass-up-pyramid", { pyramidToleranceDb: 20 }).passed).toBe(true);
  });
});

describe("depth-support (front players no more than 3 dB louder each: common practice, no source)", () => {
  // Front third of the field: y < 53⅓ yd / 3 = 16.256 m; back third: y > 32.512 m.
  const band = (front: PerformerInput["dynamic"], back: PerformerInput["dynamic"]) => [
    at({ id: "F1", x: -2, y: 5, dynamic: front }),
    at({ id: "F2", x: 2, y: 5, dynamic: front }),
    at({ id: "B1", x: -2, y: 44, dynamic: back }),
    at({ id: "B2", x: 2, y: 44, dynamic: back }),
  ];

  it("fails equal dynamics front and back: the front is closer to the box (inverse-square law)", () => {
    const c = check(band("mf", "mf"), "depth-support");
    expect(c.passed).toBe(false);
    expect(c.performerIds.sort()).toEqual(["F1", "F2"]);
    expect(c.detail).toMatch(/Trumpet: the 2 players in the front third/);
  });

  it("passes when the front plays two steps under the back", () => {
    expect(check(band("p", "mf"), "depth-support").passed).toBe(true);
  });
});

describe("wide-form-edges (forms over 40 yd, ends not louder than the centre: common practice, no source)", () => {
  const line = (halfWidth: number, edgeFacing: (x: number) => number, centreFacing: number) =>
    [-1, -0.8, -0.1, 0, 0.1, 0.8, 1].map((f, k) => {
      const x = f * halfWidth;
      const edge = Math.abs(f) > 0.5;
      return performer({ id: `W${k}`, x, y: 12, facingDeg: edge ? edgeFacing(x) : centreFacing });
    });
  const toBox = (x: number) => facingToward(x, 12, BOX.x, BOX.y);

  it("passes a 50 m line all facing the box (the ends are farther away)", () => {
    expect(check(line(25, toBox, 0), "wide-form-edges").passed).toBe(true);
  });

  it("fails a 50 m line whose centre faces away while the ends face the box", () => {
    const c = check(line(25, toBox, 180), "wide-form-edges");
    expect(c.passed).toBe(false);
    expect(c.performerIds.sort()).toEqual(["W0", "W1", "W5", "W6"]);
  });

  it("does not apply to a form narrower than the threshold", () => {
    const c = check(line(15, toBox, 180), "wide-form-edges");
    expect(c.passed).toBe(true);
    expect(c.detail).toMatch(/not wider than 40 yd/);
  });
});

describe("stand-outs (6 dB above the median of the rest of the section: common practice, no source)", () => {
  // Same place and facing, so a player's level at the box differs by its strength offset exactly.
  const section = (strong: number) =>
    ["S1", "S2", "S3", "S4"].map((id) => at({ id, x: 0, y: 10, strengthDb: id === "S2" ? strong : 0 }));

  it("passes a strong player 5.9 dB above the others and fails one 6.1 dB above", () => {
    expect(check(section(5.9), "stand-outs").passed).toBe(true);
    const c = check(section(6.1), "stand-outs");
    expect(c.passed).toBe(false);
    expect(c.performerIds).toEqual(["S2"]);
  });

  it("compares players with the same instrument of their section: a louder instrument is not a stand-out", () => {
    const band = [...section(0), at({ id: "CY", x: 0, y: 10, instrument: "cymbals" })];
    expect(check(band, "stand-outs").passed).toBe(true);
  });

  it("flags a player much closer to the box than the rest", () => {
    const band = [at({ id: "N", x: 0, y: 0 }), at({ id: "A", x: 0, y: 40 }), at({ id: "B", x: 2, y: 40 }), at({ id: "C", x: 4, y: 40 })];
    expect(check(band, "stand-outs").performerIds).toEqual(["N"]);
  });
});

describe("arrival-spread (100 ms: echo threshold for music, from memory; precedence effect, Haas 1951)", () => {
  // Arrival r / c with c = 343.2 m/s at 20 °C (ISO 9613-1 form, shared references).
  const c = speedOfSound(AIR.temperatureC);
  const r = (y: number) => Math.hypot(0, y - BOX.y, 1.5 - BOX.z);
  /** y behind a player at y = 0 whose sound arrives `ms` later. */
  const yForDelay = (ms: number) => {
    const target = r(0) + (ms / 1000) * c;
    return Math.sqrt(target ** 2 - (1.5 - BOX.z) ** 2) + BOX.y;
  };

  it("computes the delay of the farthest player as r / c", () => {
    expect(c).toBeCloseTo(343.2, 6);
    const i = input([at({ id: "A", x: 0, y: 0 }), at({ id: "B", x: 0, y: yForDelay(35) })]);
    expect(pointOf(i).arrivalSpreadMs).toBeCloseTo(35, 6);
  });

  it("passes 95 ms and fails 105 ms, naming the late player; tacet players do not count", () => {
    const near = at({ id: "A", x: 0, y: 0 });
    expect(check([near, at({ id: "B", x: 0, y: yForDelay(95) }), at({ id: "Z", x: 0, y: yForDelay(140), voice: "tacet" })], "arrival-spread").passed).toBe(true);
    const late = check([near, at({ id: "B", x: 0, y: yForDelay(105) })], "arrival-spread");
    expect(late.passed).toBe(false);
    expect(late.performerIds).toEqual(["B"]);
    expect(late.detail).toMatch(/105 ms after the nearest \(limit 100 ms\)/);
  });
});

describe("targets", () => {
  it("keeps the documented defaults and lays a director's values over them", () => {
    expect(resolveTargets(null)).toEqual({ ...DEFAULT_TARGETS });
    expect(resolveTargets({ melodyLeadDb: 5 }).melodyLeadDb).toBe(5);
    expect(resolveTargets({ melodyLeadDb: 5 }).standOutDb).toBe(DEFAULT_TARGETS.standOutDb);
    expect(DEFAULT_TARGETS.wideFormWidthM).toBeCloseTo(36.576, 9); // 40 yd
  });

  it("rejects values out of range and unknown voices", () => {
    expect(() => resolveTargets({ melodyLeadDb: -1 })).toThrow(/targets.melodyLeadDb/);
    expect(() => resolveTargets({ arrivalSpreadMs: Number.NaN })).toThrow(/targets.arrivalSpreadMs/);
    expect(() => resolveTargets({ pyramidVoices: ["tacet" as never] })).toThrow(/targets.pyramidVoices/);
  });
});
