// The balance checks at their exact limits, where "at most" and "at least" decide: counts of players
// and widths a test can set exactly, and ties made exact by symmetry (two players mirrored about the
// box's line, same instrument and dynamic, hear alike to the last bit). Mutation runs over checks.ts
// found these edges unchecked.
import { describe, expect, it } from "vitest";
import { analyzeSet, checkBalance, type AnalysisInput, type CheckResult, type PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, facingToward, performer } from "./helpers";

const input = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [BOX], conditions: AIR });
const check = (performers: PerformerInput[], id: CheckResult["id"], targets?: Parameters<typeof checkBalance>[2]) => {
  const i = input(performers);
  return checkBalance(i, analyzeSet(i).points[0]!, targets).find((c) => c.id === id)!;
};
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) => performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
/** Two players mirrored about x = 0 (the box's line), each facing the box. */
const mirrored = (a: Partial<PerformerInput> & { id: string }, b: Partial<PerformerInput> & { id: string }) => [at({ x: -2, y: 10, ...a }), at({ x: 2, y: 10, ...b })];

describe("ties made exact by symmetry", () => {
  it("melody-forward: a melody exactly as loud as the accompaniment leads by 0 dB, which meets a target of 0 and is 'only 0.0 dB over' a target of 3", () => {
    const band = mirrored({ id: "M", voice: "melody", section: "trumpets" }, { id: "A", voice: "accompaniment", section: "cornets" });
    expect(check(band, "melody-forward", { melodyLeadDb: 0 }).status).toBe("pass");
    expect(check(band, "melody-forward", { melodyLeadDb: 3 }).detail).toBe(
      "The melody (trumpets) is only 0.0 dB over the accompaniment (cornets) in loudness here; it should lead every other wind voice by 3.0 dB.",
    );
  });

  it("stand-outs: two equal players are 0 dB above each other, which a limit of 0 allows", () => {
    const pair = mirrored({ id: "T0", voice: "accompaniment" }, { id: "T1", voice: "accompaniment" });
    expect(check(pair, "stand-outs", { standOutDb: 0 }).status).toBe("pass");
  });
});

describe("counts at their limits", () => {
  it("stand-outs and depth-support judge a section of exactly two players", () => {
    const two = [at({ id: "T0", x: 0, y: 10, voice: "accompaniment" }), at({ id: "T1", x: 2, y: 10, voice: "accompaniment", strengthDb: 9 })];
    expect(check(two, "stand-outs").performerIds).toEqual(["T1"]);
    const deep = [at({ id: "N", x: 0, y: 2 }), { ...at({ id: "F", x: 0, y: 40 }), facingDeg: 180 }];
    expect(check(deep, "depth-support").performerIds).toEqual(["F"]);
  });

  it("arrival-spread judges exactly two players in the window", () => {
    expect(check(mirrored({ id: "T0" }, { id: "T1" }), "arrival-spread").status).toBe("pass");
  });

  it("wide-form-edges judges a form of exactly three winds", () => {
    const three = [-25, 0, 25].map((x, k) => at({ id: `T${k}`, x, y: 10 }));
    expect(check(three, "wide-form-edges").status).toBe("pass");
  });
});

describe("wide-form-edges' geometry on exact positions", () => {
  // Clarinets at x = 0 and 60 set the form: 60 m wide, each end a sixth (10 m), the centre the middle
  // third (20 … 40 m) around x = 30.
  const form = (...trumpetXs: number[]) => [
    at({ id: "C0", x: 0, y: 10, instrument: "clarinet", section: "clarinets" }),
    at({ id: "C1", x: 60, y: 10, instrument: "clarinet", section: "clarinets" }),
    ...trumpetXs.map((x, k) => at({ id: `T${k}`, x, y: 10 })),
  ];

  it("a form exactly as wide as the limit is not checked; one wider is", () => {
    const line = (w: number) => [0, w / 2, w].map((x, k) => at({ id: `T${k}`, x, y: 10 }));
    expect(check(line(30), "wide-form-edges", { wideFormWidthM: 30 }).status).toBe("not-applicable");
    expect(check(line(31), "wide-form-edges", { wideFormWidthM: 30 }).status).toBe("pass");
  });

  it("a player exactly a sixth in from either end is at that end, and one exactly a sixth from the middle is at the centre", () => {
    expect(check(form(10, 30), "wide-form-edges").status).toBe("pass");
    expect(check(form(30, 50), "wide-form-edges").status).toBe("pass");
    expect(check(form(20, 50), "wide-form-edges").status).toBe("pass");
    // Only a player in the centre and none at an end: nothing to compare.
    expect(check(form(25, 35), "wide-form-edges").status).toBe("not-applicable");
  });
});

describe("what each check looks at", () => {
  it("a pass marks no one; a failure is applicable and marks its players", () => {
    const pass = check(mirrored({ id: "T0" }, { id: "T1" }), "arrival-spread");
    expect([pass.status, pass.applicable, pass.performerIds]).toEqual(["pass", true, []]);
    const fail = check([at({ id: "T0", x: 0, y: 10, voice: "accompaniment" }), at({ id: "T1", x: 2, y: 10, voice: "accompaniment", strengthDb: 9 })], "stand-outs");
    expect([fail.status, fail.passed, fail.applicable]).toEqual(["fail", false, true]);
  });

  it("bass-up-pyramid across the band starts from the bass register: with no bass, or with both choirs on the bass alone, there is nothing across the band to judge", () => {
    // Clarinets (soprano) at ff over trombones (tenor) at pp: one register per choir, no bass.
    const noBass = [...[0, 2].map((x, k) => at({ id: `C${k}`, x, y: 12, instrument: "clarinet", section: "clarinets", voice: "accompaniment", dynamic: "ff" })), at({ id: "L", x: 6, y: 12, instrument: "trombone", section: "trombones", voice: "accompaniment", dynamic: "pp" })];
    expect(check(noBass, "bass-up-pyramid").status).toBe("not-applicable");
    const basses = [at({ id: "B", x: 0, y: 12, instrument: "bari-sax", section: "bari sax", voice: "bass" }), at({ id: "U", x: 4, y: 12, instrument: "tuba", section: "tubas", voice: "bass" })];
    expect(check(basses, "bass-up-pyramid").status).toBe("not-applicable");
  });

  it("depth-support compares an instrument's own players at one dynamic: a trumpet in front and a clarinet behind, or snares, are nothing to judge", () => {
    const turned = (p: PerformerInput) => ({ ...p, facingDeg: 180 });
    expect(check([at({ id: "T", x: 0, y: 2 }), turned(at({ id: "C", x: 0, y: 40, instrument: "clarinet", section: "clarinets" }))], "depth-support").status).toBe("not-applicable");
    expect(check([at({ id: "T", x: 0, y: 2 }), turned(at({ id: "U", x: 0, y: 40, dynamic: "ff" }))], "depth-support").status).toBe("not-applicable");
    const snares = [at({ id: "S0", x: 0, y: 2, instrument: "snare", section: "snares", voice: "percussion" }), turned(at({ id: "S1", x: 0, y: 40, instrument: "snare", section: "snares", voice: "percussion" }))];
    expect(check(snares, "depth-support").status).toBe("not-applicable");
  });

  it("depth-support measures the span between the near and far halves' mean distances: four trumpets in two ranks 5 m apart are under 10 yd apart", () => {
    const ranks = [-2, 2].flatMap((x, k) => [at({ id: `N${k}`, x, y: 10 }), at({ id: `F${k}`, x, y: 15 })]);
    expect(check(ranks, "depth-support").status).toBe("not-applicable");
  });

  it("wide-form-edges counts winds only: two trumpets among a wide snare line are too few", () => {
    const band = [at({ id: "T0", x: -25, y: 10 }), at({ id: "T1", x: 25, y: 10 }), ...[-20, -10, 0, 10, 20].map((x, k) => at({ id: `S${k}`, x, y: 14, instrument: "snare", section: "snares", voice: "percussion" }))];
    expect(check(band, "wide-form-edges").detail).toBe("Too few winds play to make a form.");
  });
});

describe("stand-outs measures each player from the median of the rest, in order of loudness", () => {
  it("four trumpets 0, 20, 10 and 1 dB strong: the 20 and the 10 each stand over the rest's median (the 1 dB player), the others do not", () => {
    // The rest of the 10 dB player are 0, 1 and 20 dB strong: their median is the 1 dB player, about
    // 9 phon under it, over the 6 asked. Taken in roster order instead, the middle one would be the 20.
    const band = [0, 20, 10, 1].map((strengthDb, k) => at({ id: `T${k}`, x: k, y: 10, voice: "accompaniment", strengthDb }));
    expect(check(band, "stand-outs").performerIds).toEqual(["T1", "T2"]);
  });
});
