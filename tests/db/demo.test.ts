import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDemo, type LoadDemoResult } from "@/db/demo/load";
import { runMigrations } from "@/db/migrate";
import * as schema from "@/db/schema";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { verifyPassword } from "@/lib/auth/password";
import { createDatabase } from "../support/database";

const PASSWORD = "demo-test-password";
const TABLES = [
  "users", "programs", "memberships", "instrument_catalogs", "shows", "listening_points", "performers",
  "movements", "sets", "positions", "phrases", "voice_assignments", "performer_overrides",
] as const;

// Field 360 × 160 ft = 109.728 × 48.768 m (shared/REFERENCES.md, field geometry); the field area
// reaches 10 m beyond each sideline and end line (shared/API.md, PUT positions).
const HALF_LENGTH_M = 109.728 / 2;
const WIDTH_M = 48.768;
const MARGIN_M = 10;
// 40 yards = 36.576 m (1 yd = 0.9144 m exactly, international yard of 1959).
const FORTY_YARDS_M = 40 * 0.9144;
// The longest step a band marches on a move: 6 to 5, i.e. 5 yd in 6 steps = 0.762 m (common practice, no source).
const SIX_TO_FIVE_M = (5 * 0.9144) / 6;

function connect(url: string) {
  const client = postgres(url, { max: 2, onnotice: () => {} });
  return { client, db: drizzle(client, { schema }) };
}

async function rowCounts(sql: postgres.Sql) {
  const out: Record<string, number> = {};
  for (const t of TABLES) out[t] = Number((await sql.unsafe(`select count(*)::int as n from "${t}"`))[0]!.n);
  return out;
}

describe("demo data", () => {
  let database: Awaited<ReturnType<typeof createDatabase>>;
  let conn: ReturnType<typeof connect>;
  let first: LoadDemoResult;
  let showId: string;

  beforeAll(async () => {
    database = await createDatabase("demo_test");
    await runMigrations(database.url);
    conn = connect(database.url);
    first = await loadDemo(conn.db, { password: PASSWORD });
    const [show] = await conn.client`select id from shows where name = 'Lanterns on the Water'`;
    showId = show!.id;
  });
  afterAll(async () => {
    await conn?.client.end();
    await database?.drop();
  });

  it("loads once; a second load writes nothing and says so", async () => {
    expect(first.loaded).toBe(true);
    const before = await rowCounts(conn.client);
    if (first.loaded) {
      expect(before).toEqual({
        users: first.counts.users, programs: first.counts.programs, memberships: first.counts.memberships,
        instrument_catalogs: first.counts.instrumentCatalogs, shows: first.counts.shows, listening_points: first.counts.listeningPoints,
        performers: first.counts.performers, movements: first.counts.movements, sets: first.counts.sets,
        positions: first.counts.positions, phrases: first.counts.phrases, voice_assignments: first.counts.voiceAssignments,
        performer_overrides: first.counts.performerOverrides,
      });
    }
    const second = await loadDemo(conn.db, { password: PASSWORD });
    expect(second.loaded).toBe(false);
    expect(await rowCounts(conn.client)).toEqual(before);
  });

  it("two loaders started at once load the demo once", async () => {
    const other = await createDatabase("demo_test_race");
    try {
      await runMigrations(other.url);
      const a = connect(other.url);
      const b = connect(other.url);
      const results = await Promise.all([loadDemo(a.db, { password: PASSWORD }), loadDemo(b.db, { password: PASSWORD })]);
      expect(results.filter((r) => r.loaded)).toHaveLength(1);
      expect((await rowCounts(a.client)).programs).toBe(2);
      await Promise.all([a.client.end(), b.client.end()]);
    } finally {
      await other.drop();
    }
  });

  it("has the Harbor Ridge show at full size, with a dot for every performer in every set", async () => {
    const sql = conn.client;
    const [{ performers }] = await sql`select count(*)::int as performers from performers where show_id = ${showId}`;
    const [{ sets }] = await sql`select count(*)::int as sets from sets where show_id = ${showId}`;
    const [{ movements }] = await sql`select count(*)::int as movements from movements where show_id = ${showId}`;
    expect(performers).toBeGreaterThanOrEqual(65);
    expect(performers).toBeLessThanOrEqual(80);
    expect(sets).toBeGreaterThanOrEqual(12);
    expect(movements).toBe(3);
    // Every (set, performer) pair of the show has exactly one position (the primary key forbids two).
    const [{ missing }] = await sql`
      select count(*)::int as missing from sets s join performers p on p.show_id = s.show_id
      left join positions pos on pos.set_id = s.id and pos.performer_id = p.id
      where s.show_id = ${showId} and pos.set_id is null`;
    expect(missing).toBe(0);
    const [{ n }] = await sql`select count(*)::int as n from positions pos join sets s on s.id = pos.set_id where s.show_id = ${showId}`;
    expect(n).toBe(performers * sets);
    const lettered = await sql`select number from sets where show_id = ${showId} and number ~ '^[0-9]+[A-Z]$'`;
    expect(lettered.length).toBeGreaterThan(0);
  });

  it("keeps every position inside the field area, facing a valid direction", async () => {
    const [r] = await conn.client`
      select min(x) as min_x, max(x) as max_x, min(y) as min_y, max(y) as max_y,
             min(facing_deg) as min_f, max(facing_deg) as max_f from positions`;
    expect(r!.min_x).toBeGreaterThanOrEqual(-(HALF_LENGTH_M + MARGIN_M));
    expect(r!.max_x).toBeLessThanOrEqual(HALF_LENGTH_M + MARGIN_M);
    expect(r!.min_y).toBeGreaterThanOrEqual(-MARGIN_M);
    expect(r!.max_y).toBeLessThanOrEqual(WIDTH_M + MARGIN_M);
    expect(r!.min_f).toBeGreaterThanOrEqual(0);
    expect(r!.max_f).toBeLessThan(360);
  });

  it("has moves a band can march: no dot faster than a 6-to-5 step per count", async () => {
    const moves = await conn.client`
      select s.number, s.counts, max(sqrt(power(a.x - b.x, 2) + power(a.y - b.y, 2))) as longest
      from sets s
      join sets prev on prev.show_id = s.show_id and prev."order" = s."order" - 1
      join positions a on a.set_id = s.id
      join positions b on b.set_id = prev.id and b.performer_id = a.performer_id
      where s.show_id = ${showId} group by s.number, s.counts`;
    expect(moves.length).toBeGreaterThan(10);
    for (const m of moves) {
      expect(m.counts, `set ${m.number}`).toBeGreaterThan(0);
      expect(m.longest / m.counts, `set ${m.number}`).toBeLessThanOrEqual(SIX_TO_FIVE_M);
    }
  });

  it("has a form wider than 40 yards: a line of at least 20 dots on one y", async () => {
    const wide = await conn.client`
      select s.number, max(p.x) - min(p.x) as width from positions p join sets s on s.id = p.set_id
      where s.show_id = ${showId}
      group by s.number, round(p.y::numeric, 2) having count(*) >= 20`;
    expect(wide.some((w) => w.width > FORTY_YARDS_M)).toBe(true);
  });

  it("keeps the front ensemble in place in front of the front sideline", async () => {
    const [r] = await conn.client`
      select count(distinct (p.x, p.y))::int as spots, count(distinct p.performer_id)::int as players, max(p.y) as max_y
      from positions p join performers f on f.id = p.performer_id where f.show_id = ${showId} and f.section = 'Front Ensemble'`;
    expect(r!.players).toBeGreaterThan(0);
    expect(r!.spots).toBe(r!.players);
    expect(r!.max_y).toBeLessThanOrEqual(0);
  });

  it("uses only instruments of the default catalog, stored as the program's catalog version 1", async () => {
    const used = await conn.client`select distinct instrument from performers`;
    for (const u of used) expect(Object.keys(DEFAULT_INSTRUMENTS)).toContain(u.instrument);
    const catalogs = await conn.client`select version, instruments from instrument_catalogs`;
    expect(catalogs).toHaveLength(2);
    for (const c of catalogs) {
      expect(c.version).toBe(1);
      expect(c.instruments).toEqual(JSON.parse(JSON.stringify(DEFAULT_INSTRUMENTS)));
    }
    const [{ strong }] = await conn.client`select count(*)::int as strong from performers where show_id = ${showId} and strength_db >= 5`;
    expect(strong).toBeGreaterThanOrEqual(1);
  });

  it("has phrases that voice every section, including the clarinet melody p under a brass chorale written louder", async () => {
    const sql = conn.client;
    const phrases = await sql`
      select ph.id, ph.name, f."order" as first_order, l."order" as last_order from phrases ph
      join sets f on f.id = ph.first_set_id join sets l on l.id = ph.last_set_id where ph.show_id = ${showId} order by ph."order"`;
    expect(phrases.length).toBeGreaterThanOrEqual(6);
    for (const ph of phrases) expect(ph.first_order).toBeLessThanOrEqual(ph.last_order);
    const sections = (await sql`select distinct section from performers where show_id = ${showId}`).map((r) => r.section);
    const assigned = await sql`
      select va.phrase_id, va.section, va.voice, va.written_dynamic from voice_assignments va
      join phrases ph on ph.id = va.phrase_id where ph.show_id = ${showId}`;
    for (const ph of phrases) {
      const mine = assigned.filter((a) => a.phrase_id === ph.id);
      expect(mine.map((a) => a.section).sort(), ph.name).toEqual([...sections].sort());
    }
    const wanted: Record<string, [string, string]> = {
      Clarinets: ["melody", "p"],
      Trumpets: ["accompaniment", "p"],
      Mellophones: ["accompaniment", "mp"],
      Trombones: ["accompaniment", "mp"],
      Baritones: ["accompaniment", "mp"],
      Tubas: ["bass", "f"],
    };
    const matching = phrases.filter((ph) =>
      Object.entries(wanted).every(([section, [voice, dyn]]) =>
        assigned.some((a) => a.phrase_id === ph.id && a.section === section && a.voice === voice && a.written_dynamic === dyn),
      ),
    );
    expect(matching.length).toBeGreaterThanOrEqual(1);
    // Nobody else carries the melody there.
    const otherMelody = assigned.filter((a) => a.phrase_id === matching[0]!.id && a.voice === "melody" && a.section !== "Clarinets");
    expect(otherMelody).toEqual([]);
  });

  it("has a trumpet solo and a player laying out as per-performer overrides", async () => {
    const overrides = await conn.client`
      select o.voice, p.section from performer_overrides o join performers p on p.id = o.performer_id where p.show_id = ${showId}`;
    expect(overrides.some((o) => o.section === "Trumpets" && o.voice === "melody")).toBe(true);
    expect(overrides.some((o) => o.voice === "tacet")).toBe(true);
  });

  it("has the demo users with their roles and argon2id hashes of the password, and a separate second program", async () => {
    const members = await conn.client`
      select u.email, u.password_hash, m.role, p.name as program from memberships m
      join users u on u.id = m.user_id join programs p on p.id = m.program_id order by u.email`;
    const roleOf = (email: string) => members.filter((m) => m.email === email).map((m) => [m.program, m.role]);
    expect(roleOf("director@harbor-ridge.example")).toEqual([["Harbor Ridge High School Marching Band", "director"]]);
    expect(roleOf("designer@harbor-ridge.example")).toEqual([["Harbor Ridge High School Marching Band", "designer"]]);
    expect(roleOf("staff@harbor-ridge.example")).toEqual([["Harbor Ridge High School Marching Band", "staff"]]);
    expect(roleOf("director@westbrook.example")).toEqual([["Westbrook Academy Band", "director"]]);
    for (const m of members) {
      expect(m.password_hash.startsWith("$argon2id$")).toBe(true);
      expect(m.password_hash).not.toContain(PASSWORD);
      expect(await verifyPassword(m.password_hash, PASSWORD)).toBe(true);
    }
    const [west] = await conn.client`
      select count(distinct pf.id)::int as performers, count(distinct st.id)::int as sets from shows s
      join programs p on p.id = s.program_id join performers pf on pf.show_id = s.id join sets st on st.show_id = s.id
      where p.name = 'Westbrook Academy Band'`;
    expect(west!.performers).toBeGreaterThan(0);
    expect(west!.sets).toBe(2);
  });
});
