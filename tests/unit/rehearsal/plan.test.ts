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

describe("buildRehearsalPlan with the phrase's plan", () => {
  const row = (section: string, playedDynamic: any, why: string, who = section) => ({ section, who, why, writtenDynamic: "mf" as const, playedDynamic, changeDb: why ? 5 : 0 });
  const phrasePlan = {
    // The plan's rows come in score order: woodwinds, brass, battery.
    entries: [row("Clarinets", "f", "Clarinets: play f where p is written — clarinets carry poorly outdoors, and …"), row("Horns", "mp", ""), row("Trumpets", "mf", "", "Trumpets soloist (T1)"), row("Tubas", "f", ""), row("Snares", "mp", "Snares: play mp where mf is written — …")],
    unmet: ["The melody leads the percussion by only 1 dB at the Press box in set 5; the melody should lead every other voice by 3 dB."],
  };
  const [item] = buildRehearsalPlan([{ kind: "phrase", name: "Loud", sets: [set("5", [fail("melody-forward")], [{ section: "Trumpets", writtenDynamic: "mf", playedDynamic: "ff", changeDb: 8 }])], sections, plan: phrasePlan }]);

  it("lists the sections in the plan's score order, named and explained as on the music page, not by the worst set's own plan", () => {
    expect(item!.dynamics.map((d) => d.who)).toEqual(["Clarinets", "Horns", "Trumpets soloist (T1)", "Tubas", "Snares"]);
    const d = Object.fromEntries(item!.dynamics.map((x) => [x.section, x]));
    expect(d.Clarinets).toMatchObject({ play: "f", source: "proposed", why: phrasePlan.entries[0]!.why });
    expect(d.Trumpets).toMatchObject({ play: "mf", source: "written", why: "" });
    expect(d.Horns).toMatchObject({ play: "f", source: "adopted", why: "" });
    expect(item!.unmet).toEqual(phrasePlan.unmet);
  });
});

describe("buildRehearsalPlan with a soloist", () => {
  it("plays the soloist alone first, then adds the melody and the rest", () => {
    const solo = { section: "Trumpets", who: "Trumpets soloist (T1)", why: "", writtenDynamic: "mf" as const, playedDynamic: "mf" as const, changeDb: 0, solo: true };
    const [item] = buildRehearsalPlan([{ kind: "phrase", name: "Ballad", sets: [set("3", [pass("melody-forward")])], sections, plan: { entries: [solo], unmet: [] } }]);
    expect(item!.buildUp[0]).toEqual({ step: 1, title: "The soloist alone", sections: ["Trumpets soloist (T1)"] });
    expect(item!.buildUp[1]).toEqual({ step: 2, title: "Add the melody", sections: ["Trumpets"] });
    expect(item!.buildUp).toHaveLength(5);
  });
});
