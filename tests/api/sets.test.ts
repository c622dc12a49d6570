// GET set, PUT positions (versions, conflicts, validation) and the stored analysis, against real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let designer: Client;
const setPath = (i: number) => `/api/shows/${ids.showId}/sets/${ids.setIds[i]}`;

beforeAll(async () => {
  ids = await demoIds();
  designer = await signedIn(DEMO.designer);
});

describe("GET set", () => {
  it("answers the set and a position for each placed performer", async () => {
    const res = await designer.get(setPath(0));
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.set).sort()).toEqual(["counts", "id", "number", "version"]);
    expect(res.body.positions.length).toBeGreaterThan(50);
    for (const p of res.body.positions) {
      expect(Object.keys(p).sort()).toEqual(["facingDeg", "performerId", "x", "y"]);
    }
  });
});

describe("PUT positions", () => {
  it("saves, answers the new version, and keeps unlisted performers where they were", async () => {
    const before = (await designer.get(setPath(2))).body;
    const [moved, kept] = before.positions;
    const res = await designer.put(`${setPath(2)}/positions`, { version: before.set.version, positions: [{ ...moved, x: moved.x + 1.5, facingDeg: 450 }] });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(before.set.version + 1);
    const after = (await designer.get(setPath(2))).body;
    const m = after.positions.find((p: any) => p.performerId === moved.performerId);
    expect(m.x).toBeCloseTo(moved.x + 1.5, 9);
    expect(m.facingDeg).toBeCloseTo(90, 9); // 450° is stored as 90°
    expect(after.positions.find((p: any) => p.performerId === kept.performerId)).toEqual(kept);
  });

  it("answers 409 with the current version when the version is stale, writing nothing", async () => {
    const before = (await designer.get(setPath(3))).body;
    const p = before.positions[0];
    expect((await designer.put(`${setPath(3)}/positions`, { version: before.set.version, positions: [{ ...p, y: p.y + 1 }] })).status).toBe(200);
    const stale = await designer.put(`${setPath(3)}/positions`, { version: before.set.version, positions: [{ ...p, y: p.y + 5 }] });
    expect(stale.status).toBe(409);
    expect(stale.body.currentVersion).toBe(before.set.version + 1);
    const after = (await designer.get(setPath(3))).body;
    expect(after.positions.find((q: any) => q.performerId === p.performerId).y).toBeCloseTo(p.y + 1, 9);
  });

  it("answers 400 for positions off the field area or not finite, writing nothing", async () => {
    const before = (await designer.get(setPath(4))).body;
    const p = before.positions[0];
    const bad = [
      { ...p, x: 70 }, // 60 yd + 10 m is 64.86 m
      { ...p, y: -10.5 },
      { ...p, y: 59 },
      { ...p, x: "12" },
      { ...p, facingDeg: null },
    ];
    for (const q of bad) {
      const res = await designer.put(`${setPath(4)}/positions`, { version: before.set.version, positions: [q] });
      expect(res.status, JSON.stringify(q)).toBe(400);
      expect(res.body.issues, JSON.stringify(q)).toBeTruthy();
    }
    // 1e999 parses to Infinity in JSON.
    const inf = await designer.call("PUT", `${setPath(4)}/positions`, undefined, {
      headers: { "content-type": "application/json" },
      raw: `{"version":${before.set.version},"positions":[{"performerId":"${p.performerId}","x":1e999,"y":1,"facingDeg":0}]}`,
    });
    expect(inf.status).toBe(400);
    const after = (await designer.get(setPath(4))).body;
    expect(after.set.version).toBe(before.set.version);
    expect(after.positions).toEqual(before.positions);
  });

  it("answers 400 for malformed JSON, a missing version and a performer of another show", async () => {
    const before = (await designer.get(setPath(4))).body;
    expect((await designer.call("PUT", `${setPath(4)}/positions`, undefined, { headers: { "content-type": "application/json" }, raw: "{not json" })).status).toBe(400);
    expect((await designer.put(`${setPath(4)}/positions`, { positions: [] })).status).toBe(400);
    const foreign = await designer.put(`${setPath(4)}/positions`, {
      version: before.set.version,
      positions: [{ performerId: "00000000-0000-4000-8000-000000000001", x: 0, y: 10, facingDeg: 0 }],
    });
    expect(foreign.status).toBe(400);
    expect((await designer.get(setPath(4))).body.set.version).toBe(before.set.version);
  });

  it("answers 413 for an oversize body", async () => {
    const res = await designer.call("PUT", `${setPath(4)}/positions`, undefined, { headers: { "content-type": "application/json" }, raw: `{"version":1,"pad":"${"x".repeat(1_100_000)}"}` });
    expect(res.status).toBe(413);
    expect(typeof res.body.error).toBe("string");
  });
});

describe("analysis", () => {
  it("is stored once and reused while inputs are unchanged, recomputed after a change", async () => {
    const path = `${setPath(5)}/analysis?listeningPointId=${ids.pressBoxId}`;
    const first = await designer.get(path);
    expect(first.status).toBe(200);
    const second = await designer.get(path);
    expect(second.body.reused).toBe(true);
    expect(second.body.computedAt).toBe((first.body.reused ? first : second).body.computedAt);
    expect(second.body.mix).toEqual(first.body.mix);
    const mix = first.body.mix;
    expect(mix.totalDbA).toBeGreaterThan(40);
    expect(mix.performers.length).toBeGreaterThan(50);
    expect(Object.keys(mix.voices).length).toBeGreaterThan(0);

    // Move the loudest performer far back: its contribution falls and the mix is recomputed.
    const set = (await designer.get(setPath(5))).body;
    const loudest = [...mix.performers].sort((a: any, b: any) => b.dbA - a.dbA)[0];
    const pos = set.positions.find((p: any) => p.performerId === loudest.performerId);
    expect((await designer.put(`${setPath(5)}/positions`, { version: set.set.version, positions: [{ ...pos, y: 48 }] })).status).toBe(200);
    const third = await designer.get(path);
    expect(third.body.reused).toBe(false);
    const after = third.body.mix.performers.find((p: any) => p.performerId === loudest.performerId);
    expect(after.dbA).toBeLessThan(loudest.dbA);
  });

  it("answers 400 without a listening point and 404 for one of another show", async () => {
    expect((await designer.get(`${setPath(5)}/analysis`)).status).toBe(400);
    expect((await designer.get(`${setPath(5)}/analysis?listeningPointId=00000000-0000-4000-8000-000000000000`)).status).toBe(404);
  });
});
