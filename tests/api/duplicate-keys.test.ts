// Bodies that list entries keyed by an id name each key once: a key listed twice is a 400 that
// names it (the single upsert behind each route cannot touch one row twice), and nothing is written.
import { beforeAll, describe, expect, it } from "vitest";
import { demoIds } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  ids = await demoIds();
});

describe("a key listed twice in one body", () => {
  it("PUT positions with one performer twice answers 400 naming the performer and keeps the set", async () => {
    const setId = ids.setIds[0]!;
    const before = (await ids.director.get(`/api/shows/${ids.showId}/sets/${setId}`)).body;
    const performerId = before.positions[0].performerId as string;
    const res = await ids.director.put(`/api/shows/${ids.showId}/sets/${setId}/positions`, {
      version: before.set.version,
      positions: [
        { performerId, x: 1, y: 10, facingDeg: 0 },
        { performerId, x: 2, y: 12, facingDeg: 90 },
      ],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(res.body.issues["positions.1"]).toEqual([expect.stringContaining(performerId)]);
    const after = (await ids.director.get(`/api/shows/${ids.showId}/sets/${setId}`)).body;
    expect(after.set.version).toBe(before.set.version);
    expect(after.positions).toEqual(before.positions);
  });

  it("PUT overrides with one phrase and performer twice answers 400 naming the performer", async () => {
    const music = (await ids.director.get(`/api/shows/${ids.showId}/music`)).body;
    const phraseId = music.phrases[0].id as string;
    const performerId = ids.show.performers[0].id as string;
    const override = { phraseId, performerId, voice: "melody", writtenDynamic: "f" };
    const res = await ids.director.put(`/api/shows/${ids.showId}/music/overrides`, { overrides: [override, { ...override, voice: "tacet" }] });
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(res.body.issues["overrides.1"]).toEqual([expect.stringContaining(performerId)]);
  });

  it("PATCH assignments with one phrase and section twice answers 400 naming the section", async () => {
    const music = (await ids.director.get(`/api/shows/${ids.showId}/music`)).body;
    const row = { phraseId: music.assignments[0].phraseId as string, section: music.assignments[0].section as string };
    const res = await ids.director.call("PATCH", `/api/shows/${ids.showId}/music/assignments`, { rows: [row, row], voice: "melody" });
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(res.body.issues["rows.1"]).toEqual([expect.stringContaining(row.section)]);
  });
});
