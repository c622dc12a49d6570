// The sentences the balance checks say on the page, word for word: a director reads them, so each
// names the sections, the voice and the target it was judged against (set here to figures no default
// has, so the sentence must carry the director's own). Figures the engine computes are matched as
// "<n>.<n> dB". Mutation runs (npm run mutation over checks.ts) found these words unchecked.
import { describe, expect, it } from "vitest";
import { analyzeSet, checkBalance, type AnalysisInput, type CheckResult, type PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, facingToward, performer } from "./helpers";

const input = (performers: PerformerInput[], point = BOX): AnalysisInput => ({ performers, listeningPoints: [point], conditions: AIR });
const check = (performers: PerformerInput[], id: CheckResult["id"], targets?: Parameters<typeof checkBalance>[2], point = BOX) => {
  const i = input(performers, point);
  return checkBalance(i, analyzeSet(i).points[0]!, targets).find((c) => c.id === id)!;
};
const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) => performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
const row = (prefix: string, n: number, y: number, over: Partial<PerformerInput> = {}, x0 = 0) =>
  Array.from({ length: n }, (_, k) => at({ id: `${prefix}${k}`, x: x0 + 2 * k, y, ...over }));
const DB = String.raw`\d+\.\d dB`;
const sentence = (s: string) => new RegExp(`^${s}$`);

describe("melody-forward's words", () => {
  it("nothing to judge: says who is missing", () => {
    expect(check(row("C", 3, 12, { instrument: "clarinet", section: "clarinets", voice: "accompaniment" }), "melody-forward").detail).toBe("No one plays the melody in this set.");
    expect(check(row("T", 3, 12), "melody-forward").detail).toBe("No other wind voice plays with the melody.");
  });

  it("a pass names the closest wind voice, its lead and the director's target", () => {
    // Three other voices, the closest in the middle of the voices' order (accompaniment): the first or
    // the last voice would be the wrong one.
    const band = [
      ...row("T", 8, 10, { dynamic: "ff" }),
      at({ id: "F0", x: 20, y: 20, instrument: "flute", section: "flutes", voice: "countermelody", dynamic: "pp" }),
      ...row("M", 2, 14, { instrument: "mellophone", section: "mellophones", voice: "accompaniment", dynamic: "mf" }),
      at({ id: "U0", x: -20, y: 20, instrument: "tuba", section: "tubas", voice: "bass", dynamic: "pp" }),
    ];
    const c = check(band, "melody-forward", { melodyLeadDb: 4 });
    expect(c.status).toBe("pass");
    expect(c.detail).toMatch(sentence(String.raw`The melody leads the next loudest wind voice \(accompaniment\) by ${DB} of loudness \(target 4\.0 dB\)\.`));
  });

  it("a failure lists the voices short of the lead, most under first, each with its sections, and the target", () => {
    // The accompaniment (eight cornets at ff) is over the melody (two trumpets at mf); the
    // countermelody (two mellophones at mf) is under it, but by less than the 20 dB asked.
    const band = [
      ...row("T", 2, 10, { section: "trumpets", voice: "melody", dynamic: "mf" }),
      ...row("M", 2, 14, { instrument: "mellophone", section: "mellophones", voice: "countermelody", dynamic: "mf" }, 10),
      ...row("K", 8, 12, { section: "cornets", voice: "accompaniment", dynamic: "ff" }, -20),
    ];
    const c = check(band, "melody-forward", { melodyLeadDb: 20 });
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(
      sentence(
        String.raw`The melody \(trumpets\) is ${DB} under the accompaniment \(cornets\) and only ${DB} over the countermelody \(mellophones\) in loudness here; it should lead every other wind voice by 20\.0 dB\.`,
      ),
    );
    expect(c.performerIds.sort()).toEqual(["K0", "K1", "K2", "K3", "K4", "K5", "K6", "K7", "M0", "M1", "T0", "T1"]);
  });
});

describe("battery-balance's words", () => {
  const snares = (n: number, dynamic: PerformerInput["dynamic"], voice: PerformerInput["voice"] = "percussion") => row("S", n, 20, { instrument: "snare", section: "snares", voice, dynamic });

  it("nothing to judge: says why", () => {
    expect(check(row("T", 3, 10), "battery-balance").detail).toBe("The battery does not play in this set.");
    expect(check(snares(3, "mf"), "battery-balance").detail).toBe("No winds play with the battery in this set.");
    // One snare of two carries the melody: the battery carries it.
    const feature = [...snares(2, "ff").map((p, k) => (k === 0 ? { ...p, voice: "melody" as const } : p)), ...row("T", 3, 14, { voice: "accompaniment", dynamic: "p" })];
    expect(check(feature, "battery-balance").detail).toBe("The battery carries the melody here.");
  });

  it("a pass says under or over the winds and the director's limit", () => {
    const under = check([...row("T", 6, 10, { dynamic: "f" }), ...snares(2, "pp")], "battery-balance", { batteryOverWindsDb: 5 });
    expect(under.status).toBe("pass");
    expect(under.detail).toMatch(sentence(String.raw`The battery is ${DB} under the winds in loudness \(at most 5\.0 dB over\)\.`));
    const over = check([...row("T", 2, 10, { dynamic: "p" }), ...snares(2, "p")], "battery-balance", { batteryOverWindsDb: 20 });
    expect(over.status).toBe("pass");
    expect(over.detail).toMatch(sentence(String.raw`The battery is ${DB} over the winds in loudness \(at most 20\.0 dB over\)\.`));
  });

  it("a failure says how far over and marks the battery", () => {
    const c = check([...row("T", 2, 10, { dynamic: "p" }), ...snares(4, "ff")], "battery-balance", { batteryOverWindsDb: 1 });
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(sentence(String.raw`The battery is ${DB} over the winds in loudness here; it should be at most 1\.0 dB over, or it covers them\.`));
    expect(c.performerIds.sort()).toEqual(["S0", "S1", "S2", "S3"]);
  });
});

describe("bass-up-pyramid's words", () => {
  it("nothing to judge, and a pass with the director's tolerance", () => {
    expect(check(row("T", 3, 12, { voice: "accompaniment" }), "bass-up-pyramid").detail).toBe("No two registers of winds play the harmony here.");
    const brass = [...row("T", 4, 12, { voice: "accompaniment", dynamic: "mp" }), ...row("U", 2, 12, { instrument: "tuba", section: "tubas", voice: "bass", dynamic: "f" }, 10)];
    expect(check(brass, "bass-up-pyramid", { pyramidToleranceDb: 2.5 }).detail).toBe(
      "Every lower register is at least as loud as the higher ones, in each choir and across the band (tolerance 2.5 dB).",
    );
  });

  it("a failure in each choir and across the band, joined in one sentence that starts with a capital", () => {
    const band = [
      ...row("C", 4, 12, { instrument: "clarinet", section: "clarinets", voice: "accompaniment", dynamic: "ff" }),
      at({ id: "BC", x: 10, y: 12, instrument: "bass-clarinet", section: "bass clarinets", voice: "bass", dynamic: "pp" }),
      ...row("T", 4, 14, { voice: "accompaniment", dynamic: "ff" }),
      at({ id: "U0", x: 10, y: 14, instrument: "tuba", section: "tubas", voice: "bass", dynamic: "pp" }),
    ];
    const c = check(band, "bass-up-pyramid", { pyramidToleranceDb: 2.5 });
    expect(c.status).toBe("fail");
    expect(c.detail).toMatch(
      sentence(
        String.raw`In the woodwinds, the bass register \(bass clarinets\) is ${DB} under the soprano \(clarinets\); in the brass, the bass register \(tubas\) is ${DB} under the soprano \(trumpets\); across the band, the bass register \(bass clarinets, tubas\) is ${DB} under the soprano \(clarinets, trumpets\) in loudness \(tolerance 2\.5 dB\)\.`,
      ),
    );
    expect(c.performerIds.sort()).toEqual(["BC", "C0", "C1", "C2", "C3", "T0", "T1", "T2", "T3", "U0"]);
  });

  it("the tenor and alto registers take part: trombones under trumpets, and mellophones under trumpets, each fail by register name", () => {
    const pair = (instrument: string, section: string) => [
      ...row("T", 4, 12, { voice: "accompaniment", dynamic: "ff" }),
      at({ id: "L0", x: 10, y: 12, instrument, section, voice: "accompaniment", dynamic: "pp" }),
    ];
    expect(check(pair("trombone", "trombones"), "bass-up-pyramid").detail).toMatch(/^In the brass, the tenor register \(trombones\) is [\d.]+ dB under the soprano \(trumpets\)/);
    expect(check(pair("mellophone", "mellophones"), "bass-up-pyramid").detail).toMatch(/^In the brass, the alto register \(mellophones\) is [\d.]+ dB under the soprano \(trumpets\)/);
  });
});

describe("depth-support's words", () => {
  const deep = (backFacing?: number) => [
    ...row("N", 3, 2, {}, -2),
    ...row("F", 3, 40, {}, -2).map((p) => (backFacing === undefined ? p : { ...p, facingDeg: backFacing })),
  ];

  it("nothing to judge: names the span in yards (10 yd)", () => {
    expect(check(row("T", 6, 10), "depth-support").detail).toBe("No instrument has players at depths more than 10 yd apart from the listening point.");
  });

  it("a pass and a failure carry the director's tolerance; the failure names the instrument and counts the players", () => {
    expect(check(deep(), "depth-support", { depthToleranceDb: 2.5 }).detail).toBe("Farther players are supported: none is thinner than distance explains by more than 2.5 dB.");
    const c = check(deep(180), "depth-support", { depthToleranceDb: 2.5 });
    expect(c.detail).toMatch(
      sentence(String.raw`Trumpet: the 3 players farther from the listening point are ${DB} thinner each than distance explains \(tolerance 2\.5 dB; they need to play out, or face the box\)\.`),
    );
  });
});

describe("wide-form-edges' words", () => {
  const line = (endStrength: number) => [-25, -20, -2, 0, 2, 20, 25].map((x, k) => at({ id: `T${k}`, x, y: 10, section: "trumpets", strengthDb: Math.abs(x) > 15 ? endStrength : 0 }));

  it("nothing to judge: too few winds, or a form no wider than the limit, in yards", () => {
    expect(check(row("T", 2, 10), "wide-form-edges").detail).toBe("Too few winds play to make a form.");
    expect(check(row("T", 5, 10), "wide-form-edges").detail).toBe("The winds span 9 yd, not wider than 40 yd.");
  });

  it("a pass and a failure give the form's width in yards (50 m = 55 yd), the section, how many end players, and the tolerance", () => {
    expect(check(line(0), "wide-form-edges", { edgeToleranceDb: 1.5 }).detail).toBe("The form spans 55 yd; no section's end players are louder than its centre by more than 1.5 dB.");
    expect(check(line(6), "wide-form-edges", { edgeToleranceDb: 1.5 }).detail).toMatch(
      sentence(String.raw`The form spans 55 yd: the 4 players of the trumpets at the ends are ${DB} louder each than their section's centre \(tolerance 1\.5 dB\)\. The end players should back off\.`),
    );
  });

  it("no section at both its ends and its centre", () => {
    const band = [at({ id: "T1", x: -25, y: 10 }), at({ id: "T2", x: 25, y: 10 }), ...row("C", 4, 10, { instrument: "clarinet", section: "clarinets", dynamic: "p" }, -3)];
    expect(check(band, "wide-form-edges").detail).toBe("The form spans 55 yd, but no section stands both at its ends and at its centre.");
  });
});

describe("stand-outs' words", () => {
  it("nothing to judge, a pass with the director's limit, and a failure per section, loudest first", () => {
    expect(check([at({ id: "T", x: 0, y: 10 })], "stand-outs").detail).toBe("No section has two players on one voice here.");
    expect(check(row("T", 4, 10, { voice: "accompaniment" }), "stand-outs", { standOutDb: 5.5 }).detail).toBe(
      "No player is more than 5.5 dB above the rest of their section's voice in loudness.",
    );
    const band = [
      ...row("T", 5, 10, { section: "trumpets", voice: "accompaniment" }).map((p, k) => (k === 2 ? { ...p, strengthDb: 9 } : p)),
      ...row("M", 5, 14, { instrument: "mellophone", section: "mellophones", voice: "accompaniment" }).map((p, k) => (k === 1 || k === 3 ? { ...p, strengthDb: 14 } : p)),
    ];
    const c = check(band, "stand-outs", { standOutDb: 5.5 });
    expect(c.detail).toMatch(
      sentence(String.raw`Above the rest of their section's voice by more than 5\.5 dB: 2 players of the mellophones up to ${DB}; 1 player of the trumpets up to ${DB} \(closeness, a strong player or a facing\)\.`),
    );
    // Loudest first: the mellophones (14 dB stronger) before the trumpet (9 dB).
    expect(c.performerIds.slice(2)).toEqual(["T2"]);
  });
});

describe("arrival-spread's words", () => {
  const flute = (dynamic: PerformerInput["dynamic"], instrument = "flute") => at({ id: "FL", x: 0, y: 45, instrument, section: "flutes", voice: "accompaniment", dynamic });

  it("nothing to judge: nobody, or one player in the window (the director's window in the words)", () => {
    expect(check([], "arrival-spread").detail).toBe("No one plays in this set.");
    expect(check([at({ id: "T", x: 0, y: 0, dynamic: "ff" }), flute("pp")], "arrival-spread", { arrivalWindowDb: 9.5 }).detail).toBe("Only one player is within 9.5 dB of the loudest.");
  });

  it("a pass and a failure give the spread and the limit in ms, and name the late section", () => {
    const band = [...row("T", 4, 0, { dynamic: "ff" }), flute("pp")];
    expect(check(band, "arrival-spread", { arrivalSpreadMs: 45 }).detail).toMatch(
      sentence(String.raw`The players within 10\.0 dB of the loudest arrive within \d+ ms of each other \(limit 45 ms\)\.`),
    );
    const late = check([...row("T", 4, 0, { dynamic: "ff" }), flute("ff", "trumpet")], "arrival-spread", { arrivalSpreadMs: 45 });
    expect(late.detail).toMatch(
      sentence(String.raw`Among the players within 10\.0 dB of the loudest, the last arrive \d+ ms after the first \(limit 45 ms\); 1 player \(flutes\) arrive late enough to be heard as an echo\.`),
    );
  });
});

describe("heard-at-box's words", () => {
  const band = (flute: PerformerInput["dynamic"], brass: PerformerInput["dynamic"]) => [
    ...row("T", 8, 10, { dynamic: brass }),
    ...row("U", 4, 12, { instrument: "tuba", section: "tubas", voice: "bass", dynamic: brass }),
    ...row("F", 2, 14, { instrument: "flute", section: "flutes", voice: "countermelody", dynamic: flute }),
  ];
  const crowd = { ...BOX, background: { preset: "stadium-between-bands" } } as typeof BOX;

  it("nothing to judge", () => {
    expect(check([], "heard-at-box").detail).toBe("No one plays in this set.");
  });

  it("a pass names the crowd only where there is one", () => {
    expect(check(band("ff", "p"), "heard-at-box").detail).toBe("Every voice that plays is heard over the rest of the band.");
    const loud = [...row("T", 8, 10, { dynamic: "ff" })];
    expect(check(loud, "heard-at-box", null, crowd).detail).toBe("Every voice that plays is heard over the rest of the band and the crowd.");
  });

  it("a failure names the voice, its sections and how far under its threshold; the crowd and a positive margin asked only where they apply", () => {
    expect(check(band("pp", "ff"), "heard-at-box").detail).toMatch(
      sentence(String.raw`Masked by the rest of the band: the countermelody \(flutes, ${DB} under its masked threshold\)\.`),
    );
    expect(check(band("pp", "ff"), "heard-at-box", { heardMarginDb: 2 }, crowd).detail).toMatch(
      sentence(String.raw`Masked by the rest of the band and the crowd: the countermelody \(flutes, ${DB} under its masked threshold\) \(margin asked: 2\.0 dB\)\.`),
    );
  });

  it("a voice heard but short of a positive margin asked is 'over' its threshold", () => {
    // One flute at p, 45 m out, alone: heard (over its threshold in quiet) but not by the 20 dB asked.
    const c = check([at({ id: "F", x: 0, y: 45, instrument: "flute", section: "flutes", dynamic: "p", facingDeg: 0 })], "heard-at-box", { heardMarginDb: 20 });
    expect(c.detail).toMatch(sentence(String.raw`Masked by the rest of the band: the melody \(flutes, ${DB} over its masked threshold\) \(margin asked: 20\.0 dB\)\.`));
  });
});

describe("the checks' words when more than one thing fails", () => {
  it("bass-up-pyramid in one choir says it once, with nothing across the band", () => {
    const brass = [...row("T", 4, 12, { voice: "accompaniment", dynamic: "ff" }), ...row("U", 2, 12, { instrument: "tuba", section: "tubas", voice: "bass", dynamic: "pp" }, 10)];
    expect(check(brass, "bass-up-pyramid").detail).toMatch(sentence(String.raw`In the brass, the bass register \(tubas\) is ${DB} under the soprano \(trumpets\) in loudness \(tolerance 3\.0 dB\)\.`));
  });

  it("depth-support joins two instruments' failures with a semicolon", () => {
    const rank = (prefix: string, y: number, over: Partial<PerformerInput>, turned: boolean) =>
      row(prefix, 3, y, over, -2).map((p) => (turned ? { ...p, facingDeg: 180 } : p));
    const band = [...rank("N", 2, {}, false), ...rank("F", 40, {}, true), ...rank("M", 4, { instrument: "mellophone", section: "mellophones" }, false), ...rank("G", 42, { instrument: "mellophone", section: "mellophones" }, true)];
    expect(check(band, "depth-support").detail).toMatch(
      sentence(String.raw`Trumpet: the 3 players farther from the listening point are ${DB} thinner each than distance explains; Mellophone: the 3 players farther from the listening point are ${DB} thinner each than distance explains \(tolerance 3\.0 dB; they need to play out, or face the box\)\.`),
    );
  });

  it("wide-form-edges joins two sections' failures with a semicolon", () => {
    const line = (prefix: string, y: number, over: Partial<PerformerInput>) =>
      [-25, -20, -2, 0, 2, 20, 25].map((x, k) => at({ id: `${prefix}${k}`, x, y, strengthDb: Math.abs(x) > 15 ? 6 : 0, ...over }));
    const band = [...line("T", 10, { section: "trumpets" }), ...line("M", 14, { instrument: "mellophone", section: "mellophones" })];
    expect(check(band, "wide-form-edges").detail).toMatch(
      sentence(String.raw`The form spans 55 yd: the 4 players of the trumpets at the ends are ${DB} louder each than their section's centre; the 4 players of the mellophones at the ends are ${DB} louder each than their section's centre \(tolerance 2\.0 dB\)\. The end players should back off\.`),
    );
  });

  it("heard-at-box joins masked voices with a semicolon, and asks no margin when the margin asked is 0", () => {
    const band = [
      ...row("T", 8, 10, { dynamic: "ff" }),
      ...row("F", 2, 14, { instrument: "flute", section: "flutes", voice: "countermelody", dynamic: "pp" }),
      ...row("C", 2, 16, { instrument: "clarinet", section: "clarinets", voice: "accompaniment", dynamic: "pp" }),
    ];
    expect(check(band, "heard-at-box", { heardMarginDb: 0 }).detail).toMatch(
      sentence(String.raw`Masked by the rest of the band: the countermelody \(flutes, ${DB} under its masked threshold\); the accompaniment \(clarinets, ${DB} under its masked threshold\)\.`),
    );
  });

  it("heard-at-box on the sweeps' path hears the background of its own listening point, not the first one's", () => {
    const flutes = row("F", 2, 10, { instrument: "flute", section: "flutes", dynamic: "mp" });
    const i: AnalysisInput = { performers: flutes, listeningPoints: [{ ...BOX, id: "quiet", background: { preset: "quiet-field" } }, { ...BOX, id: "crowd", background: { preset: "stadium-between-bands" } }] as AnalysisInput["listeningPoints"], conditions: AIR };
    const points = analyzeSet(i).points;
    const verdict = (n: number) => checkBalance(i, { ...points[n]!, loudness: undefined }).find((c) => c.id === "heard-at-box")!.status;
    expect([verdict(0), verdict(1)]).toEqual(["pass", "fail"]);
  });
});
