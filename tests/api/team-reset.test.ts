// Password reset by e-mail: the same answer for any address, a single-use expiring link, and every
// session of the user ended when the password changes.
import { describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { linkIn, mailTo, tokenOf, waitForMail } from "../support/mail";
import { signUp } from "../support/sign-up";

async function account() {
  const email = uniqueEmail("reset");
  const c = new Client();
  expect((await signUp(c, { name: "Forgetful Fen", email, password: "old-password-1", programName: "Reset Band" })).status).toBe(201);
  return { email, first: c };
}

async function requestLink(email: string) {
  const since = new Date();
  const res = await new Client().post("/api/auth/password-reset", { email });
  expect(res.status).toBe(202);
  const message = await waitForMail(email, { since });
  return { res, message, token: tokenOf(linkIn(message, "/reset/")) };
}

describe("password reset", () => {
  it("ends every session, sets the new password and works once", async () => {
    const { email, first } = await account();
    const second = new Client();
    expect((await second.post("/api/auth/sign-in", { email, password: "old-password-1" })).status).toBe(200);
    const { message, token } = await requestLink(email);
    expect(linkIn(message, "/reset/").origin).toBe(new URL(APP_URL).origin);
    expect((await new Client().get(`/api/auth/password-reset/confirm?token=${token}`)).status).toBe(200);

    const done = await new Client().post("/api/auth/password-reset/confirm", { token, password: "new-password-22" });
    expect(done.status).toBe(200);
    expect((await first.get("/api/me")).status).toBe(401);
    expect((await second.get("/api/me")).status).toBe(401);
    expect((await new Client().post("/api/auth/sign-in", { email, password: "old-password-1" })).status).toBe(401);
    expect((await new Client().post("/api/auth/sign-in", { email, password: "new-password-22" })).status).toBe(200);

    const reuse = await new Client().post("/api/auth/password-reset/confirm", { token, password: "third-password-3" });
    expect(reuse.status).toBe(410);
    expect((await new Client().post("/api/auth/sign-in", { email, password: "new-password-22" })).status).toBe(200);
  });

  it("answers an unknown address exactly like a known one, and sends nothing", async () => {
    const { email } = await account();
    const known = await new Client().post("/api/auth/password-reset", { email });
    const ghost = uniqueEmail("ghost");
    const unknown = await new Client().post("/api/auth/password-reset", { email: ghost });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await waitForMail(email); // the known address's message arrives; by then the other would have too
    expect(await mailTo(ghost)).toHaveLength(0);
  });

  it("refuses an expired link and a password that is too short", async () => {
    const { email } = await account();
    const { token } = await requestLink(email);
    const short = await new Client().post("/api/auth/password-reset/confirm", { token, password: "short" });
    expect(short.status).toBe(400);
    const db = appDatabase();
    try {
      await db`update password_resets set expires_at = now() - interval '1 second' where user_id = (select id from users where email = ${email})`;
    } finally {
      await db.end();
    }
    const late = await new Client().post("/api/auth/password-reset/confirm", { token, password: "late-password-1" });
    expect(late.status).toBe(410);
    expect((await new Client().post("/api/auth/sign-in", { email, password: "old-password-1" })).status).toBe(200);
  });

  it("a link expires an hour after it is asked for (stored hashed)", async () => {
    const { email } = await account();
    const { token } = await requestLink(email);
    const db = appDatabase();
    try {
      const [row] = await db`select token_hash, extract(epoch from expires_at - created_at) as s from password_resets where user_id = (select id from users where email = ${email})`;
      expect(Number(row!.s)).toBeCloseTo(3600, 0);
      expect(row!.token_hash).not.toBe(token);
      expect(row!.token_hash).toMatch(/^[0-9a-f]{64}$/);
    } finally {
      await db.end();
    }
  });
});
