// Invitations end to end: the director's request, the message through the fake SMTP server,
// the link used once, and expired, revoked, resent and reused links refused.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, Client, DEMO, DEMO_PASSWORD, demoIds, signedIn, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { linkIn, mailTo, tokenOf, waitForMail } from "../support/mail";
import { signUp } from "../support/sign-up";

let ids: Awaited<ReturnType<typeof demoIds>>;
const db = appDatabase();
afterAll(async () => {
  // Leave the demo program with the members it had: other suites count them.
  const members = (await ids.director.get(`/api/programs/${ids.programId}/members`)).body.members as { userId: string; email: string }[];
  for (const m of members.filter((m) => m.email.endsWith("@test.example"))) {
    await ids.director.call("DELETE", `/api/programs/${ids.programId}/members/${m.userId}`);
  }
  await db`update invitations set revoked_at = now() where program_id = ${ids.programId} and used_at is null and revoked_at is null`;
  await db.end();
});

beforeAll(async () => {
  ids = await demoIds();
});

async function invite(email: string, role = "staff", by: Client = ids.director) {
  const since = new Date();
  const res = await by.post(`/api/programs/${ids.programId}/invitations`, { email, role });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  expect(res.body.mailed).toBe(true);
  const message = await waitForMail(email, { since });
  return { res, message, token: tokenOf(linkIn(message, "/invitations/")) };
}

describe("a new person joins by e-mail", () => {
  const email = uniqueEmail("invitee");
  let token = "";

  it("the message arrives with a link on the configured base URL", async () => {
    const sent = await invite(email, "staff");
    token = sent.token;
    const link = linkIn(sent.message, "/invitations/");
    expect(link.origin).toBe(new URL(APP_URL).origin);
    expect(sent.message.subject).toContain("Harbor Ridge High School Marching Band");
    expect(sent.message.html).toContain(`href="${link.href}"`);
    expect(JSON.stringify(sent.res.body)).not.toMatch(/token/i);
  });

  it("the link describes the invitation", async () => {
    const res = await new Client().get(`/api/invitations/${token}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ invitation: { email, role: "staff", invitedBy: "Dana Whitfield" }, signedInAs: null });
    // Whether the address has an account is not said (the security review's eighth finding).
    expect(res.body).not.toHaveProperty("accountExists");
  });

  it("the page behind the link answers", async () => {
    const res = await fetch(`${APP_URL}/invitations/${token}`);
    expect(res.status).toBe(200);
  });

  it("accepting creates the account, the membership and a session", async () => {
    const c = new Client();
    const res = await c.post(`/api/invitations/${token}/accept`, { name: "Nell Ardwick", password: "lantern-light-2030" });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const me = await c.get("/api/me");
    expect(me.body.user.email).toBe(email);
    expect(me.body.memberships).toEqual([expect.objectContaining({ programId: ids.programId, role: "staff" })]);
    const stored = await db`select token_hash from invitations where email = ${email}`;
    expect(stored[0]!.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored[0]!.token_hash).not.toContain(token);
  });

  it("the link works only once", async () => {
    const again = await new Client().post(`/api/invitations/${token}/accept`, { name: "Someone Else", password: "another-password-1" });
    expect(again.status).toBe(410);
    expect(again.body.state).toBe("used");
    expect((await new Client().get(`/api/invitations/${token}`)).status).toBe(410);
  });

  it("inviting someone who is already a member is refused", async () => {
    const res = await ids.director.post(`/api/programs/${ids.programId}/invitations`, { email, role: "designer" });
    expect(res.status).toBe(409);
  });
});

describe("links that no longer work", () => {
  it("an expired link is refused and writes nothing", async () => {
    const email = uniqueEmail("late");
    const { token } = await invite(email);
    await db`update invitations set expires_at = now() - interval '1 minute' where email = ${email}`;
    const c = new Client();
    const res = await c.post(`/api/invitations/${token}/accept`, { name: "Late Comer", password: "too-late-password" });
    expect(res.status).toBe(410);
    expect(res.body).toMatchObject({ state: "expired" });
    expect(await db`select id from users where email = ${email}`).toHaveLength(0);
  });

  it("the link expires seven days after it is sent", async () => {
    const email = uniqueEmail("week");
    const { res } = await invite(email);
    const days = (new Date(res.body.invitation.expiresAt).getTime() - new Date(res.body.invitation.sentAt).getTime()) / 86_400_000;
    expect(days).toBeCloseTo(7, 5);
  });

  it("a revoked link is refused", async () => {
    const email = uniqueEmail("revoked");
    const { res, token } = await invite(email);
    expect((await ids.director.call("DELETE", `/api/programs/${ids.programId}/invitations/${res.body.invitation.id}`)).status).toBe(204);
    const accept = await new Client().post(`/api/invitations/${token}/accept`, { name: "X", password: "revoked-password-1" });
    expect(accept).toMatchObject({ status: 410, body: { state: "revoked" } });
    const open = await ids.director.get(`/api/programs/${ids.programId}/invitations`);
    expect(open.body.invitations.map((i: any) => i.email)).not.toContain(email);
  });

  it("resending sends a new link and retires the old one", async () => {
    const email = uniqueEmail("resend");
    const first = await invite(email, "designer");
    const since = new Date();
    const resent = await ids.director.post(`/api/programs/${ids.programId}/invitations/${first.res.body.invitation.id}/resend`);
    expect(resent.status).toBe(200);
    const second = await waitForMail(email, { since, match: (m) => tokenOf(linkIn(m, "/invitations/")) !== first.token });
    const newToken = tokenOf(linkIn(second, "/invitations/"));
    expect((await mailTo(email)).length).toBe(2);
    expect((await new Client().get(`/api/invitations/${first.token}`)).status).toBe(404);
    const c = new Client();
    expect((await c.post(`/api/invitations/${newToken}/accept`, { name: "Re Sent", password: "resent-password-1" })).status).toBe(201);
    expect((await c.get("/api/me")).body.memberships[0].role).toBe("designer");
  });

  it("a malformed or unknown token is 404", async () => {
    expect((await new Client().get(`/api/invitations/not-a-token`)).status).toBe(404);
    expect((await new Client().get(`/api/invitations/${"A".repeat(43)}`)).status).toBe(404);
  });
});

describe("someone with an account joins", () => {
  it("needs that account's password, then joins with the invited role", async () => {
    const { token } = await invite(DEMO.otherDirector, "staff");
    const c = new Client();
    const view = (await c.get(`/api/invitations/${token}`)).body;
    expect(view).not.toHaveProperty("accountExists");
    expect(Object.keys(view).sort()).toEqual(["invitation", "signedInAs"]);
    expect((await c.post(`/api/invitations/${token}/accept`, {})).status).toBe(401);
    // The "new account" form on an address that has one asks for that account's password instead.
    const asNew = await c.post(`/api/invitations/${token}/accept`, { name: "Someone", password: "a-brand-new-password" });
    expect(asNew.status).toBe(401);
    expect(asNew.body.error).toContain("enter its password");
    expect((await c.post(`/api/invitations/${token}/accept`, { password: "not-the-password" })).status).toBe(401);
    const ok = await c.post(`/api/invitations/${token}/accept`, { password: DEMO_PASSWORD });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    const me = await c.get("/api/me");
    expect(me.body.memberships.map((m: any) => m.role).sort()).toEqual(["director", "staff"]);
    // Leave the demo as it was.
    const userId = me.body.user.id;
    expect((await ids.director.call("DELETE", `/api/programs/${ids.programId}/members/${userId}`)).status).toBe(204);
  });

  it("a signed-in account joins without retyping its password", async () => {
    const email = uniqueEmail("signedin");
    const c = new Client();
    expect((await signUp(c, { name: "Own Program", email, password: "own-program-pass", programName: "Own Band" })).status).toBe(201);
    const { token } = await invite(email, "designer");
    const res = await c.post(`/api/invitations/${token}/accept`, {});
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ programId: ids.programId, role: "designer" });
  });
});

describe("who may invite", () => {
  it("staff and designers get 403, another program 404, nobody signed in 401", async () => {
    const body = { email: uniqueEmail("nope"), role: "staff" };
    const path = `/api/programs/${ids.programId}/invitations`;
    expect((await (await signedIn(DEMO.staff)).post(path, body)).status).toBe(403);
    expect((await (await signedIn(DEMO.designer)).post(path, body)).status).toBe(403);
    expect((await ids.other.post(path, body)).status).toBe(404);
    expect((await new Client().post(path, body)).status).toBe(401);
    expect(await mailTo(body.email)).toHaveLength(0);
  });

  it("a bad role or address is 400 with field errors", async () => {
    const res = await ids.director.post(`/api/programs/${ids.programId}/invitations`, { email: "not an address", role: "captain" });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.issues).sort()).toEqual(["email", "role"]);
  });
});
