// Hostile numbers and headers in the CSV imports: a position with 0/0 steps is a bad row named by
// its line (it used to reach the database as NaN), and a header naming a column twice is refused
// by name (the later column used to overwrite the earlier). Confirming either answers 400 and writes nothing.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, signedIn } from "../support/api";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

const upload = (kind: "drill" | "roster", content: string) => uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: `${kind}.csv`, content }, { kind });
const confirm = (uploadId: string) => copy.director.post(`/api/shows/${copy.showId}/imports/${uploadId}/confirm`);
const show = async () => (await copy.director.get(`/api/shows/${copy.showId}`)).body;

describe("a drill position with 0/0 steps", () => {
  it("is a bad row with its line in the preview; confirm answers 400 with the line and writes nothing", async () => {
    const csv = [
      "set,counts,label,position",
      '81,8,T1,"side 1: on the 35 yard line; on the front hash"',
      '81,8,T2,"side 1: 0/0 steps outside the 35 yard line; on the front hash"',
    ].join("\n");
    const res = await upload("drill", csv);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.preview.writable).toBe(false);
    expect(res.body.preview.errors).toEqual([{ line: 3, reason: expect.stringMatching(/"0\/0" is not a number of steps/) }]);
    const done = await confirm(res.body.upload.id);
    expect(done.status).toBe(400);
    expect(done.body.issues["line 3"]).toEqual([expect.stringMatching(/0\/0/)]);
    expect((await show()).sets.some((s: any) => s.number === "81")).toBe(false);
    // The upload reads back with the same preview (it used to answer 500 once stored).
    const again = await copy.director.get(`/api/shows/${copy.showId}/imports/${res.body.upload.id}`);
    expect(again.status).toBe(200);
    expect(again.body.preview.errors).toEqual(res.body.preview.errors);
  });
});

describe("a header naming a column twice", () => {
  it("a roster file is refused naming the column; confirm answers 400 and changes no performer", async () => {
    const before = (await show()).performers;
    const res = await upload("roster", "label,instrument,section,strength,Strength\nT1,trumpet,Trumpets,1,-5\n");
    expect(res.body.preview.errors).toEqual([{ line: 1, reason: expect.stringContaining('"strength" twice') }]);
    const done = await confirm(res.body.upload.id);
    expect(done.status).toBe(400);
    expect(done.body.issues["line 1"]).toEqual([expect.stringContaining('"strength" twice')]);
    expect((await show()).performers).toEqual(before);
  });

  it("a drill file is refused naming the column; confirm answers 400 and creates no set", async () => {
    const res = await upload("drill", "set,counts,label,x_m,y_m,Y (m)\n82,8,T1,1,2,30\n");
    expect(res.body.preview.errors).toEqual([{ line: 1, reason: expect.stringContaining('"y_m" twice') }]);
    const done = await confirm(res.body.upload.id);
    expect(done.status).toBe(400);
    expect(done.body.issues["line 1"]).toEqual([expect.stringContaining('"y_m" twice')]);
    expect((await show()).sets.some((s: any) => s.number === "82")).toBe(false);
  });

  describe("the readings CSV", () => {
    let staff: Client;
    beforeAll(async () => {
      staff = await signedIn(DEMO.staff);
    });
    const created: string[] = [];
    afterAll(async () => {
      for (const id of created) await copy.demo.director.call("DELETE", `/api/shows/${copy.demo.showId}/readings/${id}`);
    });

    it("is refused naming the column; confirm answers 400 and stores no reading", async () => {
      const path = `/api/shows/${copy.demo.showId}/readings/upload`;
      const count = async () => (await staff.get(`/api/shows/${copy.demo.showId}/readings`)).body.readings.length as number;
      const set = copy.demo.show.sets[0].number;
      const csv = `set,point,takenAt,temperatureC,humidityPct,sections,measuredDb,measuredDb\n${set},Press box,2026-09-18T19:40:00-05:00,23.5,58,Trumpets: f,84,99\n`;
      const before = await count();
      const preview = await staff.post(path, { csv });
      expect(preview.body.preview.headerErrors).toEqual([expect.stringContaining('"measuredDb" twice')]);
      const done = await staff.post(path, { csv, confirm: preview.body.preview.token });
      if (done.status === 201) created.push(...done.body.ids);
      expect(done.status).toBe(400);
      expect(done.body.issues["header.0"]).toEqual([expect.stringContaining('"measuredDb" twice')]);
      expect(await count()).toBe(before);
    });
  });
});
