import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runMigrations } from "@/db/migrate";
import { createDatabase } from "../support/database";

describe("migrations", () => {
  let db: Awaited<ReturnType<typeof createDatabase>>;
  beforeAll(async () => {
    db = await createDatabase("migrations_test");
  });
  afterAll(async () => {
    await db.drop();
  });

  it("apply to an empty database and again without change", async () => {
    await runMigrations(db.url);
    await runMigrations(db.url); // a second run is a no-op
    const sql = postgres(db.url, { max: 1, onnotice: () => {} });
    const tables = await sql<{ table_name: string }[]>`
      select table_name from information_schema.tables where table_schema = 'public' order by table_name`;
    const names = tables.map((t) => t.table_name);
    for (const t of ["users", "sessions", "programs", "memberships", "shows", "listening_points", "instrument_catalogs", "performers", "movements", "sets", "positions", "phrases", "voice_assignments", "performer_overrides", "analyses", "sign_in_limits", "known_devices"]) {
      expect(names).toContain(t);
    }
    const roles = await sql<{ enumlabel: string }[]>`
      select e.enumlabel from pg_enum e join pg_type t on t.oid = e.enumtypid where t.typname = 'role' order by e.enumsortorder`;
    expect(roles.map((r) => r.enumlabel)).toEqual(["director", "designer", "staff"]);
    await sql.end();
  });

  it("store results as json, compressed with lz4 where the server has it", async () => {
    const sql = postgres(db.url, { max: 1, onnotice: () => {} });
    const [{ lz4 }] = await sql`select 'lz4' = any (enumvals) as lz4 from pg_settings where name = 'default_toast_compression'`;
    const columns = await sql`
      select c.relname, format_type(a.atttypid, a.atttypmod) as type, a.attcompression as compression
      from pg_attribute a join pg_class c on c.oid = a.attrelid
      where c.relname in ('analyses', 'balance_sweeps') and a.attname = 'result' order by c.relname`;
    expect(columns.map((c) => [c.relname, c.type, c.compression])).toEqual([
      ["analyses", "json", lz4 ? "l" : ""],
      ["balance_sweeps", "json", lz4 ? "l" : ""],
    ]);
    await sql.end();
  });
});
