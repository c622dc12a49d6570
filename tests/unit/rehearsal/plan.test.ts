// The rehearsal plan's ordering, build-up and dynamics (our own rules: common practice, no source).
import { describe, expect, it } from "vitest";
import { buildRehearsalPlan, severityOf, type RehearsalItemInput, type SetAnalysis } from "@/lib/rehearsal/plan";

const pass = (id: any) => ({ id, passed: true, detail: "" });
const fail = (id: any) => ({ id, passed: false, detail: `${id} fails` });
const set = (n: string, checks: SetAnalysis["checks"], plan: SetAnalysis["plan"] = []): SetAnalysis => ({ setNumber: n, checks, plan, planUnmet: [] });

const sections: RehearsalItemInput["sections"] = [
  { section: "Tubas", voice: "bass", writtenDynamic: "f", playedDynamic: null },
  { section: "Trumpets", voice: "melody", writtenDynamic: "mf", playedDynamic: null },
  { section: "Snares", voice: "percussion", writtenDynamic: "mf", playedDynamic: null },
  { section: "Horns", voice: "countermelody", writtenDynamic: "mp", playedDynamic: "f" },
  { section: "Flutes", voice: "tacet", writtenDynamic: "p", playedDynamic: null },
  { section: "Clarinets", voice: "accompaniment", writtenDynamic: "p", playedDynamic: null },
];

describe("severityOf", () => {
  it("counts failed checks, dB of change (1/6 per dB) and unmet dB (1/3 per dB), per set", () => {
    const a = set("1", [fail("melody-forward"), fail("stand-outs"), pass("depth-support")], [{ section: "Trumpets", writtenDynamic: "mf", playedDynamic: "f", changeDb: 6 }]);
    expect(severityOf([a])).toBe(3);
    expect(severityOf([a, set("2", [pass("melody-forward")])])).toBe(1.5);
    expect(severityOf([{ ...a, planUnmet: [{ shortDb: 3, detail: "x" }] }])).toBe(4);
  });
});

describe("buildRehearsalPlan", () => {
  const items: RehearsalItemInput[] = [
    { kind: "phrase", name: "Calm", sets: [set("1", [pass("melody-forward")])], sections },
    { kind: "phrase", name: "Loud", sets: [set("5", [fail("melody-forward"), fail("bass-up-pyramid")], [{ section: "Trumpets", writtenDynamic: "mf", playedDynamic: "ff", changeDb: 8 }])], sections },
    { kind: "set", name: "Set 9", sets: [set("9", [fail("stand-outs")])], sections },
  ];
  const plan = buildRehearsalPlan(items);

  it("puts the worst balance first", () => {
    expect(plan.map((p) => p.name)).toEqual(["Loud", "Set 9", "Calm"]);
    expect(plan[0]!.failing.map((f) => f.id)).toEqual(["melody-forward", "bass-up-pyramid"]);
  });

  it("builds up melody → countermelody → accompaniment and bass → percussion, leaving tacet sections out", () => {
    expect(plan[0]!.buildUp).toEqual([
      { step: 1, title: "Melody alone", sections: ["Trumpets"] },
      { step: 2, title: "Add the countermelody", sections: ["Horns"] },
      { step: 3, title: "Add accompaniment and bass", sections: ["Clarinets", "Tubas"] },
      { step: 4, title: "Add percussion: full ensemble", sections: ["Snares"] },
    ]);
  });

  it("plays the adopted dynamic, else the proposed one, else what is written", () => {
    const d = Object.fromEntries(plan[0]!.dynamics.map((x) => [x.section, x]));
    expect(d.Horns).toMatchObject({ play: "f", source: "adopted" });
    expect(d.Trumpets).toMatchObject({ play: "ff", source: "proposed", changeDb: 8 });
    expect(d.Tubas).toMatchObject({ play: "f", source: "written" });
    expect(d.Flutes).toBeUndefined();
  });
});
