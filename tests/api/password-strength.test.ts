// Every way to set a password refuses one that is easy to guess (zxcvbn-ts 4.2.0 score below 3), with
// words a person can act on: sign-up, the reset link and a new person's invitation.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, demoIds, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { insertUser } from "../support/loopback";
import { linkIn, tokenOf, waitForMail } from "../support/mail";

const WEAK = "aaaaaaaaaa"; // ten letters, one repeated character: the issue's case
const sql = appDatabase();
let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  ids = await demoIds();
});
afterAll(async () => {
  await sql`update invitations set revoked_at = now() where program_id = ${ids.programId} and email like 'weak-invitee-%' and used_at is null`;
  await sql.end();
});

function expectClearRefusal(res: { status: number; body: any }, field: string) {
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  const words = (res.body.issues?.[field] ?? [res.body.error]).join(" ");
  expect(words).toMatch(/too easy to guess/);
  expect(words).toMatch(/Repeated characters/);
}

describe("weak passwords", () => {
  it("are refused at sign-up with a clear message", async () => {
    const res = await new Client().post("/api/auth/sign-up", { name: "Weak Pass", email: uniqueEmail("weak"), password: WEAK, programName: "Weak Band" });
    expectClearRefusal(res, "password");
  });

  it("are refused by a password reset link, which still works for a strong one", async () => {
    const email = uniqueEmail("weak-reset");
    await insertUser(sql, email, "old-password-1");
    const since = new Date();
    expect((await new Client().post("/api/auth/password-reset", { email })).status).toBeLessThan(300);
    const token = tokenOf(linkIn(await waitForMail(email, { since }), "/reset/"));
    expectClearRefusal(await new Client().post("/api/auth/password-reset/confirm", { token, password: WEAK }), "password");
    expect((await new Client().post("/api/auth/password-reset/confirm", { token, password: "lantern-light-2030" })).status).toBe(200);
  });

  it("are refused when a new person accepts an invitation", async () => {
    const email = uniqueEmail("weak-invitee");
    const since = new Date();
    expect((await ids.director.post(`/api/programs/${ids.programId}/invitations`, { email, role: "staff" })).status).toBe(201);
    const token = tokenOf(linkIn(await waitForMail(email, { since }), "/invitations/"));
    const res = await new Client().post(`/api/invitations/${token}/accept`, { name: "Weak Invitee", password: WEAK });
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(/too easy to guess/);
  });
});
