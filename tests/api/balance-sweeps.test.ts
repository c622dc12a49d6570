// Transition sweeps, the show timeline and set compare through the API, against real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";
import { appDatabase } from "../support/database";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
let designer: Client;
const q = () => `listeningPointId=${ids.pressBoxId}`;
const setOf = (number: string) => ids.show.sets.find((s: any) => s.number === number);

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
});

describe("timeline", () => {
  it("covers every count of every set, ends each transition at the set's own mix, and is stored", async () => {
    const res = await staff.get(`/api/shows/${ids.showId}/timeline?${q()}`);
    expect(res.status).toBe(200);
    const t = res.body;
    expect(t.sets.map((s: any) => s.setId)).toEqual(ids.setIds);
    const totalCounts = ids.show.sets.slice(1).reduce((n: number, s: any) => n + s.counts, 0);
    expect(t.samples).toHaveLength(totalCounts + 1);
    for (let i = 1; i < t.samples.length; i++) expect(t.samples[i].showCount).toBe(t.samples[i - 1].showCount + 1);
    const seven = setOf("7");
    const last = t.samples.filter((s: any) => s.setId === seven.id).at(-1);
    expect(last.count).toBe(seven.counts);
    const analysis = await staff.get(`/api/shows/${ids.showId}/sets/${seven.id}/analysis?${q()}`);
    expect(last.voices.melody).toBeCloseTo(analysis.body.mix.voices.melody.dbA, 6);
    // Loudness in sones too (the timeline's "Loudness (sones)" option), as the set's analysis gives it.
    expect(last.voicesSone.melody).toBeCloseTo(analysis.body.loudness.voices.melody.sone, 6);
    expect(last.totalSone).toBeCloseTo(analysis.body.loudness.totalSone, 6);
    expect(last.failing).toEqual(analysis.body.checks.filter((c: any) => !c.passed).map((c: any) => c.id));
    const again = await staff.get(`/api/shows/${ids.showId}/timeline?${q()}`);
    expect(again.body.recomputed).toBe(0);
    expect(again.body.samples).toEqual(t.samples);
    const sql = appDatabase();
    const rows = await sql`select count(*)::int as n from balance_sweeps where set_id = any(${ids.setIds})`;
    await sql.end();
    expect(rows[0].n).toBe(ids.setIds.length * ids.show.listeningPoints.length);
  });

  it("recomputes only the moved set and the transition out of it after an edit", async () => {
    const set = setOf("4");
    const before = (await designer.get(`/api/shows/${ids.showId}/sets/${set.id}`)).body;
    await staff.get(`/api/shows/${ids.showId}/timeline?${q()}`);
    const p = before.positions[0];
    expect((await designer.put(`/api/shows/${ids.showId}/sets/${set.id}/positions`, { version: before.set.version, positions: [{ ...p, x: p.x + 2 }] })).status).toBe(200);
    const after = await staff.get(`/api/shows/${ids.showId}/timeline?${q()}`);
    expect(after.body.recomputed).toBe(2);
    const now = (await designer.get(`/api/shows/${ids.showId}/sets/${set.id}`)).body;
    await designer.put(`/api/shows/${ids.showId}/sets/${set.id}/positions`, { version: now.set.version, positions: [p] });
  });
});

describe("sweep and compare", () => {
  it("sweeps a transition count by count, the performers moving in straight lines", async () => {
    const seven = setOf("7");
    const res = await staff.get(`/api/shows/${ids.showId}/sweep?setId=${seven.id}&${q()}`);
    expect(res.status).toBe(200);
    expect(res.body.fromSet.number).toBe("6");
    expect(res.body.samples.map((s: any) => s.count)).toEqual(Array.from({ length: seven.counts }, (_, i) => i + 1));
    expect((await staff.get(`/api/shows/${ids.showId}/sweep?setId=nope&${q()}`)).status).toBe(400);
    expect((await ids.other.get(`/api/shows/${ids.showId}/sweep?setId=${seven.id}&${q()}`)).status).toBe(404);
  });

  it("compares a set with the next one by default; the changes are the differences of the two stored mixes", async () => {
    const a = setOf("6");
    const res = await staff.get(`/api/shows/${ids.showId}/compare?a=${a.id}&${q()}`);
    expect(res.status).toBe(200);
    expect(res.body.b.set.number).toBe("7");
    const [ma, mb] = [res.body.a, res.body.b].map((s: any) => s.mix);
    for (const v of res.body.changes.voices) {
      if (v.aDbA !== null && v.bDbA !== null) expect(v.changeDb).toBeCloseTo(mb.voices[v.voice].dbA - ma.voices[v.voice].dbA, 9);
      expect(v.flagged).toBe(v.changeDb === null || Math.abs(v.changeDb) > res.body.changes.setChangeDb);
    }
    // Each side carries its loudness per voice and per section, as its analysis answers it (the compare bars).
    for (const [side, setNumber] of [[res.body.a, "6"], [res.body.b, "7"]] as const) {
      const analysis = (await staff.get(`/api/shows/${ids.showId}/sets/${setOf(setNumber).id}/analysis?${q()}`)).body;
      expect(side.loudness).toEqual(analysis.loudness);
      expect(Object.keys(side.loudness.sections).length).toBeGreaterThan(3);
    }
    // Set 6 is the loud impact, set 7 the quiet clarinet song: the melody falls far more than 3 dB.
    expect(res.body.changes.voices.find((v: any) => v.voice === "melody").flagged).toBe(true);
    const last = ids.setIds.at(-1);
    expect((await staff.get(`/api/shows/${ids.showId}/compare?a=${last}&${q()}`)).status).toBe(404);
  });
});
