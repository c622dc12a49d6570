// The local mailbox of npm start / npm test (/dev/mail): each signed-in person reads only the
// messages sent to their own address, and with real SMTP settings it does not exist at all.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, DEMO_PASSWORD, demoIds, signedIn, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { linkIn, waitForMail } from "../support/mail";
import { startApp, type App } from "../support/stack";

let ids: Awaited<ReturnType<typeof demoIds>>;
const db = appDatabase();

beforeAll(async () => {
  ids = await demoIds();
});
afterAll(async () => {
  await db`update invitations set revoked_at = now() where program_id = ${ids.programId} and email like 'mailbox-own-%' and used_at is null`;
  await db.end();
});

const box = async (c: Client) => {
  const res = await c.get("/api/dev/mail");
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.messages as { to: string[]; subject: string; text: string }[];
};

describe("each person reads only their own mail", () => {
  it("a director does not see another program's password-reset link; its owner does", async () => {
    const since = new Date();
    expect((await new Client().post("/api/auth/password-reset", { email: DEMO.otherDirector })).status).toBe(202);
    const reset = await waitForMail(DEMO.otherDirector, { since, match: (m) => m.subject.includes("password") });
    const link = linkIn(reset, "/reset/").href;

    const harbor = await box(ids.director);
    expect(harbor.every((m) => m.to.includes(DEMO.director))).toBe(true);
    expect(JSON.stringify(harbor)).not.toContain(link);

    const westbrook = await box(ids.other);
    expect(westbrook.some((m) => m.text.includes(link))).toBe(true);
    expect(westbrook.every((m) => m.to.includes(DEMO.otherDirector))).toBe(true);
  });

  it("the director who sends an invitation cannot read its link in the mailbox", async () => {
    const email = uniqueEmail("mailbox-own");
    const since = new Date();
    expect((await ids.director.post(`/api/programs/${ids.programId}/invitations`, { email, role: "staff" })).status).toBe(201);
    const sent = await waitForMail(email, { since });
    expect(JSON.stringify(await box(ids.director))).not.toContain(linkIn(sent, "/invitations/").href);
  });

  it("any signed-in person may open their own mailbox; nobody signed out", async () => {
    const staff = await box(await signedIn(DEMO.staff));
    expect(staff.every((m) => m.to.includes(DEMO.staff))).toBe(true);
    expect((await new Client().get("/api/dev/mail")).status).toBe(401);
  });
});

describe("with real SMTP settings", () => {
  let app: App;
  beforeAll(async () => {
    // DEV_MAILBOX left set on purpose: real settings must close the mailbox anyway.
    app = await startApp(process.env.DATABASE_URL!, { SMTP_HOST: "smtp.example.org", SMTP_PORT: "587", SMTP_USER: "mailer", DEV_MAILBOX: "true" });
  });
  afterAll(async () => {
    await app?.stop();
  });

  it("the mailbox route and page answer 404, even to a signed-in director", async () => {
    const director = await signedIn(DEMO.director, DEMO_PASSWORD, app.url);
    expect((await director.get("/api/dev/mail")).status).toBe(404);
    const page = await fetch(`${app.url}/dev/mail`, { headers: { cookie: director.cookie! }, redirect: "manual" });
    expect(page.status).toBe(404);
  });
});
