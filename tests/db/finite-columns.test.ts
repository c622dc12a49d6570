// Migration 0007: every float column a route or import fills has a range CHECK, which in PostgreSQL
// also refuses NaN (NaN = NaN, and NaN sorts above every number) and ±Infinity; and the migration
// first repairs rows stored before it, so it applies on a database that holds them.
import { cpSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { drizzle } from "drizzle-orm/postgres-js";
import { migrate } from "drizzle-orm/postgres-js/migrator";
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runMigrations } from "@/db/migrate";
import { FIELD_MARGIN_M, HALF_LENGTH_M, WIDTH_M } from "@/lib/validation/positions";
import { createDatabase } from "../support/database";

const MIGRATIONS = path.join(process.cwd(), "db/migrations");
const BEFORE = "0007_finite_numbers_in_range";
const CHECK_VIOLATION = "23514";

/** The committed migrations up to (not including) `tag`, in a folder of their own. */
function migrationsBefore(tag: string): string {
  const dir = path.join(process.cwd(), ".tmp", `migrations-before-${process.pid}`);
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  cpSync(MIGRATIONS, dir, { recursive: true });
  const journalFile = path.join(dir, "meta/_journal.json");
  const journal = JSON.parse(readFileSync(journalFile, "utf8"));
  const at = journal.entries.findIndex((e: { tag: string }) => e.tag === tag);
  expect(at).toBeGreaterThan(0);
  journal.entries = journal.entries.slice(0, at);
  writeFileSync(journalFile, JSON.stringify(journal));
  return dir;
}

describe("finite numbers in range (migration 0007)", () => {
  let db: Awaited<ReturnType<typeof createDatabase>>;
  let sql: postgres.Sql;
  let folder: string;
  const ids = { program: "", show: "", set: "", p1: "", p2: "", p3: "", p4: "", point: "", good: "", bad: "" };

  beforeAll(async () => {
    db = await createDatabase("finite_columns_test");
    folder = migrationsBefore(BEFORE);
    sql = postgres(db.url, { max: 1, onnotice: () => {} });
    await migrate(drizzle(sql), { migrationsFolder: folder });
    // Rows as a database could hold them before 0007.
    [{ id: ids.program }] = await sql`insert into programs (name) values ('P') returning id`;
    [{ id: ids.show }] = await sql`insert into shows (program_id, name, temperature_c, relative_humidity_pct, pressure_kpa, ground_factor)
      values (${ids.program}, 'S', 'NaN', 'Infinity', '-Infinity', 'NaN') returning id`;
    [{ id: ids.set }] = await sql`insert into sets (show_id, number, counts, "order") values (${ids.show}, '1', 0, 1) returning id`;
    const performer = async (label: string, strength: string) =>
      (await sql`insert into performers (show_id, label, instrument, section, strength_db) values (${ids.show}, ${label}, 'trumpet', 'Trumpets', ${strength}::float8) returning id`)[0]!.id as string;
    ids.p1 = await performer("T1", "NaN");
    ids.p2 = await performer("T2", "9");
    ids.p3 = await performer("T3", "-Infinity");
    ids.p4 = await performer("T4", "2");
    await sql`insert into positions (set_id, performer_id, x, y, facing_deg) values
      (${ids.set}, ${ids.p1}, 'NaN', 1, 0), (${ids.set}, ${ids.p2}, 1, 'Infinity', 0), (${ids.set}, ${ids.p3}, 100, -30, -90), (${ids.set}, ${ids.p4}, 2, 3, 'NaN')`;
    [{ id: ids.point }] = await sql`insert into listening_points (show_id, name, x, y, z) values (${ids.show}, 'Box', 'NaN', '-Infinity', 5000) returning id`;
    const reading = async (level: string) =>
      (await sql`insert into box_readings (show_id, set_id, listening_point_id, taken_at, temperature_c, relative_humidity_pct, sections, measured_db)
        values (${ids.show}, ${ids.set}, ${ids.point}, now(), 24, 55, '[]'::jsonb, ${level}::float8) returning id`)[0]!.id as string;
    ids.good = await reading("84");
    ids.bad = await reading("NaN");
    await sql.end();
    await runMigrations(db.url);
    sql = postgres(db.url, { max: 1, onnotice: () => {} });
  });

  afterAll(async () => {
    await sql.end();
    rmSync(folder, { recursive: true, force: true });
    await db.drop();
  });

  it("repairs what was stored before: NaN positions removed, the rest clamped, NaN settings neutral, a NaN reading removed", async () => {
    const positions = await sql`select performer_id, x, y, facing_deg from positions order by performer_id`;
    // Only T3's row had finite numbers: moved onto the edge of the field area, facing brought into [0, 360).
    expect(positions.map((p) => p.performer_id)).toEqual([ids.p3]);
    expect(positions[0]).toMatchObject({ x: HALF_LENGTH_M + FIELD_MARGIN_M, y: -FIELD_MARGIN_M, facing_deg: 270 });
    const [show] = await sql`select temperature_c, relative_humidity_pct, pressure_kpa, ground_factor from shows`;
    expect(show).toEqual({ temperature_c: 20, relative_humidity_pct: 100, pressure_kpa: 101.325, ground_factor: null });
    const strengths = await sql`select label, strength_db from performers order by label`;
    expect(strengths.map((p) => [p.label, p.strength_db])).toEqual([["T1", 0], ["T2", 6], ["T3", -6], ["T4", 2]]);
    const [point] = await sql`select x, y, z from listening_points`;
    expect(point).toEqual({ x: 0, y: -1000, z: 1000 });
    expect((await sql`select id from box_readings`).map((r) => r.id)).toEqual([ids.good]);
  });

  const refused = async (statement: () => Promise<unknown>) => {
    const err = await statement().then(() => null, (e: { code?: string }) => e);
    expect(err?.code).toBe(CHECK_VIOLATION);
  };

  it("refuses a NaN or infinite coordinate or facing written directly", async () => {
    for (const [x, y, f] of [["NaN", "1", "0"], ["1", "NaN", "0"], ["1", "1", "NaN"], ["Infinity", "1", "0"], ["1", "-Infinity", "0"]]) {
      await refused(() => sql`insert into positions (set_id, performer_id, x, y, facing_deg) values (${ids.set}, ${ids.p1}, ${x}::float8, ${y}::float8, ${f}::float8)`);
      await refused(() => sql`update positions set x = ${x}::float8, y = ${y}::float8, facing_deg = ${f}::float8 where performer_id = ${ids.p3}`);
    }
  });

  it("takes every position the API takes: the edges of the field area, facings in [0, 360)", async () => {
    const corners = [
      [-(HALF_LENGTH_M + FIELD_MARGIN_M), -FIELD_MARGIN_M, 0],
      [HALF_LENGTH_M + FIELD_MARGIN_M, WIDTH_M + FIELD_MARGIN_M, 359.999],
    ];
    for (const [x, y, f] of corners) await sql`update positions set x = ${x!}, y = ${y!}, facing_deg = ${f!} where performer_id = ${ids.p3}`;
    await refused(() => sql`update positions set facing_deg = 360 where performer_id = ${ids.p3}`);
  });

  it("refuses NaN and out-of-range values in listening points, strengths, show conditions and readings", async () => {
    await refused(() => sql`update listening_points set z = 'NaN'`);
    await refused(() => sql`update performers set strength_db = 'NaN' where id = ${ids.p1}`);
    await refused(() => sql`update performers set strength_db = 6.5 where id = ${ids.p1}`);
    for (const column of ["temperature_c", "relative_humidity_pct", "pressure_kpa", "ground_factor"]) {
      await refused(() => sql`update shows set ${sql(column)} = 'NaN'`);
    }
    await refused(() => sql`update box_readings set measured_db = 'Infinity'`);
    await refused(() => sql`update box_readings set meter_height_m = 'NaN'`);
    await sql`update box_readings set meter_height_m = null`;
  });
});
