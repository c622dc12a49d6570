// Outgoing invitations are limited per program and per sender, counted in PostgreSQL so parallel
// requests (and several app processes) cannot all pass (the security review's ninth finding).
import { afterAll, describe, expect, it } from "vitest";
import { Client, uniqueEmail } from "../support/api";
import { appDatabase } from "../support/database";
import { linkIn, tokenOf, waitForMail } from "../support/mail";
import { signUp } from "../support/sign-up";

// lib/mail/limits.ts: 30 a day per program, 50 a day per sender.
const PER_PROGRAM = 30;
const PER_SENDER = 50;

const db = appDatabase();
afterAll(() => db.end());

async function director(tag: string) {
  const client = new Client();
  const email = uniqueEmail(tag);
  const res = await signUp(client, { name: `${tag} Director`, email, password: `${tag}-director-pass`, programName: `${tag} Band` });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { client, email, programId: res.body.programId as string, userId: res.body.user.id as string };
}

const invite = (c: Client, programId: string, tag: string) => c.post(`/api/programs/${programId}/invitations`, { email: uniqueEmail(tag), role: "staff" });

describe("invitation limits", () => {
  it("a program gets 429 past its day's invitations, even when they all arrive at once; resends count too", async () => {
    const d = await director("limit-program");
    const answers = await Promise.all(Array.from({ length: PER_PROGRAM + 6 }, () => invite(d.client, d.programId, "many")));
    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(PER_PROGRAM);
    expect(statuses.filter((s) => s === 429)).toHaveLength(6);
    expect(answers.find((r) => r.status === 429)!.body.error).toMatch(/this program has sent 30 invitations in the last 24 hours/i);
    const [{ n }] = await db<{ n: number }[]>`select count(*)::int as n from mail_log where program_id = ${d.programId}`;
    expect(n).toBe(PER_PROGRAM);

    const open = answers.find((r) => r.status === 201)!.body.invitation.id;
    const resent = await d.client.post(`/api/programs/${d.programId}/invitations/${open}/resend`);
    expect(resent.status).toBe(429);
  });

  it("one person directing two programs gets 429 past their own day's invitations", async () => {
    const a = await director("limit-sender-a");
    const b = await director("limit-sender-b");
    // b makes a a director of b's program too.
    const since = new Date();
    expect((await b.client.post(`/api/programs/${b.programId}/invitations`, { email: a.email, role: "director" })).status).toBe(201);
    const token = tokenOf(linkIn(await waitForMail(a.email, { since, match: (m) => m.subject.includes("invited you") }), "/invitations/"));
    expect((await a.client.post(`/api/invitations/${token}/accept`, {})).status).toBe(200);

    const first = await Promise.all(Array.from({ length: PER_PROGRAM }, () => invite(a.client, a.programId, "sender-one")));
    expect(first.every((r) => r.status === 201)).toBe(true);
    const rest = PER_SENDER - PER_PROGRAM;
    const second = await Promise.all(Array.from({ length: rest + 4 }, () => invite(a.client, b.programId, "sender-two")));
    expect(second.filter((r) => r.status === 201)).toHaveLength(rest);
    const refused = second.filter((r) => r.status === 429);
    expect(refused).toHaveLength(4);
    expect(refused[0]!.body.error).toMatch(/you have sent 50 invitations in the last 24 hours/i);
    // The other director of b's program may still invite.
    expect((await invite(b.client, b.programId, "still-open")).status).toBe(201);
  });
});
