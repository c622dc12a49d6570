// One request may not keep the server busy (lib/limits.ts, lib/heavy/pool.ts): whole-show work runs in
// worker threads, so /api/health keeps answering while a long timeline is computed; work past the
// limits is refused with 422; a show that is full refuses more performers and sets.
import { beforeAll, describe, expect, it } from "vitest";
import type { Client } from "../support/api";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
}, 60_000);

/** A show file of `performers` players (the demo's instruments) moving between random spots over sets of the given counts. */
function syntheticShow(name: string, performers: number, counts: number[], listeningPoints = 1, placed = true, phrasePerSet = false) {
  const demo = copy.original;
  const roster = Array.from({ length: performers }, (_, i) => {
    const model = demo.performers[i % demo.performers.length];
    return { ...model, label: `P${i + 1}`, name: null };
  });
  // A fixed pseudo-random walk (no Math.random), inside the field.
  let seed = 12345;
  const next = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  return JSON.stringify({
    ...demo,
    show: { ...demo.show, name },
    listeningPoints: Array.from({ length: listeningPoints }, (_, i) => ({ name: `Point ${i + 1}`, x: -20 + 10 * i, y: -25, z: 18, order: i + 1 })),
    performers: roster,
    movements: [],
    // With phrasePerSet, every set is a phrase of its own with every section voiced (the first carries the melody).
    phrases: phrasePerSet
      ? counts.map((_c, s) => ({
          name: `Phrase ${s + 1}`,
          firstSet: String(s + 1),
          lastSet: String(s + 1),
          voices: [...new Set(roster.map((p) => p.section))].map((section, i) => ({ section, voice: i === 0 ? "melody" : "accompaniment", writtenDynamic: "mf", playedDynamic: null })),
          overrides: [],
        }))
      : [],
    sets: counts.map((c, s) => ({
      number: String(s + 1),
      counts: c,
      movement: null,
      positions: (placed ? roster : []).map((p) => ({ label: p.label, x: -45 + 90 * next(), y: 2 + 44 * next(), facingDeg: 0 })),
    })),
  });
}

async function importShow(content: string) {
  const res = await uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "show.json", content, type: "application/json" });
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  const show = (await copy.director.get(`/api/shows/${res.body.show.id}`)).body;
  return { showId: show.show.id as string, pointId: show.listeningPoints[0].id as string, setIds: show.sets.map((s: any) => s.id as string) };
}

async function timed(client: Client, path: string) {
  const t0 = performance.now();
  const res = await client.get(path);
  return { res, ms: performance.now() - t0 };
}

describe("whole-show work runs off the request thread", () => {
  it("keeps /api/health answering while a long timeline is computed", async () => {
    // 150 players, four transitions of 999 counts, two listening points: about 1.2 million evaluations.
    const { showId, pointId } = await importShow(syntheticShow("Long transitions", 150, [0, 999, 999, 999, 999], 2));
    let done = false;
    const heavy = timed(copy.director, `/api/shows/${showId}/timeline?listeningPointId=${pointId}`).finally(() => (done = true));
    const health: number[] = [];
    const progress: { done: number; total: number }[] = [];
    while (!done) {
      const { res, ms } = await timed(copy.director, "/api/health");
      expect(res.status).toBe(200);
      health.push(ms);
      // The page waiting on it reads how far the work has got (issue on speed: progress past a second).
      const seen = await copy.director.get(`/api/shows/${showId}/work-progress`);
      expect(seen.status).toBe(200);
      if (seen.body.sweeps && !done) progress.push(seen.body.sweeps);
      await new Promise((r) => setTimeout(r, 25));
    }
    const { res, ms: heavyMs } = await heavy;
    expect(res.status).toBe(200);
    expect(res.body.samples.length).toBe(1 + 4 * 999);
    // Relative, so a busy machine does not make it flaky: with the work on the request thread each health
    // check waits for most of the computation; off it, health answers in a small part of it.
    expect(health.length).toBeGreaterThanOrEqual(3);
    expect(Math.max(...health)).toBeLessThan(heavyMs / 4);
    // Five sets to sweep (the first has no transition but is stored too), counted as they finish.
    expect(progress.length).toBeGreaterThan(0);
    expect(progress.every((p) => p.total === 5 && p.done >= 0 && p.done <= 5)).toBe(true);
    expect(progress.map((p) => p.done)).toEqual([...progress.map((p) => p.done)].sort((a, b) => a - b));
    expect(new Set(progress.map((p) => p.done)).size, "progress moved while the work ran").toBeGreaterThan(1);
    expect((await copy.director.get(`/api/shows/${showId}/work-progress`)).body.sweeps).toBeNull();
  }, 180_000);
});

describe("a rehearsal plan over many phrases", () => {
  it("says how many of its phrases are planned while it works", async () => {
    const { showId, pointId } = await importShow(syntheticShow("Many phrases", 150, Array.from({ length: 24 }, (_, i) => (i ? 16 : 0)), 1, true, true));
    const phraseIds = (await copy.director.get(`/api/shows/${showId}/music`)).body.phrases.map((p: { id: string }) => p.id);
    expect(phraseIds.length).toBe(24);
    let done = false;
    const building = copy.director.post(`/api/shows/${showId}/rehearsal-plan`, { phraseIds, setIds: [], listeningPointId: pointId }).finally(() => (done = true));
    const progress: { done: number; total: number }[] = [];
    while (!done) {
      const seen = await copy.director.get(`/api/shows/${showId}/work-progress`);
      expect(seen.status).toBe(200);
      if (seen.body.plans && !done) progress.push(seen.body.plans);
      await new Promise((r) => setTimeout(r, 20));
    }
    const built = await building;
    expect(built.status, JSON.stringify(built.body).slice(0, 300)).toBe(200);
    expect(built.body.items.length).toBe(24);
    expect(progress.length).toBeGreaterThan(0);
    expect(progress.every((p) => p.total === 24 && p.done >= 0 && p.done <= 24)).toBe(true);
    expect(progress.map((p) => p.done)).toEqual([...progress.map((p) => p.done)].sort((a, b) => a - b));
    expect((await copy.director.get(`/api/shows/${showId}/work-progress`)).body.plans).toBeNull();
  }, 180_000);
});

describe("limits", () => {
  it("refuses a timeline or a sweep past the work limit with 422, in words", async () => {
    // 250 players × about 5,000 counts × 2 points ≈ 2.5 million evaluations, past the 2 million one request may compute.
    const { showId, pointId, setIds } = await importShow(syntheticShow("Too much work", 250, [0, 999, 999, 999, 999, 999], 2));
    const timeline = await copy.director.get(`/api/shows/${showId}/timeline?listeningPointId=${pointId}`);
    expect(timeline.status).toBe(422);
    expect(timeline.body.error).toMatch(/too large to sweep as a whole/);
    const sweep = await copy.director.get(`/api/shows/${showId}/sweep?setId=${setIds[1]}&listeningPointId=${pointId}`);
    expect(sweep.status).toBe(422);
  }, 60_000);

  it("a show with 500 performers and 200 sets takes no more of either (422)", async () => {
    const { showId } = await importShow(syntheticShow("Full show", 500, Array.from({ length: 200 }, () => 0), 1, false));
    const demo = copy.original.performers[0];
    const more = await copy.director.post(`/api/shows/${showId}/performers`, { instrument: demo.instrument, count: 1 });
    expect(more.status).toBe(422);
    expect(more.body.error).toMatch(/at most 500 performers/);
    const set = await copy.director.post(`/api/shows/${showId}/sets`, {});
    expect(set.status).toBe(422);
    expect(set.body.error).toMatch(/at most 200 sets/);
    const csv = `label,instrument,section\nNEW1,${demo.instrument},${demo.section}\n`;
    const roster = await uploadFile(copy.director, `/api/shows/${showId}/imports`, { name: "roster.csv", content: csv }, { kind: "roster" });
    expect(roster.status).toBe(422);
    const show = (await copy.director.get(`/api/shows/${showId}`)).body;
    expect(show.performers).toHaveLength(500);
    expect(show.sets).toHaveLength(200);
  }, 60_000);
});
