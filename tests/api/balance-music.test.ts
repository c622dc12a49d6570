// The music API: phrases, bulk section changes and overrides; directors and designers edit, staff read.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
let designer: Client;
const musicPath = () => `/api/shows/${ids.showId}/music`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
});

describe("GET music", () => {
  it("answers phrases over the sets, sections, assignments and overrides; staff may read, not edit", async () => {
    const res = await staff.get(musicPath());
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ canEdit: false, canAdopt: false });
    expect(res.body.phrases.length).toBeGreaterThan(3);
    const solo = res.body.phrases.find((p: any) => p.name === "Trumpet solo");
    expect(res.body.overrides.some((o: any) => o.phraseId === solo.id && o.voice === "melody")).toBe(true);
    const d = await designer.get(musicPath());
    expect(d.body).toMatchObject({ canEdit: true, canAdopt: false });
    expect((await ids.director.get(musicPath())).body).toMatchObject({ canEdit: true, canAdopt: true });
    expect((await ids.other.get(musicPath())).status).toBe(404);
  });
});

describe("bulk changes", () => {
  it("sets the written dynamic of several selected rows at once and keeps the others", async () => {
    const before = (await designer.get(musicPath())).body;
    const phrase = before.phrases.find((p: any) => p.name === "Harbor theme");
    const rowsOf = (m: any) => m.assignments.filter((a: any) => a.phraseId === phrase.id);
    const [a, b, untouched] = rowsOf(before);
    const res = await designer.call("PATCH", `${musicPath()}/assignments`, { rows: [a, b].map((r: any) => ({ phraseId: r.phraseId, section: r.section })), writtenDynamic: "ff" });
    expect(res.status).toBe(200);
    const after = rowsOf((await designer.get(musicPath())).body);
    expect(after.find((r: any) => r.section === a.section)).toMatchObject({ voice: a.voice, writtenDynamic: "ff" });
    expect(after.find((r: any) => r.section === b.section)).toMatchObject({ voice: b.voice, writtenDynamic: "ff" });
    expect(after.find((r: any) => r.section === untouched.section)).toEqual(untouched);
    for (const r of [a, b]) {
      await designer.call("PATCH", `${musicPath()}/assignments`, { rows: [{ phraseId: r.phraseId, section: r.section }], writtenDynamic: r.writtenDynamic });
    }
    const restored = rowsOf((await designer.get(musicPath())).body);
    expect(restored.find((r: any) => r.section === a.section).writtenDynamic).toBe(a.writtenDynamic);
  });

  it("lists the sections in score order: woodwinds, brass, battery, front ensemble", async () => {
    const names = (await designer.get(musicPath())).body.sections.map((s: any) => s.name);
    expect(names.slice(0, 2)).toEqual(["Flutes", "Clarinets"]);
    expect(names.indexOf("Bari Sax")).toBeLessThan(names.indexOf("Trumpets"));
    expect(names.indexOf("Tubas")).toBeLessThan(names.indexOf("Snares"));
    expect(names.at(-1)).toBe("Front Ensemble");
  });

  it("refuses staff (403), a dynamic that does not exist (400) and a phrase of another show (400)", async () => {
    const m = (await designer.get(musicPath())).body;
    const row = { phraseId: m.phrases[0].id, section: m.sections[0].name };
    expect((await staff.call("PATCH", `${musicPath()}/assignments`, { rows: [row], voice: "melody" })).status).toBe(403);
    const bad = await designer.call("PATCH", `${musicPath()}/assignments`, { rows: [row], writtenDynamic: "fffff" });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.writtenDynamic).toBeTruthy();
    const foreign = await designer.call("PATCH", `${musicPath()}/assignments`, { rows: [{ ...row, phraseId: "00000000-0000-4000-8000-000000000000" }], voice: "melody" });
    expect(foreign.status).toBe(400);
  });
});

describe("overrides and phrases", () => {
  it("sets a player laying out in a phrase, and removes the override again", async () => {
    const m = (await designer.get(musicPath())).body;
    const phrase = m.phrases.find((p: any) => p.name === "Fanfare");
    const player = m.performers.find((p: any) => p.section === "Trumpets");
    const put = await designer.put(`${musicPath()}/overrides`, { overrides: [{ phraseId: phrase.id, performerId: player.id, voice: "tacet", writtenDynamic: "p", note: "Lays out to rest" }] });
    expect(put.status).toBe(200);
    const saved = (await staff.get(musicPath())).body.overrides.find((o: any) => o.phraseId === phrase.id && o.performerId === player.id);
    expect(saved).toMatchObject({ voice: "tacet", note: "Lays out to rest", playedDynamic: null });
    const del = await designer.call("DELETE", `${musicPath()}/overrides`, { phraseId: phrase.id, performerId: player.id });
    expect(del.status).toBe(204);
    expect((await designer.call("DELETE", `${musicPath()}/overrides`, { phraseId: phrase.id, performerId: player.id })).status).toBe(404);
  });

  it("creates a phrase over a span of sets, refuses a backward span, and deletes it", async () => {
    const sets = ids.show.sets;
    const back = await designer.post(`${musicPath()}/phrases`, { name: "Backward", firstSetId: sets[3].id, lastSetId: sets[1].id });
    expect(back.status).toBe(400);
    const made = await designer.post(`${musicPath()}/phrases`, { name: "Coda sketch", firstSetId: sets[sets.length - 1].id, lastSetId: sets[sets.length - 1].id });
    expect(made.status).toBe(201);
    expect((await staff.call("DELETE", `${musicPath()}/phrases/${made.body.phrase.id}`)).status).toBe(403);
    expect((await designer.call("DELETE", `${musicPath()}/phrases/${made.body.phrase.id}`)).status).toBe(204);
    expect((await designer.call("DELETE", `${musicPath()}/phrases/${made.body.phrase.id}`)).status).toBe(404);
  });
});
