// The balance plan's musical limits through the API: read by every member, set by directors for the show
// or one phrase, kept by every demo phrase's plan (common practice, no source).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";
import { copyDemoShow } from "../support/show-copy";

const ORDER = ["pp", "p", "mp", "mf", "f", "ff", "fff"];
const HARMONY = ["countermelody", "accompaniment", "bass"];
let ids: Awaited<ReturnType<typeof demoIds>>;
let copy: Awaited<ReturnType<typeof copyDemoShow>>;
let staff: Client;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  copy = await copyDemoShow("limits");
}, 60_000);

afterAll(async () => {
  await copy.client.put(`/api/shows/${copy.showId}/plan-limits`, { limits: null });
});

/** What the plan of a phrase breaks, in words (empty when it keeps every limit). */
function broken(plan: any, limits: { windSteps: number; percussionSteps: number; keepShape: boolean }): string[] {
  const out: string[] = [];
  const step = (e: any) => ORDER.indexOf(e.playedDynamic) - ORDER.indexOf(e.writtenDynamic);
  for (const e of plan.entries) {
    const max = e.kind === "winds" ? limits.windSteps : limits.percussionSteps;
    if (Math.abs(step(e)) > max) out.push(`${e.section} moves ${step(e)} steps`);
  }
  if (limits.keepShape) {
    for (const m of plan.entries.filter((e: any) => e.voice === "melody")) {
      for (const a of plan.entries.filter((e: any) => e.kind === m.kind && HARMONY.includes(e.voice))) {
        const gap = ORDER.indexOf(m.playedDynamic) - ORDER.indexOf(a.playedDynamic);
        if (gap < Math.min(0, ORDER.indexOf(m.writtenDynamic) - ORDER.indexOf(a.writtenDynamic))) out.push(`${m.section} under ${a.section}`);
      }
    }
  }
  if (plan.nothingToChange && plan.entries.some((e: any) => step(e) !== 0)) out.push("changes with nothing to change");
  return out;
}

describe("musical limits", () => {
  it("answers the defaults, the show's and each phrase's limits to every member", async () => {
    const res = await staff.get(`/api/shows/${ids.showId}/plan-limits`);
    expect(res.status).toBe(200);
    expect(res.body.defaults).toEqual({ windSteps: 2, percussionSteps: 1, keepShape: true });
    expect(res.body.canEdit).toBe(false);
    expect(res.body.phrases.find((p: any) => p.name === "Clarinet song").limits).toEqual({ windSteps: 4, percussionSteps: 1, keepShape: true });
    expect(res.body.phrases.find((p: any) => p.name === "Fanfare").limits).toEqual(res.body.defaults);
  });

  it("refuses a limit a director could not mean with 400, and a phrase of another show with 404", async () => {
    const bad = await ids.director.put(`/api/shows/${ids.showId}/plan-limits`, { limits: { windSteps: 9 } });
    expect(bad.status).toBe(400);
    expect(bad.body.issues["limits.windSteps"]).toBeTruthy();
    const half = await ids.director.put(`/api/shows/${ids.showId}/plan-limits`, { limits: { percussionSteps: 1.5 } });
    expect(half.status).toBe(400);
    const other = await ids.director.put(`/api/shows/${ids.showId}/plan-limits`, { phraseId: "00000000-0000-4000-8000-000000000000", limits: { windSteps: 1 } });
    expect(other.status).toBe(404);
  });

  it("no demo phrase gets a plan at the press box that breaks its limits; a phrase whose checks all pass gets nothing to change", async () => {
    const limits = (await ids.director.get(`/api/shows/${ids.showId}/plan-limits`)).body.phrases;
    for (const phrase of limits) {
      const plan = (await copy.client.get(`/api/shows/${copy.showId}/plan-limits`)).body.phrases.find((p: any) => p.name === phrase.name);
      const res = await copy.client.get(`/api/shows/${copy.showId}/phrases/${plan.id}/plan?listeningPointId=${copy.pressBoxId}`);
      expect(res.status).toBe(200);
      expect(res.body.limits).toEqual(phrase.limits);
      expect(broken(res.body, phrase.limits), phrase.name).toEqual([]);
      const allPass = res.body.sets.every((s: any) => s.before.checks.every((c: any) => c.passed));
      expect(res.body.nothingToChange, phrase.name).toBe(allPass);
    }
  });

  it("a director's show limit and phrase limit change the plan: one step for the show, the shape let go for a phrase", async () => {
    const base = `/api/shows/${copy.showId}`;
    // The clarinets' song: the one demo phrase whose plan moves winds by two steps and more.
    const song = (await copy.client.get(`${base}/plan-limits`)).body.phrases.find((p: any) => p.name === "Clarinet song");
    const planOf = async () => (await copy.client.get(`${base}/phrases/${song.id}/plan?listeningPointId=${copy.pressBoxId}`)).body;
    const own = song.custom;
    expect((await copy.client.put(`${base}/plan-limits`, { phraseId: song.id, limits: null })).status).toBe(200);
    const before = await planOf();
    expect(before.entries.some((e: any) => e.kind === "winds" && Math.abs(ORDER.indexOf(e.playedDynamic) - ORDER.indexOf(e.writtenDynamic)) === 2)).toBe(true);

    expect((await copy.client.put(`${base}/plan-limits`, { limits: { windSteps: 1 } })).status).toBe(200);
    const tight = await planOf();
    expect(tight.limits).toEqual({ windSteps: 1, percussionSteps: 1, keepShape: true });
    expect(broken(tight, tight.limits)).toEqual([]);

    expect((await copy.client.put(`${base}/plan-limits`, { phraseId: song.id, limits: { windSteps: 6, keepShape: false } })).status).toBe(200);
    expect((await planOf()).limits).toEqual({ windSteps: 6, percussionSteps: 1, keepShape: false });
    expect((await copy.client.put(`${base}/plan-limits`, { phraseId: song.id, limits: null })).status).toBe(200);
    expect((await copy.client.put(`${base}/plan-limits`, { limits: null })).status).toBe(200);
    expect((await planOf()).entries).toEqual(before.entries);
    expect((await copy.client.put(`${base}/plan-limits`, { phraseId: song.id, limits: own })).status).toBe(200);
  });
});
