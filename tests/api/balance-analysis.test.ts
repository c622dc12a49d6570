// The analysis endpoint's checks and plan (shared/API.md), against the demo in real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const setId = (number: string) => ids.show.sets.find((s: any) => s.number === number).id as string;
const analysisPath = (number: string) => `/api/shows/${ids.showId}/sets/${setId(number)}/analysis?listeningPointId=${ids.pressBoxId}`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});

describe("GET analysis: checks and plan", () => {
  it("answers shared/API.md's six checks in order, then the battery and heard-at-the-box checks, each with a status, a plain detail and the performers to look at", async () => {
    const res = await staff.get(analysisPath("7"));
    expect(res.status).toBe(200);
    expect(res.body.checks.map((c: any) => c.id)).toEqual(["melody-forward", "bass-up-pyramid", "depth-support", "wide-form-edges", "stand-outs", "arrival-spread", "battery-balance", "heard-at-box"]);
    // The demo catalog is from memory (5 dB an instrument): the total is that uncertain at most,
    // less as independent instruments average out, so it is shown to whole dB.
    expect(res.body.mix.uncertainty.totalDb).toBeGreaterThan(0);
    expect(res.body.mix.uncertainty.totalDb).toBeLessThanOrEqual(5 + 1e-9);
    expect(res.body.mix.uncertainty.precisionDb).toBe(1);
    const performerIds = new Set(ids.show.performers.map((p: any) => p.id));
    for (const c of res.body.checks) {
      // shared/API.md's four fields, and whether the verdict holds across the catalog's uncertainty.
      expect(Object.keys(c).sort()).toEqual(["applicable", "cases", "confidence", "detail", "id", "passed", "performerIds", "sameInCases", "status", "turnedBy"]);
      expect(c.status).toBe(!c.applicable ? "not-applicable" : c.passed ? "pass" : "fail");
      expect(c.confidence).toBe(c.sameInCases === c.cases ? "clear" : "borderline");
      expect(c.turnedBy).toHaveLength(c.cases - c.sameInCases);
      if (c.id === "arrival-spread") expect(c.confidence).toBe("clear"); // arrival times do not depend on levels
      expect(c.detail.length).toBeGreaterThan(10);
      for (const id of c.performerIds) expect(performerIds.has(id)).toBe(true);
      if (c.passed) expect(c.performerIds).toEqual([]);
    }
  });

  it("finds the demo's clarinet melody (written p under a brass chorale at mp) not forward, and plans the clarinets up (common practice, no source)", async () => {
    const res = await staff.get(analysisPath("7"));
    const melody = res.body.checks.find((c: any) => c.id === "melody-forward");
    expect(melody.passed).toBe(false);
    expect(melody.detail).toMatch(/under the accompaniment/);
    const clarinets = res.body.plan.find((e: any) => e.section === "Clarinets");
    expect(clarinets).toMatchObject({ writtenDynamic: "p" });
    const order = ["pp", "p", "mp", "mf", "f", "ff", "fff"];
    expect(order.indexOf(clarinets.playedDynamic)).toBeGreaterThan(order.indexOf("p"));
    expect(clarinets.changeDb).toBeGreaterThan(0);
    for (const e of res.body.plan) {
      expect(order).toContain(e.writtenDynamic);
      expect(order).toContain(e.playedDynamic);
      expect(Number.isFinite(e.changeDb)).toBe(true);
    }
  });

  it("stores checks and plan with the mix and reuses them while nothing changed", async () => {
    const first = await staff.get(analysisPath("3"));
    const second = await staff.get(analysisPath("3"));
    expect(second.body.reused).toBe(true);
    expect(second.body.computedAt).toBe(first.body.computedAt);
    expect(second.body.checks).toEqual(first.body.checks);
    expect(second.body.plan).toEqual(first.body.plan);
  });

  it("answers 404 to a member of another program", async () => {
    const res = await ids.other.get(analysisPath("7"));
    expect(res.status).toBe(404);
  });
});

// The analysis answer's loudness (ISO 532-1).
describe("GET analysis: loudness at the listening point", () => {
  it("answers the band's sones and phons and, for every voice in the mix, its sones, share and whether it is heard", async () => {
    const res = await staff.get(analysisPath("7"));
    expect(res.status).toBe(200);
    expect(res.body.modelVersion).toBe(MODEL_VERSION);
    const { loudness, mix } = res.body;
    expect(loudness.totalSone).toBeGreaterThan(0);
    expect(loudness.totalPhon).toBeGreaterThan(40);
    expect(loudness.backgroundSone).toBeGreaterThan(0); // the demo's press box hears the crowd
    expect(Object.keys(loudness.voices).sort()).toEqual(Object.keys(mix.voices).sort());
    for (const v of Object.values<any>(loudness.voices)) {
      expect(Object.keys(v).sort()).toEqual(["heard", "marginDb", "phon", "shareSone", "sone"]);
      expect(typeof v.heard).toBe("boolean");
      expect(v.shareSone).toBeGreaterThanOrEqual(0);
      expect(v.shareSone).toBeLessThanOrEqual(loudness.totalSone);
    }
    // Per section too (additive): every section that sounds, with its sones, phons, share and whether it is heard.
    const sounding = Object.entries<any>(mix.sections).filter(([, l]) => l.dbA !== null).map(([name]) => name);
    expect(Object.keys(loudness.sections).sort()).toEqual(sounding.sort());
    for (const s of Object.values<any>(loudness.sections)) {
      expect(Object.keys(s).sort()).toEqual(["heard", "marginDb", "phon", "shareSone", "sone"]);
      expect(s.sone).toBeGreaterThan(0);
      expect(s.shareSone).toBeLessThanOrEqual(loudness.totalSone);
    }
    // The existing fields stay as they were.
    expect(typeof mix.totalDbA).toBe("number");
    expect(res.body.checks).toHaveLength(8); // shared/API.md's six, then battery-balance and heard-at-box
  });
});
