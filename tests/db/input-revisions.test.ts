// The input revisions of migration 0005: every write to an input of a stored analysis moves the show's or
// the set's counter, and writes that are not inputs leave them alone, on a private database with raw SQL,
// so no application path is involved.
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runMigrations } from "@/db/migrate";
import { createDatabase } from "../support/database";

let db: Awaited<ReturnType<typeof createDatabase>>;
let sql: postgres.Sql;
const ids: Record<string, string> = {};

beforeAll(async () => {
  db = await createDatabase("input_revisions");
  await runMigrations(db.url);
  sql = postgres(db.url, { max: 1, onnotice: () => {} });
  const one = async (q: Promise<postgres.RowList<postgres.Row[]>>) => (await q)[0]!.id as string;
  ids.program = await one(sql`insert into programs (name) values ('Revision Band') returning id`);
  ids.otherProgram = await one(sql`insert into programs (name) values ('Other Band') returning id`);
  ids.show = await one(sql`insert into shows (program_id, name) values (${ids.program}, 'Revision Show') returning id`);
  ids.otherShow = await one(sql`insert into shows (program_id, name) values (${ids.otherProgram}, 'Other Show') returning id`);
  ids.setA = await one(sql`insert into sets (show_id, number, counts, "order") values (${ids.show}, '1', 0, 0) returning id`);
  ids.setB = await one(sql`insert into sets (show_id, number, counts, "order") values (${ids.show}, '2', 16, 1) returning id`);
  ids.performer = await one(sql`insert into performers (show_id, label, instrument, section) values (${ids.show}, 'T1', 'trumpet', 'Trumpets') returning id`);
  ids.point = await one(sql`insert into listening_points (show_id, name, x, y, z) values (${ids.show}, 'Press box', 0, -25, 18) returning id`);
  ids.phrase = await one(sql`insert into phrases (show_id, name, "order", first_set_id, last_set_id) values (${ids.show}, 'Opener', 0, ${ids.setA}, ${ids.setB}) returning id`);
}, 60_000);

afterAll(async () => {
  await sql?.end();
  await db?.drop();
});

async function revisions() {
  const [row] = await sql`
    select (select inputs_revision from shows where id = ${ids.show})::int as show,
           (select inputs_revision from shows where id = ${ids.otherShow})::int as "otherShow",
           (select inputs_revision from sets where id = ${ids.setA})::int as "setA",
           (select inputs_revision from sets where id = ${ids.setB})::int as "setB"`;
  return row as { show: number; otherShow: number; setA: number; setB: number };
}

/** Runs `write` and answers which counters moved. */
async function moved(write: () => Promise<unknown>) {
  const before = await revisions();
  await write();
  const after = await revisions();
  return Object.fromEntries(Object.entries(after).map(([k, v]) => [k, v !== before[k as keyof typeof before]]));
}

const showOnly = { show: true, otherShow: false, setA: false, setB: false };
const nothing = { show: false, otherShow: false, setA: false, setB: false };

describe("show-wide inputs move the show's revision", () => {
  const cases: [string, () => Promise<unknown>][] = [
    ["the show's conditions", () => sql`update shows set temperature_c = 31 where id = ${ids.show}`],
    ["the show's targets", () => sql`update shows set check_targets = '{"standOutDb": 4}' where id = ${ids.show}`],
    ["a new performer", () => sql`insert into performers (show_id, label, instrument, section) values (${ids.show}, 'T2', 'trumpet', 'Trumpets')`],
    ["a performer's strength", () => sql`update performers set strength_db = 2 where id = ${ids.performer}`],
    ["a listening point moved", () => sql`update listening_points set z = 20 where id = ${ids.point}`],
    ["the ground around a listening point", () => sql`update listening_points set ground_factor = 0, surroundings_m = 20 where id = ${ids.point}`],
    ["the ground between the field and the listening points", () => sql`update shows set between_ground_factor = 0 where id = ${ids.show}`],
    ["a new phrase", () => sql`insert into phrases (show_id, name, "order", first_set_id, last_set_id) values (${ids.show}, 'Ballad', 1, ${ids.setB}, ${ids.setB})`],
    ["a voice assignment", () => sql`insert into voice_assignments (phrase_id, section, voice, written_dynamic) values (${ids.phrase}, 'Trumpets', 'melody', 'mf')`],
    ["a played dynamic adopted", () => sql`update voice_assignments set played_dynamic = 'f' where phrase_id = ${ids.phrase}`],
    ["a performer override", () => sql`insert into performer_overrides (phrase_id, performer_id, voice, written_dynamic) values (${ids.phrase}, ${ids.performer}, 'melody', 'f')`],
    ["an override removed", () => sql`delete from performer_overrides where phrase_id = ${ids.phrase}`],
    ["sets reordered", () => sql`update sets set "order" = "order" + 10 where show_id = ${ids.show}`],
  ];
  for (const [name, write] of cases) {
    it(name, async () => expect(await moved(write)).toEqual(showOnly));
  }

  it("a catalog version moves every show of its program and no other", async () => {
    const write = () => sql`insert into instrument_catalogs (program_id, version, instruments) values (${ids.program}, 2, '{}')`;
    expect(await moved(write)).toEqual(showOnly);
  });
});

describe("positions move their set's revision only", () => {
  it("placing, moving and removing a performer in set A", async () => {
    const place = () => sql`insert into positions (set_id, performer_id, x, y) values (${ids.setA}, ${ids.performer}, 0, 10)`;
    const move = () => sql`update positions set y = 30 where set_id = ${ids.setA}`;
    const remove = () => sql`delete from positions where set_id = ${ids.setA}`;
    for (const write of [place, move, remove]) expect(await moved(write)).toEqual({ ...nothing, setA: true });
  });

  it("a statement that writes many positions moves the revision once, not once a row", async () => {
    const [p] = await sql`insert into performers (show_id, label, instrument, section) values (${ids.show}, 'T3', 'trumpet', 'Trumpets') returning id`;
    const before = await revisions();
    await sql`insert into positions (set_id, performer_id, x, y) values (${ids.setB}, ${ids.performer}, 5, 5), (${ids.setB}, ${p!.id}, 6, 5)`;
    await sql`update positions set x = x + 1 where set_id = ${ids.setB}`;
    expect((await revisions()).setB - before.setB).toBe(2);
  });

  it("removing a performer from the roster moves the show and every set it stood in", async () => {
    const [p] = await sql`insert into performers (show_id, label, instrument, section) values (${ids.show}, 'C1', 'clarinet', 'Clarinets') returning id`;
    await sql`insert into positions (set_id, performer_id, x, y) values (${ids.setA}, ${p!.id}, 0, 10), (${ids.setB}, ${p!.id}, 0, 12)`;
    expect(await moved(() => sql`delete from performers where id = ${p!.id}`)).toEqual({ show: true, otherShow: false, setA: true, setB: true });
  });
});

describe("writes that are not inputs", () => {
  it("a set's version or counts leave the show's revision alone", async () => {
    expect(await moved(() => sql`update sets set version = version + 1, counts = 24 where id = ${ids.setB}`)).toEqual(nothing);
  });
});
