// Starting a new show: directors and designers, validated, with a press box and set 1 ready for the editor.
import { describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn, uniqueEmail } from "../support/api";
import { signUp } from "../support/sign-up";

describe("creating a show", () => {
  it("gives a new program an empty show with the default press box and set 1", async () => {
    const c = new Client();
    const up = await signUp(c, { name: "New Director", email: uniqueEmail("newshow"), password: "new-director-pass", programName: "New Band" });
    const res = await c.post(`/api/programs/${up.body.programId}/shows`, { name: "Autumn Winds", fieldRules: "college" });
    expect(res.status).toBe(201);
    const show = (await c.get(`/api/shows/${res.body.show.id}`)).body;
    expect(show.show).toMatchObject({ name: "Autumn Winds", fieldRules: "college" });
    expect(show.listeningPoints).toEqual([{ id: expect.any(String), name: "Press box", x: 0, y: -25, z: 18, groundFactor: null, surroundingsM: 0, background: null }]);
    expect(show.sets).toMatchObject([{ id: res.body.show.firstSetId, number: "1", counts: 0 }]);
    expect(show.performers).toEqual([]);
    expect((await c.get(`/api/programs/${up.body.programId}/shows`)).body.shows.map((s: any) => s.name)).toEqual(["Autumn Winds"]);
  });

  it("refuses staff (403), outsiders (404) and bad bodies (400), writing nothing", async () => {
    const ids = await demoIds();
    const staff = await signedIn(DEMO.staff);
    const before = (await ids.director.get(`/api/programs/${ids.programId}/shows`)).body.shows.length;
    expect((await staff.post(`/api/programs/${ids.programId}/shows`, { name: "Nope" })).status).toBe(403);
    expect((await ids.other.post(`/api/programs/${ids.programId}/shows`, { name: "Nope" })).status).toBe(404);
    for (const body of [{}, { name: "" }, { name: "x", fieldRules: "pro" }, { name: "x", extra: 1 }]) {
      expect((await ids.director.post(`/api/programs/${ids.programId}/shows`, body)).status, JSON.stringify(body)).toBe(400);
    }
    expect((await ids.director.get(`/api/programs/${ids.programId}/shows`)).body.shows.length).toBe(before);
  });
});
