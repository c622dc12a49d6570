// Sign-up does not reveal whether an address has an account (the security review's eighth finding): a
// new and an existing address get the same answer; the account is created only from the link mailed to
// the address, and the owner of an existing account is told that someone tried.
import { afterAll, describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { linkIn, mailTo, tokenOf, waitForMail } from "../support/mail";
import { signUp } from "../support/sign-up";

const db = appDatabase();
afterAll(() => db.end());

const CONFIRM = "Confirm your new Farfield account";
const TRIED = "Someone tried to create a Farfield account with your address";

/** What a caller can observe of an answer, with the address it sent taken out. */
const observed = (res: { status: number; body: any; headers: Headers }, email: string) => ({
  status: res.status,
  body: JSON.parse(JSON.stringify(res.body).replaceAll(email, "ADDRESS")),
  cookie: res.headers.get("set-cookie"),
});

describe("sign-up answers every address alike", () => {
  it("a new and an existing address get the same status, body and no session; the owner is mailed instead", async () => {
    const existing = uniqueEmail("taken");
    expect((await signUp(new Client(), { name: "First Owner", email: existing, password: "owner-password-1", programName: "Owner Band" })).status).toBe(201);
    const fresh = uniqueEmail("fresh");
    const since = new Date();

    const a = new Client();
    const b = new Client();
    const forExisting = await a.post("/api/auth/sign-up", { name: "Intruder", email: existing, password: "intruder-pass-1", programName: "Stolen Band" });
    const forFresh = await b.post("/api/auth/sign-up", { name: "Newcomer", email: fresh, password: "newcomer-pass-1", programName: "Fresh Band" });
    expect(observed(forExisting, existing)).toEqual(observed(forFresh, fresh));
    expect(forExisting.status).toBe(202);
    expect(forExisting.headers.get("set-cookie")).toBeNull();
    expect((await a.get("/api/me")).status).toBe(401);
    expect((await b.get("/api/me")).status).toBe(401);

    const notice = await waitForMail(existing, { since, match: (m) => m.subject === TRIED });
    expect(notice.text).toContain(`${APP_URL}/sign-in`);
    expect(notice.text).not.toContain("/sign-up/");
    expect((await mailTo(existing)).filter((m) => m.subject === CONFIRM && new Date(m.receivedAt) >= since)).toHaveLength(0);
    await waitForMail(fresh, { since, match: (m) => m.subject === CONFIRM });

    // Nothing about the existing account changed: its password still signs in, no second program exists.
    expect((await new Client().post("/api/auth/sign-in", { email: existing, password: "owner-password-1" })).status).toBe(200);
    expect((await new Client().post("/api/auth/sign-in", { email: existing, password: "intruder-pass-1" })).status).toBe(401);
    expect(await db`select 1 from programs where name = 'Stolen Band'`).toHaveLength(0);
    expect(await db`select 1 from pending_sign_ups where email = ${existing} and created_at >= ${since}`).toHaveLength(0);
  });

  it("the mailed link creates the account and its program once, and signs its holder in", async () => {
    const email = uniqueEmail("confirm");
    const since = new Date();
    const c = new Client();
    expect((await c.post("/api/auth/sign-up", { name: "Link Holder", email, password: "link-holder-pass", programName: "Link Band" })).status).toBe(202);
    const token = tokenOf(linkIn(await waitForMail(email, { since, match: (m) => m.subject === CONFIRM }), "/sign-up/"));
    expect(await db`select 1 from users where email = ${email}`).toHaveLength(0);

    // Opening the link (a mail scanner does) shows the page and creates nothing.
    expect((await fetch(`${APP_URL}/sign-up/${token}`)).status).toBe(200);
    const view = await new Client().get(`/api/auth/sign-up/confirm?token=${token}`);
    expect(view).toMatchObject({ status: 200, body: { signUp: { email, name: "Link Holder", programName: "Link Band" } } });
    expect(JSON.stringify(view.body)).not.toMatch(/hash|password/i);
    expect(await db`select 1 from users where email = ${email}`).toHaveLength(0);

    const done = await c.post("/api/auth/sign-up/confirm", { token });
    expect(done.status, JSON.stringify(done.body)).toBe(201);
    const me = await c.get("/api/me");
    expect(me.body.user.email).toBe(email);
    expect(me.body.memberships).toEqual([{ programId: done.body.programId, programName: "Link Band", role: "director" }]);
    expect((await new Client().post("/api/auth/sign-up/confirm", { token })).status).toBe(410);
    expect((await new Client().get(`/api/auth/sign-up/confirm?token=${token}`)).status).toBe(410);
  });

  it("once one link is used, the address's other sign-up links stop working", async () => {
    const email = uniqueEmail("twice");
    const since = new Date();
    await new Client().post("/api/auth/sign-up", { name: "Twice", email, password: "twice-password-1", programName: "One Band" });
    await new Client().post("/api/auth/sign-up", { name: "Twice", email, password: "twice-password-2", programName: "Two Band" });
    const first = await waitForMail(email, { since, match: (m) => m.subject === CONFIRM && m.text.includes("One Band") });
    const second = await waitForMail(email, { since, match: (m) => m.subject === CONFIRM && m.text.includes("Two Band") });
    expect((await new Client().post("/api/auth/sign-up/confirm", { token: tokenOf(linkIn(second, "/sign-up/")) })).status).toBe(201);
    expect((await new Client().post("/api/auth/sign-up/confirm", { token: tokenOf(linkIn(first, "/sign-up/")) })).status).toBe(410);
  });

  it("sends at most three sign-up messages an hour to one address, counted in PostgreSQL across parallel requests", async () => {
    const email = uniqueEmail("flood");
    const answers = await Promise.all(
      Array.from({ length: 8 }, (_, i) => new Client().post("/api/auth/sign-up", { name: `Flood ${i}`, email, password: "flood-password-1", programName: "Flood Band" })),
    );
    expect(new Set(answers.map((r) => JSON.stringify(observed(r, email))))).toHaveProperty("size", 1);
    expect(answers[0]!.status).toBe(202);
    const [{ n }] = await db<{ n: number }[]>`select count(*)::int as n from mail_log where kind = 'sign-up' and recipient = ${email}`;
    expect(n).toBe(3);
  });
});
