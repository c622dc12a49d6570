// Hostile bodies for every JSON write route and junk for every upload: always a 4xx JSON error, nothing written.
// Runs in a program of its own (a copy of the demo show imported from its export), so other tests cannot disturb the check.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, type Client } from "../support/api";
import { appDatabase } from "../support/database";
import { copyDemoShow } from "../support/show-copy";

const sql = appDatabase();
afterAll(() => sql.end());

let me: Client;
let programId: string;
let showId: string;
let setId: string;
let phraseId: string;

/** A digest of every row that belongs to the program, so any write shows up. */
async function fingerprint(): Promise<string> {
  const [row] = await sql<{ digest: string }[]>`
    with s as (select id from shows where program_id = ${programId})
    select md5(concat_ws('|',
      (select string_agg(t::text, ',' order by t::text) from shows t where t.program_id = ${programId}),
      (select string_agg(t::text, ',' order by t::text) from memberships t where t.program_id = ${programId}),
      (select string_agg(t::text, ',' order by t::text) from instrument_catalogs t where t.program_id = ${programId}),
      (select string_agg(t::text, ',' order by t::text) from invitations t where t.program_id = ${programId}),
      (select string_agg(t::text, ',' order by t::text) from performers t where t.show_id in (select id from s)),
      (select string_agg(t::text, ',' order by t::text) from sets t where t.show_id in (select id from s)),
      (select string_agg(t::text, ',' order by t::text) from listening_points t where t.show_id in (select id from s)),
      (select string_agg(t::text, ',' order by t::text) from positions t where t.set_id in (select id from sets where show_id in (select id from s))),
      (select string_agg(t::text, ',' order by t::text) from phrases t where t.show_id in (select id from s)),
      (select string_agg(t::text, ',' order by t::text) from voice_assignments t where t.phrase_id in (select id from phrases where show_id in (select id from s))),
      (select string_agg(t::text, ',' order by t::text) from performer_overrides t where t.phrase_id in (select id from phrases where show_id in (select id from s))),
      (select string_agg(t::text, ',' order by t::text) from box_readings t where t.show_id in (select id from s)),
      (select count(*)::text from uploads t where t.show_id in (select id from s))
    )) as digest`;
  return row!.digest;
}

beforeAll(async () => {
  const copy = await copyDemoShow("fuzz");
  me = copy.client;
  programId = copy.programId;
  showId = copy.showId;
  setId = copy.show.sets[1].id;
  phraseId = (await me.get(`/api/shows/${showId}/music`)).body.phrases[0].id;
}, 60_000);

const hostileValue = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: "small" },
    fc.constantFrom(null, true, false, 0, -1, 1e308, -1e308, 2 ** 53 + 1, "NaN", "Infinity", "-Infinity", "1e999", "", " ", "=cmd()", "'; drop table users; --", "\u0000", "\uD800", "👩🏽‍🎤", "ｆｕｌｌｗｉｄｔｈ"),
    fc.double(),
    fc.integer(),
    fc.string({ unit: "grapheme", maxLength: 30 }),
    fc.string({ minLength: 5_000, maxLength: 20_000 }),
    fc.array(tie("value"), { maxLength: 4 }),
    fc.dictionary(fc.string({ maxLength: 12 }), tie("value"), { maxKeys: 5 }),
  ),
})).value;

/** Bodies that look like the routes' own, with wrong types, extra fields and deep nesting mixed in.
 * An empty object is left out: it is a valid "add a set at the end", not hostile. */
const hostileBody = fc.oneof(
  hostileValue,
  fc.record({ version: hostileValue, positions: hostileValue, extra: hostileValue }),
  fc.record({ phraseId: hostileValue, sections: hostileValue, voice: hostileValue, writtenDynamic: hostileValue }),
  fc.record({ email: hostileValue, password: hostileValue, role: hostileValue, name: hostileValue }),
  fc.record({ number: hostileValue, counts: hostileValue, afterSetId: hostileValue, duplicateOf: hostileValue }),
  fc.nat({ max: 2000 }).map((depth) => JSON.parse("[".repeat(depth) + "]".repeat(depth))),
).filter((b) => !(b !== null && typeof b === "object" && !Array.isArray(b) && Object.keys(b).length === 0));

const jsonRoutes = () => [
  ["PUT", `/api/shows/${showId}/sets/${setId}/positions`],
  ["POST", `/api/shows/${showId}/sets/${setId}/positions/remove`],
  ["PATCH", `/api/shows/${showId}/sets/${setId}`],
  ["POST", `/api/shows/${showId}/sets`],
  ["POST", `/api/shows/${showId}/performers`],
  ["PATCH", `/api/shows/${showId}/music/assignments`],
  ["PUT", `/api/shows/${showId}/music/overrides`],
  ["DELETE", `/api/shows/${showId}/music/overrides`],
  ["POST", `/api/shows/${showId}/music/phrases`],
  ["PATCH", `/api/shows/${showId}/music/phrases/${phraseId}`],
  ["POST", `/api/shows/${showId}/phrases/${phraseId}/plan`],
  ["POST", `/api/shows/${showId}/readings`],
  ["POST", `/api/programs/${programId}/invitations`],
  ["POST", `/api/programs/${programId}/shows`],
  ["POST", `/api/programs/${programId}/catalog/adopt`],
  ["POST", `/api/programs/${programId}/catalog/restore`],
  ["POST", `/api/programs/${programId}/catalog/undo`],
  ["POST", "/api/auth/sign-up"],
  ["POST", "/api/auth/password-reset"],
];

describe("hostile JSON bodies", () => {
  it("are answered with a 4xx JSON error by every JSON write route, and nothing is written", async () => {
    const before = await fingerprint();
    for (const [method, path] of jsonRoutes()) {
      await fc.assert(
        fc.asyncProperty(hostileBody, async (body) => {
          const res = await me.call(method!, path!, body);
          expect(res.status, `${method} ${path} ${JSON.stringify(body)?.slice(0, 200)}`).toBeGreaterThanOrEqual(400);
          expect(res.status, `${method} ${path}`).toBeLessThan(500);
          expect(typeof res.body?.error, `${method} ${path}`).toBe("string");
        }),
        { numRuns: 12, seed: 20261201 },
      );
    }
    expect(await fingerprint()).toBe(before);
  }, 240_000);

  it("refuses malformed JSON text and wrong content on every JSON write route", async () => {
    const before = await fingerprint();
    for (const [method, path] of jsonRoutes()) {
      for (const raw of ["{", "[1,2", "\u00ff\u00fe", "null", '"just a string"', "{\"a\":1}".repeat(3)]) {
        const res = await me.call(method!, path!, undefined, { headers: { "content-type": "application/json" }, raw });
        expect(res.status, `${method} ${path} ${raw}`).toBeGreaterThanOrEqual(400);
        expect(res.status, `${method} ${path} ${raw}`).toBeLessThan(500);
      }
    }
    expect(await fingerprint()).toBe(before);
  }, 120_000);
});

describe("hostile uploads", () => {
  const uploadRoutes = () => [`/api/shows/${showId}/imports`, `/api/shows/${showId}/readings/upload`, `/api/programs/${programId}/shows/import`];

  it("answer binary junk and wrong encodings with 4xx JSON and write nothing, not even the kept original", async () => {
    const before = await fingerprint();
    // Junk always holds a NUL or a byte that is never UTF-8, so it can never pass for text.
    const junk = fc.oneof(
      fc.uint8Array({ minLength: 1, maxLength: 4000 }).map((b) => Uint8Array.from([0xff, 0x00, ...b])),
      fc.constant(new Uint8Array([0xff, 0xfe, 0x6c, 0x00, 0x61, 0x00, 0x62, 0x00])), // UTF-16 with a byte-order mark
      fc.constant(new Uint8Array([0x6c, 0x61, 0x62, 0x65, 0x6c, 0x0a, 0xe9, 0x0a])), // Latin-1 é
    );
    for (const path of uploadRoutes()) {
      await fc.assert(
        fc.asyncProperty(junk, fc.constantFrom("roster", "drill"), async (bytes, kind) => {
          const form = new FormData();
          form.set("kind", kind);
          form.set("file", new Blob([bytes]), "upload.csv");
          const res = await fetch(APP_URL + path, { method: "POST", body: form, headers: { cookie: me.cookie! } });
          const body = await res.json().catch(() => null);
          expect(res.status, path).toBeGreaterThanOrEqual(400);
          expect(res.status, path).toBeLessThan(500);
          expect(typeof body?.error, path).toBe("string");
        }),
        { numRuns: 8, seed: 7 },
      );
    }
    expect(await fingerprint()).toBe(before);
  }, 120_000);

  it("keeps formula-looking cells as text and escapes them when the roster is exported again", async () => {
    const csv = 'label,instrument,section,part,strength,name\nZ1,trumpet,Trumpets,1st,0,"=HYPERLINK(""http://x.example"",""go"")"\nZ2,trumpet,Trumpets,@SUM(A1),0,+cmd()\n';
    const form = new FormData();
    form.set("kind", "roster");
    form.set("file", new Blob([csv], { type: "text/csv" }), "roster.csv");
    const preview = await fetch(`${APP_URL}/api/shows/${showId}/imports`, { method: "POST", body: form, headers: { cookie: me.cookie! } });
    expect(preview.status).toBe(201);
    const { upload } = await preview.json();
    expect((await me.post(`/api/shows/${showId}/imports/${upload.id}/confirm`)).status).toBe(200);
    const exported = await (await fetch(`${APP_URL}/api/shows/${showId}/sheets/roster.csv`, { headers: { cookie: me.cookie! } })).text();
    const lines = exported.split(/\r?\n/);
    const z1 = lines.find((l) => l.startsWith("Z1,"))!;
    const z2 = lines.find((l) => l.startsWith("Z2,"))!;
    expect(z1).toContain(`'=HYPERLINK`);
    expect(z2).toContain("'@SUM(A1)");
    expect(z2).toContain("'+cmd()");
    // No exported cell starts with a formula character unescaped.
    for (const line of lines) for (const cell of line.split(",")) expect(cell.replace(/^"/, "")).not.toMatch(/^[=+@]/);
  });
});
