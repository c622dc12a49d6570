// Adding performers to the roster by instrument, against the running app and real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let designer: Client;
const path = () => `/api/shows/${ids.showId}/performers`;

beforeAll(async () => {
  ids = await demoIds();
  designer = await signedIn(DEMO.designer);
});

describe("POST performers", () => {
  it("adds trumpets continuing the roster's labels in the trumpets' section, unplaced", async () => {
    const roster = (await designer.get(`/api/shows/${ids.showId}`)).body.performers as any[];
    const trumpets = roster.filter((p) => p.instrument === "trumpet");
    const highest = Math.max(...trumpets.map((p) => Number(p.label.replace(/^\D+/, ""))));
    const res = await designer.post(path(), { instrument: "trumpet", count: 2, part: "3rd" });
    expect(res.status).toBe(201);
    expect(res.body.performers.map((p: any) => p.label)).toEqual([`T${highest + 1}`, `T${highest + 2}`]);
    for (const p of res.body.performers) expect(p).toMatchObject({ instrument: "trumpet", section: trumpets[0].section, part: "3rd", strengthDb: 0 });
    const after = (await designer.get(`/api/shows/${ids.showId}`)).body.performers.map((p: any) => p.id);
    expect(after).toEqual(expect.arrayContaining(res.body.performers.map((p: any) => p.id)));
    const set = (await designer.get(`/api/shows/${ids.showId}/sets/${ids.setIds[0]}`)).body.positions.map((p: any) => p.performerId);
    expect(set).not.toContain(res.body.performers[0].id);
  });

  it("takes a label and a section, and refuses a label in use (409)", async () => {
    const res = await designer.post(path(), { instrument: "tuba", label: "tu99", section: "Tubas" });
    expect(res.status).toBe(201);
    expect(res.body.performers[0]).toMatchObject({ label: "TU99", section: "Tubas" });
    expect((await designer.post(path(), { instrument: "tuba", label: "TU99" })).status).toBe(409);
  });

  it("answers 400 for an unknown instrument or a bad body, 403 for staff, 404 across programs", async () => {
    expect((await designer.post(path(), { instrument: "kazoo" })).status).toBe(400);
    expect((await designer.post(path(), { instrument: "flute", count: 0 })).status).toBe(400);
    expect((await designer.post(path(), { instrument: "flute", count: 2, label: "F40" })).status).toBe(400);
    expect((await designer.post(path(), { instrument: "flute", strengthDb: 12 })).status).toBe(400);
    const staff = await signedIn(DEMO.staff);
    expect((await staff.post(path(), { instrument: "flute" })).status).toBe(403);
    expect((await ids.other.post(path(), { instrument: "flute" })).status).toBe(404);
  });
});
