// Set management for the field editor: add, duplicate, renumber, change counts, delete, take
// performers off a set. Against the running app and real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";
import { appDatabase } from "../support/database";

let ids: Awaited<ReturnType<typeof demoIds>>;
let designer: Client;
let staff: Client;
const base = () => `/api/shows/${ids.showId}/sets`;
const sets = async () => (await designer.get(`/api/shows/${ids.showId}`)).body.sets as { id: string; number: string; counts: number; order: number }[];

beforeAll(async () => {
  ids = await demoIds();
  designer = await signedIn(DEMO.designer);
  staff = await signedIn(DEMO.staff);
});

describe("POST sets", () => {
  it("adds an empty set at the end with the next number and 8 counts", async () => {
    const before = await sets();
    const res = await designer.post(base(), {});
    expect(res.status).toBe(201);
    const max = Math.max(...before.map((s) => Number.parseInt(s.number, 10)));
    expect(res.body.set).toMatchObject({ number: String(max + 1), counts: 8, version: 1 });
    const after = await sets();
    expect(after.at(-1)!.id).toBe(res.body.set.id);
    expect((await designer.get(`${base()}/${res.body.set.id}`)).body.positions).toEqual([]);
    // Added after the last set it also takes the next number (not "nA").
    const afterLast = await designer.post(base(), { after: res.body.set.id });
    expect(afterLast.body.set.number).toBe(String(max + 2));
    for (const id of [afterLast.body.set.id, res.body.set.id]) expect((await designer.call("DELETE", `${base()}/${id}?version=1`)).status).toBe(204);
  });

  it("duplicates a set right after it as nA, with its positions and counts, moving later sets down", async () => {
    const before = await sets();
    const source = before[2];
    const res = await designer.post(base(), { duplicateOf: source.id });
    expect(res.status).toBe(201);
    expect(res.body.set).toMatchObject({ number: `${source.number}A`, counts: source.counts });
    const after = await sets();
    expect(after.map((s) => s.id)).toEqual([...before.slice(0, 3).map((s) => s.id), res.body.set.id, ...before.slice(3).map((s) => s.id)]);
    const original = (await designer.get(`${base()}/${source.id}`)).body.positions;
    const copy = (await designer.get(`${base()}/${res.body.set.id}`)).body.positions;
    expect(copy).toEqual(original);
    expect((await designer.call("DELETE", `${base()}/${res.body.set.id}?version=1`)).status).toBe(204);
    expect((await sets()).map((s) => s.id)).toEqual(before.map((s) => s.id));
  });

  it("answers 409 for a number in use, 400 for a bad body or a set of another show, 403 for staff", async () => {
    const [first] = await sets();
    expect((await designer.post(base(), { number: first.number })).status).toBe(409);
    expect((await designer.post(base(), { number: "twelve" })).status).toBe(400);
    expect((await designer.post(base(), { counts: -1 })).status).toBe(400);
    expect((await designer.post(base(), { after: "00000000-0000-4000-8000-000000000009" })).status).toBe(400);
    expect((await staff.post(base(), {})).status).toBe(403);
    expect((await ids.other.post(base(), {})).status).toBe(404);
  });
});

describe("PATCH and DELETE a set", () => {
  it("renumbers and changes counts with the version, answering 409 when stale", async () => {
    const created = (await designer.post(base(), {})).body.set;
    const path = `${base()}/${created.id}`;
    const renamed = await designer.call("PATCH", path, { version: 1, number: `${created.number}b`, counts: 16 });
    expect(renamed.status).toBe(200);
    expect(renamed.body.set).toMatchObject({ number: `${created.number}B`, counts: 16, version: 2 });
    expect((await designer.get(path)).body.set).toMatchObject({ number: `${created.number}B`, counts: 16, version: 2 });
    const stale = await designer.call("PATCH", path, { version: 1, counts: 4 });
    expect(stale.status).toBe(409);
    expect(stale.body.currentVersion).toBe(2);
    expect((await designer.call("PATCH", path, { version: 2 })).status).toBe(400);
    expect((await designer.call("PATCH", path, { version: 2, number: (await sets())[0].number })).status).toBe(409);
    expect((await staff.call("PATCH", path, { version: 2, counts: 4 })).status).toBe(403);
    expect((await designer.call("DELETE", `${path}?version=1`)).status).toBe(409);
    expect((await staff.call("DELETE", `${path}?version=2`)).status).toBe(403);
    expect((await designer.call("DELETE", path)).status).toBe(400);
    expect((await designer.call("DELETE", `${path}?version=2`)).status).toBe(204);
    expect((await designer.get(path)).status).toBe(404);
  });

  it("keeps a phrase that starts on a deleted set (its start moves to the next set), and refuses to delete a phrase's only set", async () => {
    const n = 1000 + Math.floor(Math.random() * 8000);
    const a = (await designer.post(base(), { number: String(n) })).body.set;
    const b = (await designer.post(base(), { number: String(n + 1) })).body.set;
    const sql = appDatabase();
    try {
      const [spanning] = await sql`insert into phrases (show_id, name, "order", first_set_id, last_set_id)
        values (${ids.showId}, 'Test span', 900, ${a.id}, ${b.id}) returning id`;
      const [single] = await sql`insert into phrases (show_id, name, "order", first_set_id, last_set_id)
        values (${ids.showId}, 'Test single', 901, ${b.id}, ${b.id}) returning id`;
      expect((await designer.call("DELETE", `${base()}/${a.id}?version=1`)).status).toBe(204);
      const [moved] = await sql`select first_set_id, last_set_id from phrases where id = ${spanning.id}`;
      expect(moved).toEqual({ first_set_id: b.id, last_set_id: b.id });
      const refused = await designer.call("DELETE", `${base()}/${b.id}?version=1`);
      expect(refused.status).toBe(409);
      expect(refused.body.error).toContain("only set of the phrase");
      expect((await designer.get(`${base()}/${b.id}`)).body.set.version).toBe(1); // the refused delete wrote nothing
      await sql`delete from phrases where id in (${spanning.id}, ${single.id})`;
      expect((await designer.call("DELETE", `${base()}/${b.id}?version=1`)).status).toBe(204);
    } finally {
      await sql.end();
    }
  });
});

describe("POST positions/remove", () => {
  it("takes performers off the set (they stay on the roster), bumping the version; 409 when stale, 403 for staff", async () => {
    const copy = (await designer.post(base(), { duplicateOf: (await sets())[1].id })).body.set;
    const path = `${base()}/${copy.id}`;
    const before = (await designer.get(path)).body;
    const gone = before.positions.slice(0, 2).map((p: any) => p.performerId);
    expect((await staff.post(`${path}/positions/remove`, { version: 1, performerIds: gone })).status).toBe(403);
    const res = await designer.post(`${path}/positions/remove`, { version: 1, performerIds: gone });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(2);
    const after = (await designer.get(path)).body;
    expect(after.positions).toHaveLength(before.positions.length - 2);
    expect(after.positions.some((p: any) => gone.includes(p.performerId))).toBe(false);
    const roster = (await designer.get(`/api/shows/${ids.showId}`)).body.performers.map((p: any) => p.id);
    expect(roster).toEqual(expect.arrayContaining(gone));
    const stale = await designer.post(`${path}/positions/remove`, { version: 1, performerIds: gone });
    expect(stale.status).toBe(409);
    expect(stale.body.currentVersion).toBe(2);
    expect((await designer.post(`${path}/positions/remove`, { version: 2, performerIds: ["x"] })).status).toBe(400);
    expect((await designer.call("DELETE", `${path}?version=2`)).status).toBe(204);
  });
});
