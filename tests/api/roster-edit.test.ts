// Editing the roster on screen: a performer added with a name, changed field by field and removed, with
// the roster CSV's rules (lib/imports/roster.ts), against the running app and real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn, uniqueEmail } from "../support/api";
import { signUp } from "../support/sign-up";

let c: Client;
let showId: string;
const performersPath = () => `/api/shows/${showId}/performers`;
const roster = async () => (await c.get(`/api/shows/${showId}`)).body.performers as any[];

beforeAll(async () => {
  c = new Client();
  const up = await signUp(c, { name: "Roster Director", email: uniqueEmail("roster"), password: "roster-director-pass", programName: "Roster Band" });
  showId = (await c.post(`/api/programs/${up.body.programId}/shows`, { name: "Spring Roster", fieldRules: "high-school" })).body.show.id;
});

describe("a performer on screen", () => {
  it("is added with a name and a label the roster CSV accepts, and the roster shows the name", async () => {
    const res = await c.post(performersPath(), { instrument: "snare", label: "Sn.2", section: "Snares", name: "Robin Vale" });
    expect(res.status).toBe(201);
    expect(res.body.performers[0]).toMatchObject({ label: "SN.2", section: "Snares", name: "Robin Vale" });
    expect((await roster()).find((p) => p.label === "SN.2")).toMatchObject({ name: "Robin Vale", instrument: "snare" });
  });

  it("changes instrument, section, part, strength and name, and clears a name given empty", async () => {
    const [p] = (await c.post(performersPath(), { instrument: "flute", label: "F1" })).body.performers;
    const res = await c.call("PATCH", `${performersPath()}/${p.id}`, { instrument: "piccolo", section: "Piccolos", part: "1st", strengthDb: 2.5, name: "Ada Quill", label: "pc1" });
    expect(res.status).toBe(200);
    expect(res.body.performer).toEqual({ id: p.id, label: "PC1", instrument: "piccolo", section: "Piccolos", part: "1st", strengthDb: 2.5, name: "Ada Quill" });
    expect((await roster()).find((x) => x.id === p.id)).toMatchObject({ label: "PC1", instrument: "piccolo", name: "Ada Quill" });
    const cleared = await c.call("PATCH", `${performersPath()}/${p.id}`, { name: "" });
    expect(cleared.body.performer.name).toBeNull();
  });

  it("refuses what the roster CSV refuses, each with a message a person can act on, and changes nothing", async () => {
    const [a] = (await c.post(performersPath(), { instrument: "trumpet", label: "T1" })).body.performers;
    await c.post(performersPath(), { instrument: "trumpet", label: "T2" });
    const patch = (body: unknown) => c.call("PATCH", `${performersPath()}/${a.id}`, body);
    const taken = await patch({ label: "t2" });
    expect(taken.status).toBe(409);
    expect(taken.body.error).toMatch(/already labelled T2/);
    expect((await patch({ instrument: "kazoo" })).status).toBe(400);
    const strong = await patch({ strengthDb: 7 });
    expect(strong.status).toBe(400);
    expect(JSON.stringify(strong.body)).toMatch(/−6 dB \(weak\) to \+6 dB \(strong\)/);
    expect((await patch({ label: "T 1!" })).status).toBe(400);
    expect((await patch({ section: "" })).status).toBe(400);
    expect((await patch({})).status).toBe(400);
    expect((await patch({ colour: "red" })).status).toBe(400);
    expect((await roster()).find((x) => x.id === a.id)).toMatchObject({ label: "T1", instrument: "trumpet", strengthDb: 0 });
  });

  it("is removed with their dots in every set", async () => {
    const [p] = (await c.post(performersPath(), { instrument: "tuba", label: "TU1" })).body.performers;
    const setId = (await c.get(`/api/shows/${showId}`)).body.sets[0].id;
    const set = (await c.get(`/api/shows/${showId}/sets/${setId}`)).body;
    expect((await c.put(`/api/shows/${showId}/sets/${setId}/positions`, { version: set.set.version, positions: [{ performerId: p.id, x: 0, y: 20, facingDeg: 0 }] })).status).toBe(200);
    expect((await c.call("DELETE", `${performersPath()}/${p.id}`)).status).toBe(204);
    expect((await roster()).map((x) => x.id)).not.toContain(p.id);
    const after = (await c.get(`/api/shows/${showId}/sets/${setId}`)).body.positions.map((x: any) => x.performerId);
    expect(after).not.toContain(p.id);
    expect((await c.call("DELETE", `${performersPath()}/${p.id}`)).status).toBe(404);
  });

  it("answers 404 for a performer of another show or no id, 403 to staff", async () => {
    const ids = await demoIds();
    const demoPerformer = ids.show.performers[0].id;
    expect((await c.call("PATCH", `${performersPath()}/${demoPerformer}`, { name: "X" })).status).toBe(404);
    expect((await c.call("PATCH", `${performersPath()}/not-an-id`, { name: "X" })).status).toBe(404);
    const staff = await signedIn(DEMO.staff);
    expect((await staff.call("PATCH", `/api/shows/${ids.showId}/performers/${demoPerformer}`, { name: "X" })).status).toBe(403);
    expect((await staff.call("DELETE", `/api/shows/${ids.showId}/performers/${demoPerformer}`)).status).toBe(403);
  });
});
