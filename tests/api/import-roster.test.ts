// Roster CSV: creates and changes by label, bad rows named by line with nothing written, 413 past
// the limits, and the example file of public/examples importing cleanly.
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

const upload = (content: string) => uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: "roster.csv", content }, { kind: "roster" });
const confirm = (id: string) => copy.director.post(`/api/shows/${copy.showId}/imports/${id}/confirm`);
const roster = async () => Object.fromEntries((await copy.director.get(`/api/shows/${copy.showId}`)).body.performers.map((p: any) => [p.label, p]));

describe("roster import", () => {
  it("previews creates and changes, then writes them on confirm", async () => {
    const before = await roster();
    const csv = [
      "label,instrument,section,part,strength,name",
      `T1,trumpet,Trumpets,1st,${before.T1.strengthDb},${before.T1.name}`, // unchanged
      "T2,trumpet,Trumpets,lead,2,Gale Winterbourne", // changed part, strength, name
      "XT1,Trumpet,Trumpets,3rd,-2,", // new; the catalog's name is accepted for the key
      "XS1,alto-sax,Alto Saxes,,0,Rue Penhallow",
    ].join("\n");
    const res = await upload(csv);
    expect(res.status).toBe(201);
    const p = res.body.preview;
    expect(p).toMatchObject({ kind: "roster-csv", rows: 4, errors: [], writable: true });
    expect(p.roster.unchanged).toBe(1);
    expect(p.roster.creates.map((c: any) => [c.label, c.instrument, c.strengthDb, c.name])).toEqual([
      ["XT1", "trumpet", -2, null],
      ["XS1", "alto-sax", 0, "Rue Penhallow"],
    ]);
    expect(p.roster.changes).toEqual([
      {
        label: "T2",
        line: 3,
        fields: [
          { field: "part", from: before.T2.part, to: "lead" },
          { field: "strengthDb", from: before.T2.strengthDb, to: 2 },
          { field: "name", from: before.T2.name, to: "Gale Winterbourne" },
        ],
      },
    ]);
    expect((await roster()).XT1).toBeUndefined();

    const done = await confirm(res.body.upload.id);
    expect(done.body.summary).toEqual({ created: 2, changed: 1, unchanged: 1 });
    const after = await roster();
    expect(after.XT1).toMatchObject({ instrument: "trumpet", section: "Trumpets", part: "3rd", strengthDb: -2 });
    expect(after.T2).toMatchObject({ part: "lead", strengthDb: 2 });
    expect(Object.keys(after).length).toBe(Object.keys(before).length + 2);
  });

  it("names every bad row and writes nothing, not even the good rows", async () => {
    const csv = [
      "Label,Instrument,Section,Part,Strength,Name",
      "YA1,alto-sax,Alto Saxes,,0,Good Row",
      "YA2,kazoo,Alto Saxes,,0,",
      "YA3,alto-sax,,,9,",
      "YA1,alto-sax,Alto Saxes,,0,Twice",
      "Y A/4,alto-sax,Alto Saxes,,0,",
    ].join("\r\n");
    const res = await upload(csv);
    expect(res.body.preview.errors).toEqual([
      { line: 3, reason: 'instrument "kazoo" is not in the program\'s catalog' },
      { line: 4, reason: 'section is empty; strength "9" must be a number of dB from -6 (weak) to 6 (strong)' },
      { line: 5, reason: "label YA1 is already on line 2" },
      { line: 6, reason: 'label "Y A/4" must be 1–16 letters or digits (e.g. T4)' },
    ]);
    expect((await confirm(res.body.upload.id)).status).toBe(400);
    expect((await roster()).YA1).toBeUndefined();
  });

  it("the example file imports without errors", async () => {
    const res = await upload(readFileSync("public/examples/roster.csv", "utf8"));
    expect(res.body.preview.errors).toEqual([]);
    expect(res.body.preview.rows).toBe(12);
  });

  it("refuses more than 1000 rows with 413", async () => {
    const rows = Array.from({ length: 1001 }, (_, i) => `Z${i},flute,Flutes,,0,`);
    const res = await upload(["label,instrument,section,part,strength,name", ...rows].join("\n"));
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/at most 1000 rows/);
  });
});
