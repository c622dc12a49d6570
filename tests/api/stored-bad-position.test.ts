// A position row that is no number, stored before the CHECK constraints of migration 0007 (a drill CSV
// with "0/0 steps" stored NaN): every reader leaves it out, so the performer counts as unplaced in
// that set and the show's analysis, hearing, compare, sweep, timeline, sheets, CSV, PDF and export
// answer 200, and the export imports back. The row is planted in a private copy of the demo show:
// in one transaction the constraint is dropped, the row written and the constraint put back NOT VALID
// (checked for new rows only), so no other suite ever sees the table unconstrained.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, type Client } from "../support/api";
import { appDatabase } from "../support/database";
import { privateShowCopy, uploadFile } from "../support/upload";

const CONSTRAINT = "positions_in_field_area";
const sql = appDatabase();
let copy: Awaited<ReturnType<typeof privateShowCopy>>;
let setId: string;
let badPerformerId: string;
let pointId: string;
let definition: string | null = null;

beforeAll(async () => {
  copy = await privateShowCopy();
  const show = (await copy.director.get(`/api/shows/${copy.showId}`)).body;
  setId = show.sets[1].id;
  pointId = show.listeningPoints[0].id;
  const set = (await copy.director.get(`/api/shows/${copy.showId}/sets/${setId}`)).body;
  badPerformerId = set.positions[0].performerId;
  await sql.begin(async (tx) => {
    const [row] = await tx`select pg_get_constraintdef(oid) as def from pg_constraint where conname = ${CONSTRAINT}`;
    definition = (row?.def as string | undefined) ?? null;
    await tx.unsafe(`alter table positions drop constraint if exists ${CONSTRAINT}`);
    await tx`update positions set x = 'NaN', y = 'Infinity' where set_id = ${setId} and performer_id = ${badPerformerId}`;
    if (definition) await tx.unsafe(`alter table positions add constraint ${CONSTRAINT} ${definition} not valid`);
  });
});

afterAll(async () => {
  await sql`delete from positions where set_id = ${setId} and performer_id = ${badPerformerId}`;
  if (definition) await sql.unsafe(`alter table positions validate constraint ${CONSTRAINT}`);
  await sql.end();
});

async function fetchStatus(client: Client, path: string) {
  const res = await fetch(APP_URL + path, { headers: { cookie: client.cookie! } });
  return { status: res.status, text: await res.text() };
}

describe("a stored position that is not a finite number", () => {
  it("is left out of the set: its performer is unplaced there", async () => {
    const res = await copy.director.get(`/api/shows/${copy.showId}/sets/${setId}`);
    expect(res.status).toBe(200);
    expect(res.body.positions.some((p: any) => p.performerId === badPerformerId)).toBe(false);
    expect(res.body.positions.length).toBeGreaterThan(0);
    for (const p of res.body.positions) expect([p.x, p.y, p.facingDeg].every(Number.isFinite)).toBe(true);
  });

  it("the set's analysis, hearing, compare, sweep and the show's timeline answer 200", async () => {
    const base = `/api/shows/${copy.showId}`;
    const analysis = await copy.director.get(`${base}/sets/${setId}/analysis?listeningPointId=${pointId}`);
    expect(analysis.status, JSON.stringify(analysis.body)).toBe(200);
    expect(analysis.body.mix.performers.some((p: any) => p.performerId === badPerformerId)).toBe(false);
    for (const path of [`${base}/sets/${setId}/hearing`, `${base}/compare?a=${setId}&listeningPointId=${pointId}`, `${base}/sweep?setId=${setId}&listeningPointId=${pointId}`, `${base}/timeline?listeningPointId=${pointId}`]) {
      const res = await copy.director.get(path);
      expect(res.status, `${path}: ${JSON.stringify(res.body).slice(0, 300)}`).toBe(200);
    }
  });

  it("the sheets, their CSV and PDF answer 200", async () => {
    const base = `/api/shows/${copy.showId}/sheets`;
    for (const path of [base, `${base}/drill.csv`, `${base}/roster.csv`, `${base}/pdf`]) {
      const res = await fetchStatus(copy.director, path);
      expect(res.status, `${path}: ${res.text.slice(0, 300)}`).toBe(200);
    }
  });

  it("the export answers 200 and imports back as a new show", async () => {
    const exported = await copy.director.get(`/api/shows/${copy.showId}/export`);
    expect(exported.status, JSON.stringify(exported.body).slice(0, 300)).toBe(200);
    const imported = await uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "show.json", content: JSON.stringify(exported.body), type: "application/json" });
    expect(imported.status, JSON.stringify(imported.body).slice(0, 300)).toBe(201);
  });

  it("duplicating the set copies every other position (the copy is checked by the constraint)", async () => {
    const res = await copy.director.post(`/api/shows/${copy.showId}/sets`, { duplicateOf: setId });
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  });

  it("a drill CSV uploaded against the set previews (the set's stored positions are read too)", async () => {
    const res = await uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: "d.csv", content: "set,counts,label,x_m,y_m\n95,8,T1,1,2\n" }, { kind: "drill" });
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
  });
});
