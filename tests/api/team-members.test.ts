// Role changes and removals, and the rule that a program always keeps a director.
// Each test builds a program of its own (sign-up makes its director) so the demo stays as it is.
import { describe, expect, it } from "vitest";
import { Client, uniqueEmail } from "../support/api";
import { linkIn, tokenOf, waitForMail } from "../support/mail";
import { signUp } from "../support/sign-up";

async function newProgram() {
  const director = new Client();
  const email = uniqueEmail("dir");
  const res = await signUp(director, { name: "First Director", email, password: "first-director-pw", programName: "Members Test Band" });
  expect(res.status).toBe(201);
  return { director, programId: res.body.programId as string, directorId: res.body.user.id as string };
}

async function addMember(p: { director: Client; programId: string }, role: string) {
  const email = uniqueEmail(role);
  const since = new Date();
  expect((await p.director.post(`/api/programs/${p.programId}/invitations`, { email, role })).status).toBe(201);
  const token = tokenOf(linkIn(await waitForMail(email, { since }), "/invitations/"));
  const c = new Client();
  const res = await c.post(`/api/invitations/${token}/accept`, { name: `A ${role}`, password: "member-password-1" });
  expect(res.status).toBe(201);
  return { client: c, userId: res.body.user.id as string };
}

const members = async (p: { director: Client; programId: string }) =>
  Object.fromEntries((await p.director.get(`/api/programs/${p.programId}/members`)).body.members.map((m: any) => [m.userId, m.role]));

describe("role changes", () => {
  it("a director changes a member's role; the member's access follows", async () => {
    const p = await newProgram();
    const staff = await addMember(p, "staff");
    const path = `/api/programs/${p.programId}/members/${staff.userId}`;
    expect((await staff.client.post(`/api/programs/${p.programId}/invitations`, { email: uniqueEmail("x"), role: "staff" })).status).toBe(403);
    const res = await p.director.call("PATCH", path, { role: "director" });
    expect(res).toMatchObject({ status: 200, body: { role: "director" } });
    expect((await members(p))[staff.userId]).toBe("director");
    expect((await staff.client.get(`/api/programs/${p.programId}/invitations`)).status).toBe(200);
  });

  it("only directors change roles or remove members", async () => {
    const p = await newProgram();
    const designer = await addMember(p, "designer");
    const staff = await addMember(p, "staff");
    const path = `/api/programs/${p.programId}/members/${staff.userId}`;
    expect((await designer.client.call("PATCH", path, { role: "designer" })).status).toBe(403);
    expect((await designer.client.call("DELETE", path)).status).toBe(403);
    expect((await new Client().call("DELETE", path)).status).toBe(401);
    expect((await members(p))[staff.userId]).toBe("staff");
  });

  it("an unknown member is 404 and a bad role is 400", async () => {
    const p = await newProgram();
    expect((await p.director.call("PATCH", `/api/programs/${p.programId}/members/nobody`, { role: "staff" })).status).toBe(404);
    expect((await p.director.call("PATCH", `/api/programs/${p.programId}/members/${p.directorId}`, { role: "owner" })).status).toBe(400);
  });
});

describe("the last director", () => {
  it("cannot be demoted or removed", async () => {
    const p = await newProgram();
    const path = `/api/programs/${p.programId}/members/${p.directorId}`;
    const demote = await p.director.call("PATCH", path, { role: "staff" });
    expect(demote.status).toBe(409);
    expect(demote.body.error).toMatch(/at least one director/);
    expect((await p.director.call("DELETE", path)).status).toBe(409);
    expect((await members(p))[p.directorId]).toBe("director");
  });

  it("can step down once another director exists", async () => {
    const p = await newProgram();
    const second = await addMember(p, "director");
    expect((await p.director.call("PATCH", `/api/programs/${p.programId}/members/${p.directorId}`, { role: "staff" })).status).toBe(200);
    // Now the second director is the last one.
    expect((await second.client.call("DELETE", `/api/programs/${p.programId}/members/${second.userId}`)).status).toBe(409);
    expect((await second.client.call("DELETE", `/api/programs/${p.programId}/members/${p.directorId}`)).status).toBe(204);
    expect(await members({ director: second.client, programId: p.programId })).toEqual({ [second.userId]: "director" });
  });

  it("a director demoted a moment ago changes nothing", async () => {
    const p = await newProgram();
    const second = await addMember(p, "director");
    const third = await addMember(p, "director");
    expect((await p.director.call("PATCH", `/api/programs/${p.programId}/members/${second.userId}`, { role: "staff" })).status).toBe(200);
    expect((await second.client.call("PATCH", `/api/programs/${p.programId}/members/${third.userId}`, { role: "staff" })).status).toBe(403);
    expect((await members(p))[third.userId]).toBe("director");
  });

  it("two directors demoting each other at once: exactly one succeeds", async () => {
    const p = await newProgram();
    const second = await addMember(p, "director");
    const [a, b] = await Promise.all([
      p.director.call("PATCH", `/api/programs/${p.programId}/members/${second.userId}`, { role: "staff" }),
      second.client.call("PATCH", `/api/programs/${p.programId}/members/${p.directorId}`, { role: "staff" }),
    ]);
    // The loser is refused either by the last-director rule (409) or, when the winner's change
    // landed before its request was checked, because it is no longer a director (403).
    const statuses = [a.status, b.status].sort();
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    const roles = Object.values(await members({ director: a.status === 200 ? p.director : second.client, programId: p.programId }));
    expect(roles.filter((r) => r === "director")).toHaveLength(1);
  });
});
