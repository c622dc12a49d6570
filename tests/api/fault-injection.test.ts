// All-or-nothing writes: the database connections are killed while a show import runs. Every attempt
// leaves either the whole show or none of it, never part of one. On a private cluster and app process,
// so the killed connections disturb no other suite.
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { copyDemoShow } from "../support/show-copy";
import { createCluster, startApp, type App, type Cluster } from "../support/stack";
import { signUp } from "../support/sign-up";

let cluster: Cluster;
let app: App;
let sql: postgres.Sql;
let file: string;
let copy: { client: Client; programId: string; show: { performers: unknown[]; sets: unknown[] } };

beforeAll(async () => {
  const demo = await copyDemoShow("fault");
  file = await (await fetch(`${APP_URL}/api/shows/${demo.showId}/export`, { headers: { cookie: demo.client.cookie! } })).text();
  cluster = await createCluster("fault-injection");
  app = await startApp(cluster.url);
  sql = postgres(cluster.url, { max: 1, onnotice: () => {} });
  const client = new Client(app.url);
  const up = await signUp(client, { name: "Fault Director", email: uniqueEmail("fault"), password: "fault-director-pass", programName: "Fault Band" });
  copy = { client, programId: up.body.programId, show: demo.show };
}, 120_000);

afterAll(async () => {
  await sql?.end();
  await app?.stop();
  cluster?.remove();
});

/** GET that waits out the errors of pooled connections the last fault killed. */
async function getOk(path: string) {
  for (let i = 0; ; i++) {
    const res = await copy.client.get(path);
    if (res.status < 500 || i > 30) {
      expect(res.status, `${path}: ${JSON.stringify(res.body)}`).toBe(200);
      return res;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Kills every connection of the app's database but this one. */
async function killAppConnections() {
  await sql`select pg_terminate_backend(pid) from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()`;
}

describe("a fault in the middle of an import", () => {
  it("leaves no partial show", async () => {
    const performers = copy.show.performers.length;
    const sets = copy.show.sets.length;
    let interrupted = 0;
    for (let attempt = 0; attempt < 16; attempt++) {
      const form = new FormData();
      form.set("file", new Blob([file], { type: "application/json" }), "show.json");
      form.set("name", `Fault attempt ${attempt}`);
      const importing = fetch(`${app.url}/api/programs/${copy.programId}/shows/import`, { method: "POST", body: form, headers: { cookie: copy.client.cookie! } });
      await new Promise((r) => setTimeout(r, (attempt % 8) * 6));
      await killAppConnections();
      const res = await importing;
      if (res.status !== 201) interrupted++;
      expect([201, 503, 500]).toContain(res.status);
    }
    // Every show of the program is whole: all its performers, all its sets, a position for each in each.
    const shows = await sql<{ id: string; performers: number; sets: number; positions: number }[]>`
      select s.id,
        (select count(*)::int from performers p where p.show_id = s.id) as performers,
        (select count(*)::int from sets t where t.show_id = s.id) as sets,
        (select count(*)::int from positions x join sets t on t.id = x.set_id where t.show_id = s.id) as positions
      from shows s where s.program_id = ${copy.programId}`;
    for (const s of shows) {
      expect(s.performers, s.id).toBe(performers);
      expect(s.sets, s.id).toBe(sets);
      expect(s.positions, s.id).toBe(performers * sets);
    }
    expect(interrupted, "the fault hit at least one import").toBeGreaterThan(0);
    // The app recovers by itself.
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await copy.client.get("/api/me")).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 200));
    }
    expect(status).toBe(200);
  }, 120_000);
});

describe("a fault in the middle of adopting a plan", () => {
  it("adopts every section's played dynamic or none", async () => {
    const form = new FormData();
    form.set("file", new Blob([file], { type: "application/json" }), "show.json");
    await getOk("/api/me");
    const res = await fetch(`${app.url}/api/programs/${copy.programId}/shows/import`, { method: "POST", body: form, headers: { cookie: copy.client.cookie! } });
    expect(res.status).toBe(201);
    const showId = (await res.json()).show.id as string;
    const show = (await getOk(`/api/shows/${showId}`)).body;
    const box = show.listeningPoints.find((l: any) => l.name === "Press box").id;
    const music = (await getOk(`/api/shows/${showId}/music`)).body;
    const phrase = music.phrases.find((p: any) => p.name === "Clarinet song");
    const playing = music.assignments.filter((a: any) => a.phraseId === phrase.id && a.voice !== "tacet");
    const sections = playing.map((a: any) => a.section);
    // A played dynamic equal to the written one is stored as null, so adopt only dynamics no section has written.
    const written = new Set(playing.map((a: any) => a.writtenDynamic));
    const choices = ["fff", "ff", "f", "mf"].filter((d) => !written.has(d)).slice(0, 2);
    expect(choices).toHaveLength(2);
    const path = `/api/shows/${showId}/phrases/${phrase.id}/plan`;
    let interrupted = 0;
    for (let attempt = 0; attempt < 16; attempt++) {
      await getOk("/api/me");
      await copy.client.call("DELETE", path).catch(() => undefined);
      const dynamic = choices[attempt % 2];
      const adopting = copy.client.post(path, { listeningPointId: box, entries: sections.map((section: string) => ({ section, playedDynamic: dynamic })) });
      await new Promise((r) => setTimeout(r, (attempt % 8) * 4));
      await killAppConnections();
      const answer = await adopting;
      if (answer.status !== 200) interrupted++;
      const rows = await sql<{ played: string | null }[]>`
        select played_dynamic as played from voice_assignments where phrase_id = ${phrase.id} and section in ${sql(sections)}`;
      const adopted = rows.filter((r) => r.played === dynamic).length;
      expect([0, sections.length], `attempt ${attempt}: ${adopted} of ${sections.length} sections adopted`).toContain(adopted);
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(interrupted, "the fault hit at least one adoption").toBeGreaterThan(0);
  }, 120_000);
});
