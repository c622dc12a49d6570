// Proposing and adopting a phrase's balance plan, against a private copy of the demo in real PostgreSQL
// (other suites move the demo's performers); the role checks run on the demo itself.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";
import { copyDemoShow } from "../support/show-copy";

let ids: Awaited<ReturnType<typeof demoIds>>;
let copy: Awaited<ReturnType<typeof copyDemoShow>>;
let staff: Client;
let designer: Client;
let phraseId: string;
let copyPhraseId: string;
const planPath = () => `/api/shows/${ids.showId}/phrases/${phraseId}/plan`;
const copyPlanPath = () => `/api/shows/${copy.showId}/phrases/${copyPhraseId}/plan`;
const ORDER = ["pp", "p", "mp", "mf", "f", "ff", "fff"];

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
  const music = await ids.director.get(`/api/shows/${ids.showId}/music`);
  phraseId = music.body.phrases.find((p: any) => p.name === "Clarinet song").id;
  copy = await copyDemoShow("plan");
  const copyMusic = await copy.client.get(`/api/shows/${copy.showId}/music`);
  copyPhraseId = copyMusic.body.phrases.find((p: any) => p.name === "Clarinet song").id;
}, 60_000);

describe("phrase plan", () => {
  it("proposes, for the clarinet-melody phrase, clarinets above what is written within the phrase's four steps, and the melody forward in its first sets", async () => {
    const res = await copy.client.get(`${copyPlanPath()}?listeningPointId=${copy.pressBoxId}`);
    expect(res.status).toBe(200);
    expect(res.body.limits).toEqual({ windSteps: 4, percussionSteps: 1, keepShape: true });
    const clarinets = res.body.entries.find((e: any) => e.section === "Clarinets");
    expect(clarinets.writtenDynamic).toBe("p");
    expect(ORDER.indexOf(clarinets.playedDynamic)).toBeGreaterThan(1);
    expect(ORDER.indexOf(clarinets.playedDynamic)).toBeLessThanOrEqual(1 + 4);
    expect(res.body.sets.length).toBeGreaterThanOrEqual(2);
    for (const s of res.body.sets) expect(s.before.checks[0]).toMatchObject({ id: "melody-forward", passed: false });
    expect(res.body.sets[0].after.checks[0]).toMatchObject({ id: "melody-forward", passed: true });
  });

  it("lets only directors adopt: staff and designers get 403", async () => {
    const body = { listeningPointId: ids.pressBoxId, entries: [{ section: "Clarinets", playedDynamic: "f" }] };
    expect((await staff.post(planPath(), body)).status).toBe(403);
    expect((await designer.post(planPath(), body)).status).toBe(403);
  });

  it("answers 400 for a section that does not play in the phrase, and 404 to another program", async () => {
    const res = await ids.director.post(planPath(), { listeningPointId: ids.pressBoxId, entries: [{ section: "Flutes", playedDynamic: "f" }] });
    expect(res.status).toBe(400);
    expect(res.body.issues["entries.0.section"]).toBeTruthy();
    expect((await ids.other.get(`${planPath()}?listeningPointId=${ids.pressBoxId}`)).status).toBe(404);
  });

  it("adopting changes every set's mix as predicted, keeps the written dynamics, and can be undone", async () => {
    const proposal = (await copy.client.get(`${copyPlanPath()}?listeningPointId=${copy.pressBoxId}`)).body;
    const entries = proposal.entries.map((e: any) => ({ section: e.section, playedDynamic: e.playedDynamic }));
    const adopt = await copy.client.post(copyPlanPath(), { listeningPointId: copy.pressBoxId, entries });
    expect(adopt.status).toBe(200);

    for (const s of proposal.sets) {
      const a = await copy.client.get(`/api/shows/${copy.showId}/sets/${s.setId}/analysis?listeningPointId=${copy.pressBoxId}`);
      expect(a.body.reused).toBe(false);
      for (const [voice, v] of Object.entries<any>(s.after.voices)) expect(a.body.mix.voices[voice].dbA).toBeCloseTo(v.dbA, 6);
      for (const [section, v] of Object.entries<any>(s.after.sections)) {
        if (v.dbA !== null) expect(a.body.mix.sections[section].dbA).toBeCloseTo(v.dbA, 6);
      }
      expect(a.body.checks.map((c: any) => c.passed)).toEqual(s.after.checks.map((c: any) => c.passed));
      // The plan of an adopted set still starts from what is written.
      expect(a.body.plan.find((e: any) => e.section === "Clarinets").writtenDynamic).toBe("p");
    }

    const music = (await copy.client.get(`/api/shows/${copy.showId}/music`)).body;
    const row = music.assignments.find((a: any) => a.phraseId === copyPhraseId && a.section === "Clarinets");
    expect(row).toMatchObject({ writtenDynamic: "p", playedDynamic: entries.find((e: any) => e.section === "Clarinets").playedDynamic });

    expect((await copy.client.call("DELETE", copyPlanPath())).status).toBe(204);
    for (const s of proposal.sets) {
      const a = await copy.client.get(`/api/shows/${copy.showId}/sets/${s.setId}/analysis?listeningPointId=${copy.pressBoxId}`);
      expect(a.body.mix.voices.melody.dbA).toBeCloseTo(s.before.voices.melody.dbA, 6);
      // The music page's "Melody forward, set by set" speaks of loudness: the same sones as the set's analysis.
      expect(s.before.loudness.voices.melody.sone).toBeCloseTo(a.body.loudness.voices.melody.sone, 6);
      expect(s.before.loudness.voices.melody.phon).toBeCloseTo(a.body.loudness.voices.melody.phon, 6);
    }
  });
});
