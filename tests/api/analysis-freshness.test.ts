// The analysis answer is served from what is stored (and from the app's kept copy) only while nothing it
// depends on has changed, whichever way the change arrives: here, writes made straight in PostgreSQL,
// behind the app's back, on a private copy of the demo show.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Client } from "../support/api";
import { appDatabase } from "../support/database";
import { copyDemoShow } from "../support/show-copy";

let copy: Awaited<ReturnType<typeof copyDemoShow>>;
let director: Client;
const sql = appDatabase();
let path = "";

beforeAll(async () => {
  copy = await copyDemoShow("freshness");
  director = copy.client;
  const set = copy.show.sets[4];
  path = `/api/shows/${copy.showId}/sets/${set.id}/analysis?listeningPointId=${copy.pressBoxId}`;
});

afterAll(async () => {
  await sql.end();
});

async function settled() {
  await director.get(path);
  const res = await director.get(path);
  expect(res.status).toBe(200);
  expect(res.body.reused).toBe(true);
  return res.body;
}

const levelOf = (body: any, performerId: string) => body.mix.performers.find((p: any) => p.performerId === performerId).dbA as number;
const loudestOf = (body: any) => [...body.mix.performers].sort((a: any, b: any) => b.dbA - a.dbA)[0].performerId as string;

describe("analysis freshness", () => {
  it("follows a performer's strength changed in the database", async () => {
    const before = await settled();
    const loudest = loudestOf(before);
    await sql`update performers set strength_db = strength_db - 6 where id = ${loudest}`;
    const after = await director.get(path);
    expect(after.body.reused).toBe(false);
    expect(levelOf(after.body, loudest)).toBeCloseTo(levelOf(before, loudest) - 6, 1); // level offsets add in dB
  });

  it("follows a position changed in the database", async () => {
    const before = await settled();
    const someone = loudestOf(before);
    await sql`update positions set y = y + 20 where performer_id = ${someone} and set_id = (select id from sets where show_id = ${copy.showId} order by "order" offset 4 limit 1)`;
    const after = await director.get(path);
    expect(after.body.reused).toBe(false);
    expect(levelOf(after.body, someone)).toBeLessThan(levelOf(before, someone));
  });

  it("follows the air conditions changed in the database", async () => {
    const before = await settled();
    await sql`update shows set relative_humidity_pct = 10, temperature_c = 35 where id = ${copy.showId}`;
    const after = await director.get(path);
    expect(after.body.reused).toBe(false);
    expect(after.body.mix.totalDbA).not.toBeCloseTo(before.mix.totalDbA, 2);
  });

  it("keeps serving the stored result after a write that changes no input", async () => {
    const before = await settled();
    await sql`update shows set name = name || ' (renamed)' where id = ${copy.showId}`; // moves the revision, not the inputs
    const after = await director.get(path);
    expect(after.body.reused).toBe(true);
    expect(after.body.computedAt).toBe(before.computedAt);
  });
});
