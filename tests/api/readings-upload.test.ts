// Box readings by CSV: preview stores nothing, confirm stores every row in one transaction, limits answer 413.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";
import { removeReadings } from "./readings-support";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const created: string[] = [];
const upload = () => `/api/shows/${ids.showId}/readings/upload`;
const count = async () => (await staff.get(`/api/shows/${ids.showId}/readings`)).body.readings.length as number;

const HEADER = "set,point,takenAt,temperatureC,humidityPct,sections,measuredDb,weighting,response,meterHeightM,note";
const row = (set: string, sections: string, level: number | string, extra = "A,slow,18,") => `${set},Press box,2026-09-18T19:40:00-05:00,23.5,58,${sections},${level},${extra}`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});
afterAll(async () => removeReadings(ids.director, ids.showId, created));

describe("POST readings/upload", () => {
  it("previews every row without storing, then stores them all on confirm with the preview's token", async () => {
    const [s1, s2] = ids.show.sets.map((s: any) => s.number);
    const csv = [HEADER, row(s1, "Trumpets: f", 84), row(s2, "Trumpets: ff; Tubas: ff", 90.5, "C,fast,,after the break"), ""].join("\n");
    const before = await count();
    const preview = await staff.post(upload(), { csv });
    expect(preview.status).toBe(200);
    expect(preview.body.stored).toBe(0);
    expect(preview.body.preview.valid).toBe(2);
    expect(preview.body.preview.rows[1].reading).toMatchObject({ weighting: "C", response: "fast", meterHeightM: null, note: "after the break", sections: [{ section: "Trumpets", dynamic: "ff" }, { section: "Tubas", dynamic: "ff" }] });
    expect(await count()).toBe(before);

    const done = await staff.post(upload(), { csv, confirm: preview.body.preview.token });
    expect(done.status).toBe(201);
    expect(done.body.stored).toBe(2);
    created.push(...done.body.ids);
    expect(await count()).toBe(before + 2);
  });

  it("reports bad rows by line in the preview and stores nothing on confirm (400)", async () => {
    const s1 = ids.show.sets[0].number;
    const csv = [HEADER, row(s1, "Trumpets: f", 84), row("999", "Trumpets: f", 84), row(s1, "Kazoos: f", 84), row(s1, "Trumpets: loud", "n/a")].join("\n");
    const preview = await staff.post(upload(), { csv });
    expect(preview.status).toBe(200);
    expect(preview.body.preview.valid).toBe(1);
    const errors = preview.body.preview.rows.map((r: any) => [r.line, r.errors.join(" ")]);
    expect(errors[1][0]).toBe(3);
    expect(errors[1][1]).toMatch(/No set "999"/);
    expect(errors[2][1]).toMatch(/Kazoos/);
    expect(errors[3][1]).toMatch(/dynamic/);
    expect(errors[3][1]).toMatch(/measuredDb/);
    const before = await count();
    const confirm = await staff.post(upload(), { csv, confirm: preview.body.preview.token });
    expect(confirm.status).toBe(400);
    expect(Object.keys(confirm.body.issues)).toEqual(["line 3", "line 4", "line 5"]);
    expect(await count()).toBe(before);
  });

  it("answers 409 when the file changed since the preview, and names missing columns", async () => {
    const s1 = ids.show.sets[0].number;
    const csv = [HEADER, row(s1, "Trumpets: f", 84)].join("\n");
    const token = (await staff.post(upload(), { csv })).body.preview.token;
    const changed = await staff.post(upload(), { csv: csv.replace(",84,", ",94,"), confirm: token });
    expect(changed.status).toBe(409);
    const noLevel = await staff.post(upload(), { csv: "set,point\n1,Press box", confirm: "x" });
    expect(noLevel.status).toBe(409);
    const missing = await staff.post(upload(), { csv: "set,point\n1,Press box" });
    expect(missing.body.preview.headerErrors[0]).toMatch(/Missing columns: takenAt/);
  });

  it("answers 413 over the row limit and over the size limit, storing nothing", async () => {
    const s1 = ids.show.sets[0].number;
    const before = await count();
    const many = [HEADER, ...Array.from({ length: 501 }, () => row(s1, "Trumpets: f", 84))].join("\n");
    expect((await staff.post(upload(), { csv: many })).status).toBe(413);
    const huge = [HEADER, row(s1, "Trumpets: f", 84, `A,slow,18,${"x".repeat(300_000)}`)].join("\n");
    expect((await staff.post(upload(), { csv: huge })).status).toBe(413);
    expect(await count()).toBe(before);
  });

  it("answers 404 to another program and 401 without a session", async () => {
    expect((await ids.other.post(upload(), { csv: HEADER })).status).toBe(404);
    expect((await new Client().post(upload(), { csv: HEADER })).status).toBe(401);
  });
});
