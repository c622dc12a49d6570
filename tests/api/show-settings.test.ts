// Show settings (PATCH /api/shows/{id}): name, field rules, weather, ground by region and movements;
// and the listening points (POST, PATCH, DELETE) with their ground and background, as shared/API.md
// and the settings page use them.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn, uniqueEmail } from "../support/api";
import { copyDemoShow } from "../support/show-copy";
import { signUp } from "../support/sign-up";

/** A new director with a new, empty show (press box and set 1). */
async function newShow(tag: string) {
  const c = new Client();
  const up = await signUp(c, { name: `${tag} Director`, email: uniqueEmail(tag), password: `${tag}-director-pass`, programName: `${tag} Band` });
  const res = await c.post(`/api/programs/${up.body.programId}/shows`, { name: "Evening Tide", fieldRules: "high-school" });
  return { c, programId: up.body.programId as string, showId: res.body.show.id as string, firstSetId: res.body.show.firstSetId as string };
}

describe("PATCH /api/shows/{id}", () => {
  it("sets the name, field rules and the evening's weather, and answers the show as GET does", async () => {
    const { c, showId } = await newShow("settings");
    const res = await c.call("PATCH", `/api/shows/${showId}`, {
      name: "Evening Tide (finals)",
      fieldRules: "college",
      conditions: { temperatureC: 14, relativeHumidityPct: 82, pressureKPa: 99.2 },
    });
    expect(res.status).toBe(200);
    const get = await c.get(`/api/shows/${showId}`);
    expect(res.body).toEqual(get.body);
    expect(get.body.show).toMatchObject({ name: "Evening Tide (finals)", fieldRules: "college" });
    // Only what was sent changes: the ground stays as it was.
    expect(get.body.show.conditions).toEqual({ temperatureC: 14, relativeHumidityPct: 82, pressureKPa: 99.2, groundFactor: null, betweenGroundFactor: null });
  });

  it("sets the ground by region: the field surface and what lies between", async () => {
    const { c, showId } = await newShow("ground");
    const res = await c.call("PATCH", `/api/shows/${showId}`, { conditions: { groundFactor: 1, betweenGroundFactor: 0 } });
    expect(res.status).toBe(200);
    expect(res.body.show.conditions).toMatchObject({ groundFactor: 1, betweenGroundFactor: 0, temperatureC: 20 });
  });

  it("names movements by the set each starts at; each runs to the next one's first set", async () => {
    const { c, showId, firstSetId } = await newShow("movements");
    const s2 = (await c.post(`/api/shows/${showId}/sets`, {})).body.set.id;
    const s3 = (await c.post(`/api/shows/${showId}/sets`, {})).body.set.id;
    // Sent out of order: numbered in the order they start on the field.
    const res = await c.call("PATCH", `/api/shows/${showId}`, { movements: [{ name: "Ballad", firstSetId: s3 }, { name: "Opener", firstSetId }] });
    expect(res.status).toBe(200);
    expect(res.body.movements).toEqual([
      { id: expect.any(String), number: 1, name: "Opener", firstSetId, lastSetId: s2 },
      { id: expect.any(String), number: 2, name: "Ballad", firstSetId: s3, lastSetId: s3 },
    ]);
    expect(res.body.sets.map((s: any) => s.movementId)).toEqual([res.body.movements[0].id, res.body.movements[0].id, res.body.movements[1].id]);
    // Replacing the list with none leaves no set in a movement.
    const cleared = await c.call("PATCH", `/api/shows/${showId}`, { movements: [] });
    expect(cleared.body.movements).toEqual([]);
    expect(cleared.body.sets.every((s: any) => s.movementId === null)).toBe(true);
  });

  it("refuses, in words, settings that cannot be, and writes nothing", async () => {
    const { c, showId, firstSetId } = await newShow("badsettings");
    const other = await newShow("othershow");
    const before = (await c.get(`/api/shows/${showId}`)).body;
    const cases: [unknown, string][] = [
      [{}, "Give at least one setting"],
      [{ name: "" }, "Name the show."],
      [{ fieldRules: "pro" }, "Field rules are high-school or college."],
      [{ conditions: { temperatureC: 80 } }, "Temperature must be between"],
      [{ conditions: { relativeHumidityPct: 3 } }, "Humidity must be between"],
      [{ conditions: { pressureKPa: 20 } }, "Air pressure must be between 60 and 110 kPa"],
      [{ conditions: { groundFactor: 1.5 } }, "between 0 (hard, e.g. concrete) and 1 (grass)"],
      [{ movements: [{ name: "Opener", firstSetId: other.firstSetId }] }, "A movement starts at a set this show does not have."],
      [{ movements: [{ name: "A", firstSetId }, { name: "B", firstSetId }] }, "Two movements cannot start at the same set."],
      // An unknown field is named, so the sender knows what to take out.
      [{ name: "x", extra: 1 }, "extra"],
    ];
    for (const [body, words] of cases) {
      const res = await c.call("PATCH", `/api/shows/${showId}`, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(JSON.stringify(res.body), JSON.stringify(body)).toContain(words);
    }
    expect((await c.get(`/api/shows/${showId}`)).body).toEqual(before);
  });

  it("lets designers change settings; staff get 403 and outsiders 404", async () => {
    const ids = await demoIds();
    const designer = await signedIn(DEMO.designer);
    const staff = await signedIn(DEMO.staff);
    const name = ids.show.show.name;
    expect((await designer.call("PATCH", `/api/shows/${ids.showId}`, { name })).status).toBe(200);
    const refused = await staff.call("PATCH", `/api/shows/${ids.showId}`, { name: "Mine now" });
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatch(/role/);
    expect((await ids.other.call("PATCH", `/api/shows/${ids.showId}`, { name: "Mine now" })).status).toBe(404);
    expect((await staff.get(`/api/shows/${ids.showId}`)).body.show.name).toBe(name);
  });
});

describe("listening points", () => {
  let c: Client;
  let showId: string;
  let pressBoxId: string;
  beforeAll(async () => {
    ({ client: c, showId, pressBoxId } = await copyDemoShow("points"));
  });

  it("adds a judge on the field, moves it and removes it; the show keeps its last point (409)", async () => {
    const added = await c.post(`/api/shows/${showId}/listening-points`, { name: "Judge on the field", x: -9.1, y: 20, z: 1.7 });
    expect(added.status).toBe(201);
    expect(added.body.listeningPoint).toMatchObject({ id: expect.any(String), name: "Judge on the field", x: -9.1, y: 20, z: 1.7, background: null });
    const id = added.body.listeningPoint.id;
    const moved = await c.call("PATCH", `/api/shows/${showId}/listening-points/${id}`, { x: 4.57, y: 30 });
    expect(moved.status).toBe(200);
    expect(moved.body.listeningPoint).toMatchObject({ name: "Judge on the field", x: 4.57, y: 30, z: 1.7 });
    const names = (await c.get(`/api/shows/${showId}`)).body.listeningPoints.map((l: any) => l.name);
    expect(names.at(-1)).toBe("Judge on the field");
    // The judge's own analysis exists.
    const setId = (await c.get(`/api/shows/${showId}`)).body.sets[3].id;
    expect((await c.get(`/api/shows/${showId}/sets/${setId}/analysis?listeningPointId=${id}`)).status).toBe(200);
    expect((await c.call("DELETE", `/api/shows/${showId}/listening-points/${id}`)).status).toBe(204);
    expect((await c.call("DELETE", `/api/shows/${showId}/listening-points/${id}`)).status).toBe(404);
    // Remove all but one, then the last is refused.
    const rest = (await c.get(`/api/shows/${showId}`)).body.listeningPoints.filter((l: any) => l.id !== pressBoxId);
    for (const l of rest) expect((await c.call("DELETE", `/api/shows/${showId}/listening-points/${l.id}`)).status).toBe(204);
    const last = await c.call("DELETE", `/api/shows/${showId}/listening-points/${pressBoxId}`);
    expect(last.status).toBe(409);
    expect(last.body.error).toBe("A show needs at least one listening point: add another before removing this one.");
    expect((await c.get(`/api/shows/${showId}`)).body.listeningPoints.map((l: any) => l.id)).toEqual([pressBoxId]);
  });

  it("stores a background and the analysis hears it: a crowd masks more than a quiet field", async () => {
    const setId = (await c.get(`/api/shows/${showId}`)).body.sets[5].id;
    const analysis = async () => (await c.get(`/api/shows/${showId}/sets/${setId}/analysis?listeningPointId=${pressBoxId}`)).body.loudness;
    // The demo's press box keeps a crowd: start from no background at all.
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: null })).status).toBe(200);
    const none = await analysis();
    expect(none.backgroundSone).toBe(0);
    const quiet = await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: { preset: "quiet-field" } });
    expect(quiet.status).toBe(200);
    expect(quiet.body.listeningPoint.background).toEqual({ preset: "quiet-field" });
    const quietLoudness = await analysis();
    expect(quietLoudness.backgroundSone).toBeGreaterThan(0);
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: { preset: "stadium-between-bands" } })).status).toBe(200);
    const crowd = await analysis();
    // The stadium preset is 65 dBA against the quiet field's ~42 dBA (lib/acoustics/background.ts).
    expect(crowd.backgroundSone).toBeGreaterThan(quietLoudness.backgroundSone * 2);
    const margins = (l: any) => Object.values<any>(l.voices).map((v) => v.marginDb);
    margins(crowd).forEach((m, i) => expect(m).toBeLessThanOrEqual(margins(none)[i] + 1e-9));
    // Custom octave levels, and back to none.
    const custom = await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: { octaveDb: [60, 58, 56, 54, 50, 46, 40, 34] }, groundFactor: 0, surroundingsM: 12 });
    expect(custom.status).toBe(200);
    expect(custom.body.listeningPoint).toMatchObject({ background: { octaveDb: [60, 58, 56, 54, 50, 46, 40, 34] }, groundFactor: 0, surroundingsM: 12 });
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: null })).status).toBe(200);
    expect((await analysis()).backgroundSone).toBe(0);
  });

  it("keeps the background in the backup", async () => {
    await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, { background: { preset: "crowd-during-performance" } });
    const file = (await c.get(`/api/shows/${showId}/export`)).body;
    expect(file.listeningPoints.find((l: any) => l.name === "Press box").background).toEqual({ preset: "crowd-during-performance" });
  });

  it("refuses points off the map and unknown backgrounds in words (400), staff (403), outsiders (404)", async () => {
    const cases: [unknown, string][] = [
      [{ name: "", x: 0, y: 0, z: 0 }, "Name the listening point."],
      [{ name: "Far", x: 500, y: 0, z: 0 }, "must be within 300 m of the 50-yard line"],
      [{ name: "Deep", x: 0, y: 0, z: -3 }, "must be 0 to 100 m above the field"],
      [{ name: "Loud", x: 0, y: 0, z: 1, background: { preset: "fireworks" } }, "The background preset is one of quiet-field"],
      [{ name: "Loud", x: 0, y: 0, z: 1, background: { octaveDb: [60, 60] } }, "Give 8 octave-band"],
      [{ name: "Loud", x: 0, y: 0, z: 1, background: { octaveDb: [60, 60, 60, 60, 60, 60, 60, 200] } }, "Each level must be -20 to 130 dB."],
    ];
    for (const [body, words] of cases) {
      const res = await c.post(`/api/shows/${showId}/listening-points`, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(JSON.stringify(res.body), JSON.stringify(body)).toContain(words);
    }
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/${pressBoxId}`, {})).status).toBe(400);
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/not-an-id`, { z: 2 })).status).toBe(404);
    const ids = await demoIds();
    const staff = await signedIn(DEMO.staff);
    expect((await staff.post(`/api/shows/${ids.showId}/listening-points`, { name: "Mine", x: 0, y: 0, z: 1 })).status).toBe(403);
    expect((await staff.call("DELETE", `/api/shows/${ids.showId}/listening-points/${ids.pressBoxId}`)).status).toBe(403);
    expect((await ids.other.post(`/api/shows/${ids.showId}/listening-points`, { name: "Mine", x: 0, y: 0, z: 1 })).status).toBe(404);
    // A point of another show is unknown here.
    expect((await c.call("PATCH", `/api/shows/${showId}/listening-points/${ids.pressBoxId}`, { z: 2 })).status).toBe(404);
  });

  it("holds at most 10 points (422)", async () => {
    const { c: d, showId: fresh } = await newShow("tenpoints");
    for (let i = 0; i < 9; i++) expect((await d.post(`/api/shows/${fresh}/listening-points`, { name: `Seat ${i}`, x: i, y: -30, z: 10 })).status).toBe(201);
    const res = await d.post(`/api/shows/${fresh}/listening-points`, { name: "Eleventh", x: 0, y: -30, z: 10 });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatch(/at most 10 listening points/);
  });
});
