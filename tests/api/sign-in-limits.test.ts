// Sign-in limits against the running app (served by server.ts, no proxy trusted): counted atomically in
// PostgreSQL before the password is checked, per connection address rather than X-Forwarded-For, and
// an account is slowed down rather than locked. Each test is a client of its own loopback address.
import { afterAll, describe, expect, it } from "vitest";
import { uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { insertUser, loopbackAddress, requestFrom, type LoopbackAnswer } from "../support/loopback";

const sql = appDatabase();
afterAll(() => sql.end());

const RIGHT = "the-right-password";
const signIn = (from: string, email: string, password: string, headers: Record<string, string> = {}, onSent?: () => void) =>
  requestFrom(from, "POST", "/api/auth/sign-in", { body: { email, password }, headers, onSent });
const count = (answers: LoopbackAnswer[], status: number) => answers.filter((a) => a.status === status).length;

describe("sign-in limits", () => {
  it("tries at most 5 of 60 parallel wrong passwords for one account; the rest answer 429 with Retry-After", async () => {
    const email = uniqueEmail("parallel");
    await insertUser(sql, email, RIGHT);
    const from = loopbackAddress();
    const answers = await Promise.all(Array.from({ length: 60 }, (_, i) => signIn(from, email, `wrong-guess-${i}`)));
    expect(count(answers, 401)).toBeGreaterThan(0);
    expect(count(answers, 401)).toBeLessThanOrEqual(5);
    expect(count(answers, 429)).toBe(60 - count(answers, 401));
    const refused = answers.find((a) => a.status === 429)!;
    expect(Number(refused.headers["retry-after"])).toBeGreaterThanOrEqual(1);
    expect(refused.body.error).toMatch(/Too many failed sign-ins for this account/);
  });

  it("does not sign in when the right password comes last in a parallel batch of wrong ones", async () => {
    const email = uniqueEmail("batch");
    await insertUser(sql, email, RIGHT);
    const from = loopbackAddress();
    // The right password goes out while the wrong ones are being answered, once they hold the account's
    // 5 counted attempts (polled in the table, so the order of arrival under load cannot decide the test).
    const wrong = Array.from({ length: 10 }, (_, i) => signIn(from, email, `wrong-guess-${i}`));
    const counted = async () => (await sql<{ failures: number }[]>`select failures from sign_in_limits where key = ${"account:" + email}`)[0]?.failures ?? 0;
    await expect.poll(counted, { timeout: 20_000, interval: 10 }).toBeGreaterThanOrEqual(5);
    const answers = await Promise.all([...wrong, signIn(from, email, RIGHT)]);
    expect(answers.at(-1)!.status).toBe(429);
    expect(count(answers, 200)).toBe(0);
  });

  it("buys no guesses for rotating X-Forwarded-For: one connection address has 40 failures in 15 minutes", async () => {
    const from = loopbackAddress();
    const answers = await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        signIn(from, uniqueEmail(`rotate${i}`), "some-wrong-password", { "x-forwarded-for": `203.0.113.${i + 1}`, "x-real-ip": `198.51.100.${i + 1}` }),
      ),
    );
    expect(count(answers, 401)).toBe(40);
    expect(count(answers, 429)).toBe(10);
    expect(answers.find((a) => a.status === 429)!.body.error).toMatch(/from your network/);
    // Another client (another connection address) is not affected.
    expect((await signIn(loopbackAddress(), uniqueEmail("other"), "some-wrong-password")).status).toBe(401);
  });

  it("keeps the owner signing in from a browser that signed in before while someone else guesses", async () => {
    const email = uniqueEmail("owner");
    await insertUser(sql, email, RIGHT);
    const home = loopbackAddress();
    const first = await signIn(home, email, RIGHT);
    expect(first.status).toBe(200);
    const device = first.cookies.find((c) => c.startsWith("farfield_device="))!;
    expect(device).toBeTruthy();

    const attacker = loopbackAddress();
    const guesses = await Promise.all(Array.from({ length: 20 }, (_, i) => signIn(attacker, email, `wrong-guess-${i}`)));
    expect(count(guesses, 401)).toBeLessThanOrEqual(5);
    expect(count(guesses, 429)).toBeGreaterThanOrEqual(15);

    // A new browser waits (slowed, not locked: at most 5 minutes); the known one signs in at once.
    const stranger = await signIn(loopbackAddress(), email, RIGHT);
    expect(stranger.status).toBe(429);
    expect(Number(stranger.headers["retry-after"])).toBeLessThanOrEqual(300);
    const owner = await signIn(home, email, RIGHT, { cookie: device });
    expect(owner.status).toBe(200);
    // The owner's success starts the account afresh.
    const [row] = await sql<{ n: number }[]>`select count(*)::int as n from sign_in_limits where key = ${"account:" + email}`;
    expect(row!.n).toBe(0);
  });

  it("gives a stolen device cookie no more than 10 guesses in 15 minutes", async () => {
    const email = uniqueEmail("device");
    await insertUser(sql, email, RIGHT);
    const first = await signIn(loopbackAddress(), email, RIGHT);
    const device = first.cookies.find((c) => c.startsWith("farfield_device="))!;
    const from = loopbackAddress();
    const answers = await Promise.all(Array.from({ length: 20 }, (_, i) => signIn(from, email, `wrong-guess-${i}`, { cookie: device })));
    expect(count(answers, 401)).toBe(10);
    expect(count(answers, 429)).toBe(10);
  });
});
