// Show files: export → import → export gives the same document (no ids in it), and a damaged or
// foreign file is refused with nothing written.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, signedIn } from "../support/api";
import { appDatabase } from "../support/database";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;

describe("export", () => {
  it("is one versioned document with the whole show and no ids", async () => {
    const doc = copy.original;
    expect(doc).toMatchObject({ format: "farfield-show", version: 1 });
    expect(JSON.stringify(doc)).not.toMatch(UUID);
    expect(doc.performers.length).toBeGreaterThan(60);
    expect(doc.sets.length).toBeGreaterThan(10);
    expect(doc.sets[0].positions.length).toBe(doc.performers.length);
    expect(doc.phrases.length).toBeGreaterThan(0);
    expect(doc.phrases[0].voices.length).toBeGreaterThan(0);
    expect(doc.listeningPoints.map((l: any) => l.name)).toContain("Press box");
    expect(doc.show.conditions).toEqual({ temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325, groundFactor: 1, betweenGroundFactor: null });
  });

  it("export → import → export is the same document apart from ids", async () => {
    const again = await copy.director.get(`/api/shows/${copy.showId}/export`);
    expect(again.status).toBe(200);
    expect(again.headers.get("content-disposition")).toMatch(/attachment; filename=".+\.farfield\.json"/);
    expect(again.body).toEqual(copy.original);
  });

  it("keeps adopted played dynamics through the round trip", async () => {
    const db = appDatabase();
    try {
      // Adopt a played dynamic in the copy, then copy the copy.
      await db`update voice_assignments set played_dynamic = 'ff' where phrase_id = (select id from phrases where show_id = ${copy.showId} order by "order" limit 1) and section = 'Clarinets'`;
    } finally {
      await db.end();
    }
    const first = await copy.director.get(`/api/shows/${copy.showId}/export`);
    const voice = first.body.phrases[0].voices.find((v: any) => v.section === "Clarinets");
    expect(voice.playedDynamic).toBe("ff");
    const imported = await uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "copy.json", content: JSON.stringify(first.body) }, { name: "Second copy" });
    expect(imported.status).toBe(201);
    const second = await copy.director.get(`/api/shows/${imported.body.show.id}/export`);
    expect(second.body).toEqual({ ...first.body, show: { ...first.body.show, name: "Second copy" } });
  });

  it("the imported file is kept with who sent it", async () => {
    const db = appDatabase();
    try {
      const rows = await db`select kind, file_name, size_bytes, content, uploaded_by from uploads where show_id = ${copy.showId}`;
      expect(rows).toHaveLength(1);
      expect(rows[0]!.kind).toBe("show-json");
      expect(JSON.parse(Buffer.from(rows[0]!.content).toString("utf8"))).toEqual(copy.original);
      expect(rows[0]!.uploaded_by).toBeTruthy();
    } finally {
      await db.end();
    }
  });
});

describe("a file that is not a good show file", () => {
  const showCount = async () => (await copy.director.get(`/api/programs/${copy.programId}/shows`)).body.shows.length as number;
  const importText = (content: string) => uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "bad.json", content });

  it.each([
    ["cut short", (d: string) => d.slice(0, d.length / 2), /damaged: it is not valid JSON/],
    ["foreign JSON", () => JSON.stringify({ type: "FeatureCollection", features: [] }), /not a Farfield show file/],
    ["a CSV", () => "set,counts,label\n1,0,T1\n", /damaged: it is not valid JSON/],
    ["a newer version", (d: string) => JSON.stringify({ ...JSON.parse(d), version: 7 }), /version 7, newer/],
    ["a field of the wrong type", (d: string) => JSON.stringify({ ...JSON.parse(d), sets: "many" }), /damaged: some of its contents/],
  ])("%s is refused and nothing is written", async (_what, damage, message) => {
    const before = await showCount();
    const res = await importText(damage(JSON.stringify(copy.original)));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(message);
    expect(await showCount()).toBe(before);
  });

  it("a position for someone not on the roster is named in the answer", async () => {
    const doc = structuredClone(copy.original);
    doc.sets[2].positions[0].label = "ZZ99";
    const res = await importText(JSON.stringify(doc));
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.issues)).toContain("ZZ99, who is not on the roster");
  });

  it("staff may not import; another program's director gets 404", async () => {
    const staff = await signedIn(DEMO.staff);
    const path = `/api/programs/${copy.demo.programId}/shows/import`;
    expect((await uploadFile(staff, path, { name: "s.json", content: JSON.stringify(copy.original) })).status).toBe(403);
    expect((await uploadFile(copy.director, path, { name: "s.json", content: JSON.stringify(copy.original) })).status).toBe(404);
  });
});
