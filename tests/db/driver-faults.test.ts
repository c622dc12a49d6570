// The database driver after a killed connection: a connection closed while rows were arriving must not
// garble the first result of the connection that replaces it. postgres 3.4.9 kept its row counter across
// the reconnect, so that result began with empty slots (a session lookup read "no session" and signed the
// user out); patches/postgres+3.4.9.patch resets it. On a private database, whose backends only this test
// kills.
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createDatabase } from "../support/database";

let db: Awaited<ReturnType<typeof createDatabase>>;
let client: postgres.Sql;
let killer: postgres.Sql;

beforeAll(async () => {
  db = await createDatabase("driver_faults");
  // One connection, so the query after the kill runs on the reconnected one; no array-type lookup on
  // connect, whose failure on a killed connection nothing could catch.
  client = postgres(db.url, { max: 1, backoff: () => 0.02, fetch_types: false, onnotice: () => {} });
  killer = postgres(db.url, { max: 1, onnotice: () => {} });
}, 60_000);

afterAll(async () => {
  await client?.end({ timeout: 1 });
  await killer?.end();
  await db?.drop();
});

/** The query's result once the killed connection has been replaced (its last errors are waited out). */
async function afterTheFault<T>(query: () => Promise<T>): Promise<T> {
  for (let i = 0; ; i++) {
    try {
      return await query();
    } catch (err) {
      if (i > 20) throw err;
      await new Promise((r) => setTimeout(r, 50));
    }
  }
}

describe("a connection killed while rows arrive", () => {
  it("leaves the next result whole", async () => {
    for (let attempt = 0; attempt < 3; attempt++) {
      const [{ pid }] = await client`select pg_backend_pid() as pid`;
      // Rows of 4 kB, a few milliseconds apart: the server sends them as its output buffer fills.
      const slow = client`select g, repeat('x', 4000) as pad, pg_sleep(0.005) from generate_series(1, 400) g`.then(
        () => "finished",
        (err: { code?: string }) => err.code,
      );
      await new Promise((r) => setTimeout(r, 300));
      await killer`select pg_terminate_backend(${pid})`;
      expect(await slow, "the kill ended the query midway").not.toBe("finished");
      const next = await afterTheFault(() => client`select ${attempt}::int as x`);
      expect(next.length).toBe(1);
      expect(next[0]).toEqual({ x: attempt });
    }
  }, 60_000);
});
