// Box readings by form: staff record (201), bad bodies (400), other programs (404), removal rights.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";
import { readingBody, removeReadings } from "./readings-support";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
let designer: Client;
const created: string[] = [];
const path = () => `/api/shows/${ids.showId}/readings`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
});
afterAll(async () => removeReadings(ids.director, ids.showId, created));

describe("POST readings", () => {
  it("lets staff record a reading (201) that then lists with who recorded it", async () => {
    const res = await staff.post(path(), readingBody(ids, { weighting: "C", response: "fast", measuredDb: 91.2 }));
    expect(res.status).toBe(201);
    created.push(res.body.reading.id);
    expect(res.body.reading).toMatchObject({
      setId: ids.setIds[0],
      setNumber: ids.show.sets[0].number,
      listeningPointName: "Press box",
      measuredDb: 91.2,
      weighting: "C",
      response: "fast",
      meterHeightM: 18,
      sections: [{ section: "Trumpets", dynamic: "f" }],
    });
    expect(new Date(res.body.reading.takenAt).toISOString()).toBe("2026-09-19T00:30:00.000Z");
    const list = await ids.director.get(path());
    expect(list.status).toBe(200);
    const mine = list.body.readings.find((r: any) => r.id === res.body.reading.id);
    expect(mine.recordedBy).toBe((await staff.get("/api/me")).body.user.name);
  });

  it("answers 400 with the field named for invalid bodies, storing nothing", async () => {
    const before = (await staff.get(path())).body.readings.length;
    const bad: [Record<string, unknown>, string][] = [
      [{ measuredDb: "loud" }, "measuredDb"],
      [{ measuredDb: 400 }, "measuredDb"],
      [{ sections: [] }, "sections"],
      [{ sections: [{ section: "Trumpets", dynamic: "loud" }] }, "sections.0.dynamic"],
      [{ sections: [{ section: "Kazoos", dynamic: "f" }] }, "sections.0.section"],
      [{ setId: "not-an-id" }, "setId"],
      [{ setId: ids.otherShowId }, "setId"], // a uuid, but not a set of this show
      [{ listeningPointId: ids.setIds[1] }, "listeningPointId"],
      [{ takenAt: "yesterday" }, "takenAt"],
      [{ weighting: "Z" }, "weighting"],
      [{ relativeHumidityPct: 140 }, "relativeHumidityPct"],
    ];
    for (const [over, field] of bad) {
      const res = await staff.post(path(), readingBody(ids, over));
      expect(res.status, JSON.stringify(over)).toBe(400);
      expect(Object.keys(res.body.issues ?? {}), JSON.stringify(over)).toContain(field);
    }
    const malformed = await staff.call("POST", path(), undefined, { headers: { "content-type": "application/json" }, raw: "{nope" });
    expect(malformed.status).toBe(400);
    expect((await staff.get(path())).body.readings.length).toBe(before);
  });

  it("answers 404 to a member of another program and 401 without a session", async () => {
    expect((await ids.other.get(path())).status).toBe(404);
    expect((await ids.other.post(path(), readingBody(ids))).status).toBe(404);
    expect((await new Client().post(path(), readingBody(ids))).status).toBe(401);
    expect((await new Client().get(path())).status).toBe(401);
  });
});

describe("DELETE a reading", () => {
  it("lets the recorder or a director remove it, not another member (403)", async () => {
    const a = (await staff.post(path(), readingBody(ids))).body.reading.id as string;
    const b = (await staff.post(path(), readingBody(ids))).body.reading.id as string;
    created.push(a, b);
    expect((await designer.call("DELETE", `${path()}/${a}`)).status).toBe(403);
    expect((await ids.other.call("DELETE", `${path()}/${a}`)).status).toBe(404);
    expect((await staff.call("DELETE", `${path()}/${a}`)).status).toBe(204);
    expect((await ids.director.call("DELETE", `${path()}/${b}`)).status).toBe(204);
    expect((await staff.call("DELETE", `${path()}/${a}`)).status).toBe(404);
    const left = (await staff.get(path())).body.readings.map((r: any) => r.id);
    expect(left).not.toContain(a);
    expect(left).not.toContain(b);
  });
});
