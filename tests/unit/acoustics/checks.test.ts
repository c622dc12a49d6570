// The balance checks on perceived loudness: each check's pass, fail and "not applicable", and the edge
// cases of issue 14 (empty set, all tacet, nobody on the melody, a soloist, a pp flute in the arrival
// spread, trumpets at the ends with clarinets in the centre, a listening point behind the back
// sideline, equal players front and back).
import { describe, expect, it } from "vitest";
import { analyzeSet, checkBalance, type AnalysisInput, type CheckResult, type PerformerInput } from "@/lib/acoustics";
import { CHECK_IDS } from "@/lib/acoustics/types";
import { AIR, BOX, facingToward, performer } from "./helpers";

const input = (performers: PerformerInput[], point = BOX): AnalysisInput => ({ performers, listeningPoints: [point], conditions: AIR });
function checks(performers: PerformerInput[], targets?: Parameters<typeof checkBalance>[2], point = BOX): CheckResult[] {
  const i = input(performers, point);
  return checkBalance(i, analyzeSet(i).points[0]!, targets);
}
const check = (performers: PerformerInput[], id: CheckResult["id"], targets?: Parameters<typeof checkBalance>[2], point = BOX) =>
  checks(performers, targets, point).find((c) => c.id === id)!;
/** A performer at (x, y) facing the box. */
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }, point = BOX) =>
  performer({ facingDeg: facingToward(over.x, over.y, point.x, point.y), ...over });
const row = (prefix: string, n: number, y: number, over: Partial<PerformerInput> = {}, x0 = 0) =>
  Array.from({ length: n }, (_, k) => at({ id: `${prefix}${k}`, x: x0 + 2 * k, y, ...over }));

describe("checkBalance: shape and nothing to judge", () => {
  it("returns the checks in the order of CHECK_IDS (shared/API.md's six first), each with a status", () => {
    const list = checks(row("T", 3, 10));
    expect(list.map((c) => c.id)).toEqual([...CHECK_IDS]);
    expect(list.map((c) => c.id).slice(0, 6)).toEqual(["melody-forward", "bass-up-pyramid", "depth-support", "wide-form-edges", "stand-outs", "arrival-spread"]);
    for (const c of list) expect(c.status === "not-applicable").toBe(!c.applicable);
  });

  it("an empty set: every check is not applicable, none a pass", () => {
    for (const c of checks([])) expect([c.id, c.status, c.passed, c.performerIds]).toEqual([c.id, "not-applicable", true, []]);
  });

  it("an all-tacet set: every check is not applicable", () => {
    for (const c of checks(row("T", 4, 10, { voice: "tacet" }))) expect([c.id, c.status]).toEqual([c.id, "not-applicable"]);
  });

  it("one player: nothing is a pass but the melody being heard", () => {
    const list = checks([at({ id: "T1", x: 0, y: 10 })]);
    for (const c of list) expect([c.id, c.status]).toEqual([c.id, c.id === "heard-at-box" ? "pass" : "not-applicable"]);
  });
});

describe("melody-forward: over every other wind voice, in loudness (lead 3 phon: common practice, no source)", () => {
  it("nobody on the melody: not applicable", () => {
    expect(check(row("C", 3, 12, { instrument: "clarinet", section: "clarinets", voice: "accompaniment" }), "melody-forward").status).toBe("not-applicable");
  });

  it("a clarinet melody at p under trumpets at f fails, naming the sections; trumpets ff over clarinets pp pass", () => {
    const clar = (voice: PerformerInput["voice"], dynamic: PerformerInput["dynamic"]) => row("C", 3, 14, { instrument: "clarinet", section: "clarinets", voice, dynamic });
    const trp = (voice: PerformerInput["voice"], dynamic: PerformerInput["dynamic"]) => row("T", 3, 10, { voice, dynamic });
    const bad = check([...clar("melody", "p"), ...trp("accompaniment", "f")], "melody-forward");
    expect(bad.status).toBe("fail");
    expect(bad.detail).toMatch(/under the accompaniment \(trumpets\)/);
    expect(bad.performerIds.sort()).toEqual(["C0", "C1", "C2", "T0", "T1", "T2"]);
    expect(check([...trp("melody", "ff"), ...clar("accompaniment", "pp")], "melody-forward").status).toBe("pass");
  });

  it("the battery does not count against the melody (it has its own check)", () => {
    const band = [...row("T", 3, 10, { dynamic: "mf" }), ...row("S", 4, 20, { instrument: "snare", section: "snares", voice: "percussion", dynamic: "ff" })];
    expect(check(band, "melody-forward").status).toBe("not-applicable");
    expect(check(band, "battery-balance").status).toBe("fail");
  });
});

describe("battery-balance: the battery does not cover the winds (3 phon: common practice, no source)", () => {
  it("not applicable without a battery, without winds, or when the battery carries the melody", () => {
    expect(check(row("T", 3, 10), "battery-balance").status).toBe("not-applicable");
    expect(check(row("S", 3, 10, { instrument: "snare", section: "snares", voice: "percussion" }), "battery-balance").status).toBe("not-applicable");
    const feature = [...row("S", 3, 10, { instrument: "snare", section: "snares", voice: "melody", dynamic: "ff" }), ...row("T", 3, 14, { voice: "accompaniment", dynamic: "p" })];
    expect(check(feature, "battery-balance").status).toBe("not-applicable");
  });

  it("a battery at pp under trumpets at f passes", () => {
    const band = [...row("T", 6, 10, { dynamic: "f" }), ...row("S", 2, 20, { instrument: "snare", section: "snares", voice: "percussion", dynamic: "pp" })];
    expect(check(band, "battery-balance").status).toBe("pass");
  });
});

describe("bass-up-pyramid: loudness by register, within each choir and across the band (tolerance 3 phon: common practice, no source)", () => {
  const brass = (trumpet: PerformerInput["dynamic"], tuba: PerformerInput["dynamic"]) => [
    ...row("T", 4, 12, { voice: "accompaniment", dynamic: trumpet }),
    ...row("U", 2, 12, { instrument: "tuba", section: "tubas", voice: "bass", dynamic: tuba }, 10),
  ];

  it("two tubas at f with four trumpets at mp pass", () => {
    expect(check(brass("mp", "f"), "bass-up-pyramid").status).toBe("pass");
  });

  it("trumpets at ff over tubas at pp fail, naming the registers and the choir", () => {
    const c = check(brass("ff", "pp"), "bass-up-pyramid");
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(/in the brass, the bass register \(tubas\) is [\d.]+ dB under the soprano \(trumpets\)/i);
  });

  it("one register only, or harmony outside the pyramid's voices: not applicable", () => {
    expect(check(row("T", 3, 12, { voice: "accompaniment" }), "bass-up-pyramid").status).toBe("not-applicable");
    expect(check(brass("ff", "pp").map((p) => ({ ...p, voice: "melody" as const })), "bass-up-pyramid").status).toBe("not-applicable");
  });
});

describe("depth-support: nearer against farther players by distance to the point, beyond what distance explains (3 phon)", () => {
  const deep = (point = BOX, backFacing?: number) => [
    ...row("N", 3, 2, {}, -2).map((p) => at({ ...p }, point)),
    ...row("F", 3, 40, {}, -2).map((p) => (backFacing === undefined ? at({ ...p }, point) : { ...p, facingDeg: backFacing })),
  ];

  it("equal players front and back, all facing the box, pass: the back is softer by distance alone", () => {
    expect(check(deep(), "depth-support").status).toBe("pass");
  });

  it("the back rank turned away fails and names the back players", () => {
    const c = check(deep(BOX, 180), "depth-support");
    expect(c.status).toBe("fail");
    expect(c.performerIds.sort()).toEqual(["F0", "F1", "F2"]);
  });

  it("a listening point behind the back sideline: the front rank turned away is the farther one and fails", () => {
    const behind = { id: "behind", x: 0, y: 75, z: 18 };
    const band = [...row("N", 3, 2, {}, -2).map((p) => ({ ...p, facingDeg: 0 })), ...row("F", 3, 40, {}, -2).map((p) => ({ ...p, facingDeg: facingToward(p.x, p.y, behind.x, behind.y) }))];
    const c = check(band, "depth-support", null, behind);
    expect(c.status).toBe("fail");
    expect(c.performerIds.sort()).toEqual(["N0", "N1", "N2"]);
  });

  it("players all at one depth: not applicable", () => {
    expect(check(row("T", 6, 10), "depth-support").status).toBe("not-applicable");
  });
});

describe("wide-form-edges: per section, ends against the same section's centre, in forms wider than 40 yd (tolerance 2 phon)", () => {
  it("trumpets at the ends and clarinets in the centre: no section is at both, so not applicable", () => {
    const band = [
      at({ id: "T1", x: -25, y: 10 }), at({ id: "T2", x: 25, y: 10 }),
      ...row("C", 4, 10, { instrument: "clarinet", section: "clarinets", dynamic: "p" }, -3),
    ];
    expect(check(band, "wide-form-edges").status).toBe("not-applicable");
  });

  it("a trumpet line whose end players are strong fails; the same line even passes; a narrow one is not applicable", () => {
    const line = (endStrength: number) => [-25, -20, -2, 0, 2, 20, 25].map((x, k) => at({ id: `T${k}`, x, y: 10, strengthDb: Math.abs(x) > 15 ? endStrength : 0 }));
    expect(check(line(0), "wide-form-edges").status).toBe("pass");
    const c = check(line(6), "wide-form-edges");
    expect(c.status).toBe("fail");
    expect(c.performerIds.sort()).toEqual(["T0", "T1", "T5", "T6"]);
    expect(check(row("T", 5, 10), "wide-form-edges").status).toBe("not-applicable");
  });
});

describe("stand-outs: within one section and voice; a soloist never (6 phon)", () => {
  it("a strong trumpet among its section stands out", () => {
    const band = row("T", 5, 10, { voice: "accompaniment" }).map((p, k) => (k === 2 ? { ...p, strengthDb: 9 } : p));
    const c = check(band, "stand-outs");
    expect(c.status).toBe("fail");
    expect(c.performerIds).toEqual(["T2"]);
  });

  it("a soloist (alone on the melody in the section, or a part marked solo) is not a stand-out", () => {
    const rest = row("T", 4, 12, { voice: "accompaniment", dynamic: "pp" });
    const solo = at({ id: "S", x: 0, y: 4, voice: "melody", dynamic: "f", strengthDb: 3 });
    expect(check([...rest, solo], "stand-outs").status).toBe("pass");
    const marked = [...rest, { ...at({ id: "S", x: 0, y: 4, voice: "accompaniment", dynamic: "f", strengthDb: 3 }), solo: true }];
    expect(check(marked, "stand-outs").status).toBe("pass");
    expect(check(marked.map(({ solo: _, ...p }) => p), "stand-outs").status).toBe("fail");
  });

  it("one player per section and voice: not applicable", () => {
    expect(check([at({ id: "T", x: 0, y: 10 }), at({ id: "C", x: 2, y: 10, instrument: "clarinet", section: "clarinets" })], "stand-outs").status).toBe("not-applicable");
  });
});

describe("arrival-spread: among players within 10 dB of the loudest (Burg et al.), at most 50 ms (Truax: echoes from 40–50 ms)", () => {
  it("a pp flute far behind the band is outside the window and does not count", () => {
    const band = [...row("T", 4, 0, { dynamic: "ff" }), at({ id: "FL", x: 0, y: 45, instrument: "flute", section: "flutes", voice: "accompaniment", dynamic: "pp" })];
    const c = check(band, "arrival-spread");
    expect(c.status).toBe("pass");
    const loud = check(band.map((p) => (p.id === "FL" ? { ...p, instrument: "trumpet", dynamic: "ff" as const } : p)), "arrival-spread");
    expect(loud.status).toBe("fail");
    expect(loud.performerIds).toEqual(["FL"]);
  });

  it("one player within the window: not applicable", () => {
    expect(check([at({ id: "T", x: 0, y: 0, dynamic: "ff" }), at({ id: "FL", x: 0, y: 45, instrument: "flute", section: "flutes", voice: "accompaniment", dynamic: "pp" })], "arrival-spread").status).toBe("not-applicable");
  });
});

describe("heard-at-box: every sounding voice is heard over the rest and the background", () => {
  it("a pp flute line under a ff brass band fails, naming the flute; with the flutes at ff and the brass at p it passes", () => {
    const band = (flute: PerformerInput["dynamic"], brass: PerformerInput["dynamic"]) => [
      ...row("T", 8, 10, { dynamic: brass }),
      ...row("U", 4, 12, { instrument: "tuba", section: "tubas", voice: "bass", dynamic: brass }),
      ...row("F", 2, 14, { instrument: "flute", section: "flutes", voice: "countermelody", dynamic: flute }),
    ];
    const c = check(band("pp", "ff"), "heard-at-box");
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(/countermelody \(flutes/);
    expect(c.performerIds.sort()).toEqual(["F0", "F1"]);
    expect(check(band("ff", "p"), "heard-at-box").status).toBe("pass");
  });

  it("a soft voice alone is heard on a quiet field and lost in a stadium crowd", () => {
    const flutes = row("F", 2, 10, { instrument: "flute", section: "flutes", dynamic: "mp" });
    expect(check(flutes, "heard-at-box", null, { ...BOX, background: { preset: "quiet-field" } } as typeof BOX).status).toBe("pass");
    expect(check(flutes, "heard-at-box", null, { ...BOX, background: { preset: "stadium-between-bands" } } as typeof BOX).status).toBe("fail");
  });
});
