// Sign-up, sign-in, sign-out and the session cookie, against the running app and its PostgreSQL.
import { readFileSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";
import { createHash } from "node:crypto";
import { APP_URL, Client, DEMO, demoIds, signedIn, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { signUp } from "../support/sign-up";

const sql = appDatabase();
afterAll(() => sql.end());

describe("session", () => {
  it("signs up: the new user directs a new program of their own", async () => {
    const c = new Client();
    const email = uniqueEmail("signup");
    const res = await signUp(c, { name: "Riley Okafor", email, password: "long-enough-pass", programName: "Test Valley Band" });
    expect(res.status).toBe(201);
    const me = await c.get("/api/me");
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
    expect(me.body.memberships).toEqual([{ programId: res.body.programId, programName: "Test Valley Band", role: "director" }]);
  });

  it("signs in with the demo director and answers /api/me per the contract", async () => {
    const c = await signedIn(DEMO.director);
    const me = await c.get("/api/me");
    expect(me.status).toBe(200);
    expect(Object.keys(me.body.user).sort()).toEqual(["email", "id", "name"]);
    expect(me.body.memberships.some((m: any) => m.role === "director" && m.programName.startsWith("Harbor Ridge"))).toBe(true);
  });

  it("answers 401 with one message for a wrong password and an unknown e-mail", async () => {
    const wrong = await new Client().post("/api/auth/sign-in", { email: DEMO.staff, password: "not-the-password" });
    const unknown = await new Client().post("/api/auth/sign-in", { email: uniqueEmail("nobody"), password: "whatever-it-is" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error).toBe(unknown.body.error);
  });

  it("sets an httpOnly SameSite cookie and ends the session on sign-out", async () => {
    const c = new Client();
    const res = await c.post("/api/auth/sign-in", { email: DEMO.designer, password: process.env.DEMO_PASSWORD ?? "farfield-demo" });
    const setCookie = res.headers.get("set-cookie") ?? "";
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    const cookie = c.cookie!;
    expect((await c.post("/api/auth/sign-out")).status).toBe(204);
    const stale = new Client();
    stale.cookie = cookie;
    expect((await stale.get("/api/me")).status).toBe(401);
  });

  it("rotates the session on sign-in: the old token stops working", async () => {
    const c = await signedIn(DEMO.staff);
    const first = c.cookie!;
    await c.post("/api/auth/sign-in", { email: DEMO.staff, password: process.env.DEMO_PASSWORD ?? "farfield-demo" });
    expect(c.cookie).not.toBe(first);
    const old = new Client();
    old.cookie = first;
    expect((await old.get("/api/me")).status).toBe(401);
    expect((await c.get("/api/me")).status).toBe(200);
  });

  it("stores sessions hashed and passwords as argon2id, never in clear, nor in the log", async () => {
    const email = uniqueEmail("hash");
    const password = "clear-text-sentinel-4711";
    const c = new Client();
    await signUp(c, { name: "Hash Check", email, password, programName: "Hash Band" });
    const [user] = await sql<{ id: string; password_hash: string }[]>`select id, password_hash from users where email = ${email}`;
    expect(user!.password_hash.startsWith("$argon2id$")).toBe(true);
    expect(user!.password_hash).not.toContain(password);
    const token = decodeURIComponent(c.cookie!.split("=")[1]!);
    const sessions = await sql<{ id: string }[]>`select id from sessions where user_id = ${user!.id}`;
    expect(sessions.length).toBe(1);
    expect(sessions[0]!.id).not.toBe(token);
    expect(sessions[0]!.id).toMatch(/^[0-9a-f]{64}$/);
    const dump = await sql`select * from users where email = ${email}`;
    expect(JSON.stringify(dump)).not.toContain(password);
    if (process.env.APP_LOG) expect(readFileSync(process.env.APP_LOG, "utf8")).not.toContain(password);
  });

  it("limits failed sign-ins per account with 429, counted in PostgreSQL", async () => {
    const email = uniqueEmail("limit");
    const c = new Client();
    await signUp(c, { name: "Limit Check", email, password: "the-right-password", programName: "Limit Band" });
    const statuses: number[] = [];
    for (let i = 0; i < 10; i++) statuses.push((await new Client().post("/api/auth/sign-in", { email, password: `wrong-${i}` })).status);
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5)).toEqual([429, 429, 429, 429, 429]);
    // Even the right password must wait while the account is slowed down (from a browser it never signed in from).
    const waiting = await new Client().post("/api/auth/sign-in", { email, password: "the-right-password" });
    expect(waiting.status).toBe(429);
    expect(Number(waiting.headers.get("retry-after"))).toBeGreaterThan(0);
    const [{ failures }] = await sql<{ failures: number }[]>`select failures from sign_in_limits where key = ${"account:" + email}`;
    expect(failures).toBe(5);
  });

  // A show's routes read the session together with the show (lib/auth/access.ts); the session's life must
  // read the same there as on /api/me, which Lucia validates alone.
  describe("the session as a show's routes read it", () => {
    const stored = (c: Client) => createHash("sha256").update(decodeURIComponent(c.cookie!.split("=")[1]!)).digest("hex");
    const expiry = async (id: string) => (await sql<{ expires_at: Date }[]>`select expires_at from sessions where id = ${id}`)[0]?.expires_at;
    const DAY = 24 * 3600 * 1000;

    it("slides a session in the second half of its 30 days forward, with a new cookie", async () => {
      const { showId } = await demoIds();
      const c = await signedIn(DEMO.staff);
      const id = stored(c);
      await sql`update sessions set expires_at = now() + interval '10 days' where id = ${id}`;
      const res = await c.get(`/api/shows/${showId}`);
      expect(res.status).toBe(200);
      expect(res.headers.getSetCookie().some((v) => v.startsWith("farfield_session="))).toBe(true);
      expect((await expiry(id))!.getTime()).toBeGreaterThan(Date.now() + 29 * DAY);
    });

    it("leaves a session in the first half of its life as it is, with no cookie sent", async () => {
      const { showId } = await demoIds();
      const c = await signedIn(DEMO.staff);
      const id = stored(c);
      await sql`update sessions set expires_at = now() + interval '20 days' where id = ${id}`;
      const before = await expiry(id);
      const res = await c.get(`/api/shows/${showId}`);
      expect(res.status).toBe(200);
      expect(res.headers.getSetCookie().some((v) => v.startsWith("farfield_session="))).toBe(false);
      expect((await expiry(id))!.getTime()).toBe(before!.getTime());
    });

    it("refuses an expired session with 401, removes it and clears the cookie", async () => {
      const { showId, setIds, pressBoxId } = await demoIds();
      const c = await signedIn(DEMO.staff);
      const id = stored(c);
      await sql`update sessions set expires_at = now() - interval '1 minute' where id = ${id}`;
      const res = await c.get(`/api/shows/${showId}/sets/${setIds[0]}/analysis?listeningPointId=${pressBoxId}`);
      expect(res.status).toBe(401);
      expect(res.headers.getSetCookie().some((v) => /^farfield_session=;/.test(v))).toBe(true);
      expect(await expiry(id)).toBeUndefined();
    });

    it("refuses a signed-out session on a show's routes, and a show of another program is as unknown as none", async () => {
      const { showId, otherShowId } = await demoIds();
      const c = await signedIn(DEMO.staff);
      expect((await c.get(`/api/shows/${otherShowId}`)).status).toBe(404);
      const cookie = c.cookie;
      expect((await c.post("/api/auth/sign-out")).status).toBe(204);
      const stale = new Client();
      stale.cookie = cookie;
      expect((await stale.get(`/api/shows/${showId}`)).status).toBe(401);
      expect((await stale.get(`/api/shows/not-a-show`)).status).toBe(401);
    });
  });

  it("gives the session cookie a Max-Age no longer than the 30-day session", async () => {
    const res = await new Client().post("/api/auth/sign-in", { email: DEMO.designer, password: process.env.DEMO_PASSWORD ?? "farfield-demo" });
    const session = res.headers.getSetCookie().find((c) => c.startsWith("farfield_session="))!;
    const maxAge = Number(session.match(/Max-Age=(\d+)/i)?.[1]);
    expect(maxAge).toBeGreaterThan(0);
    expect(maxAge).toBeLessThanOrEqual(30 * 24 * 3600);
  });

  // The case and its relatives: each must send a signed-in user to a path of this site.
  for (const next of ["%2F..%2F%2Fevil.example%2Fphish", "/..//evil.example/phish", "/.%2E//evil.example", "/%5C%5Cevil.example", "//evil.example", "/\\evil.example", "https://evil.example"]) {
    it(`redirects a signed-in user to a path of this site for next=${next}`, async () => {
      const c = await signedIn(DEMO.staff);
      const res = await c.get(`/sign-in?next=${next}`);
      expect([303, 307, 308]).toContain(res.status);
      const location = res.headers.get("location")!;
      expect(location).toMatch(/^\/(?![/\\])/);
      expect(new URL(location, APP_URL).origin).toBe(new URL(APP_URL).origin);
    });
  }
});
