// The score in, through the API: upload → preview → confirm on a private copy of the demo show, with
// the demo's own arrangement (public/examples/lanterns-on-the-water.musicxml), the 4xx answers a
// director can act on, and the notes the Listen control reads afterwards. Counts per the meter rule
// (common practice, no source); MIDI numbers per MIDI 1.0 (A4 = 69); tempo per MusicXML 4.0 <sound
// tempo> (quarter notes a minute).
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { LANTERNS_FILE } from "@/db/demo/lanterns-score";
import { privateShowCopy, uploadFile } from "../support/upload";

const FILE = readFileSync(LANTERNS_FILE);
let copy: Awaited<ReturnType<typeof privateShowCopy>>;
let show: any;
beforeAll(async () => {
  copy = await privateShowCopy();
  show = (await copy.director.get(`/api/shows/${copy.showId}`)).body;
});

const upload = (content: string | Uint8Array, name = "lanterns.musicxml", fields: Record<string, string> = {}) =>
  uploadFile(copy.director, `/api/shows/${copy.showId}/score`, { name, content, type: "application/vnd.recordare.musicxml+xml" }, fields);
const setId = (number: string) => show.sets.find((s: any) => s.number === number).id as string;

describe("refused uploads say what to do", () => {
  it("refuses a CSV, a timewise score and HTML with 400 and a sentence, and keeps nothing", async () => {
    const before = (await copy.director.get(`/api/shows/${copy.showId}/imports`)).body.uploads.length;
    const csv = await upload("label,instrument\nT1,trumpet\n", "roster.csv");
    expect(csv.status).toBe(400);
    expect(csv.body.error).toMatch(/not well-formed XML|not MusicXML|MusicXML/);
    const timewise = await upload('<?xml version="1.0"?><score-timewise version="4.0"><part-list/></score-timewise>');
    expect(timewise.status).toBe(400);
    expect(timewise.body.error).toMatch(/Export it again as ordinary \(partwise\) MusicXML/);
    expect(timewise.body.issues.file).toHaveLength(1);
    const html = await upload("<html><body>hello</body></html>", "page.xml");
    expect(html.status).toBe(400);
    expect(html.body.error).toMatch(/not a MusicXML score/);
    expect((await copy.director.get(`/api/shows/${copy.showId}/imports`)).body.uploads.length).toBe(before);
  });

  it("refuses a section the show does not have and an empty list of anchors", async () => {
    const bad = await upload(FILE, "lanterns.musicxml", { mapping: JSON.stringify({ P1: "Kazoos" }) });
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/“Kazoos” is not a section of this show's roster/);
    const none = await upload(FILE, "lanterns.musicxml", { anchors: "[]" });
    expect(none.status).toBe(400);
    expect(none.body.error).toMatch(/Anchor at least one set/);
    const badMeasure = await upload(FILE, "lanterns.musicxml", { anchors: JSON.stringify([{ setId: setId("1"), measure: "300", beat: 1 }]) });
    expect(badMeasure.status).toBe(400);
    expect(badMeasure.body.error).toMatch(/no measure 300/);
  });
});

describe("upload → preview → confirm", () => {
  let uploadId: string;
  let phrasesBefore: any;

  it("previews the demo arrangement: parts suggested to sections, set 1 on measure 1, a dynamic for every section at every set", async () => {
    phrasesBefore = (await copy.director.get(`/api/shows/${copy.showId}/music`)).body;
    const res = await upload(FILE);
    expect(res.status).toBe(201);
    uploadId = res.body.upload.id;
    const p = res.body.preview;
    expect(p.score.title).toBe("Lanterns on the Water");
    expect(p.score.parts.find((x: any) => x.name === "Trumpet in B♭ 1").suggested).toBe("Trumpets");
    expect(p.score.parts.find((x: any) => x.name === "Marimba").suggested).toBe("Front Ensemble");
    expect(p.anchors).toEqual([{ setId: setId("1"), measure: "1", beat: 1 }]);
    expect(p.written).toHaveLength(show.sets.length);
    for (const s of p.written) for (const section of p.sections) expect(s.written[section], `set ${s.number}, ${section}`).toMatch(/^(pp|p|mp|mf|f|ff|fff)$/);
    expect(p.phrases.map((x: any) => x.name)).toEqual(phrasesBefore.phrases.map((x: any) => x.name));
    expect(p.hints).toContainEqual({ part: "Trumpet in B♭ 1", section: "Trumpets", measure: "47", text: "Solo" });
    // Nothing written yet.
    expect((await copy.director.get(`/api/shows/${copy.showId}/score`)).body).toEqual({ score: null });
  });

  it("previews again with a part left out and a later anchor, writing nothing", async () => {
    const res = await copy.director.post(`/api/shows/${copy.showId}/score/${uploadId}/preview`, {
      mapping: { P6: null, P7: null },
      anchors: [
        { setId: setId("1"), measure: "1", beat: 1 },
        { setId: setId("12"), measure: "65", beat: 1 },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.preview.mapping.P6).toBeNull();
    expect(res.body.preview.notes.join(" ")).toMatch(/No part is mapped to Trumpets/);
    const unknown = await copy.director.post(`/api/shows/${copy.showId}/score/${uploadId}/preview`, { mapping: { P99: "Trumpets" } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error).toMatch(/no part with the id P99/);
  });

  it("confirms in one write, keeps the upload, links the score, and answers 409 the second time", async () => {
    const staff = await (await import("../support/api")).signedIn((await import("../support/api")).DEMO.staff);
    expect((await staff.post(`/api/shows/${copy.showId}/score/${uploadId}/confirm`, {})).status).toBe(404);
    const res = await copy.director.post(`/api/shows/${copy.showId}/score/${uploadId}/confirm`, {});
    expect(res.status).toBe(200);
    expect(res.body.summary.phrases).toBe(phrasesBefore.phrases.length);
    const after = (await copy.director.get(`/api/shows/${copy.showId}/music`)).body;
    // The demo's music already says what its score says: the same phrases and written dynamics.
    const written = (m: any) => m.assignments.map((a: any) => [m.phrases.find((p: any) => p.id === a.phraseId).name, a.section, a.voice, a.writtenDynamic]).sort();
    expect(written(after)).toEqual(written(phrasesBefore));
    expect(after.overrides.length).toBe(phrasesBefore.overrides.length);
    const summary = (await copy.director.get(`/api/shows/${copy.showId}/score`)).body.score;
    expect(summary.fileName).toBe("lanterns.musicxml");
    expect(summary.parts.find((p: any) => p.id === "P16").section).toBe("Front Ensemble");
    expect(summary.anchors[0].setNumber).toBe("1");
    const uploads = (await copy.director.get(`/api/shows/${copy.showId}/imports`)).body.uploads;
    expect(uploads.find((u: any) => u.id === uploadId).confirmedAt).not.toBeNull();
    const again = await copy.director.post(`/api/shows/${copy.showId}/score/${uploadId}/confirm`, {});
    expect(again.status).toBe(409);
  });

  it("gives the Listen control each section's notes and the tempo on the show's count line", async () => {
    const res = await copy.director.get(`/api/shows/${copy.showId}/score/notes`);
    expect(res.status).toBe(200);
    const { tempo, sections } = res.body.score;
    // ♩ = 144 from set 1; the ballad (set 7, count 136) ♩ = 72; the procession (set 12, count 256)
    // in 6/8 at ♩. = 120, which MusicXML writes as <sound tempo="180"> quarter notes a minute.
    expect(tempo[0]).toEqual({ atCount: 0, bpm: 144 });
    expect(tempo).toContainEqual({ atCount: 136, bpm: 72 });
    expect(tempo).toContainEqual({ atCount: 256, bpm: 120 });
    expect(Object.keys(sections).sort()).toEqual([...new Set(show.performers.map((p: any) => p.section))].sort());
    // The pickup (one count before set 1) is left out; the trumpets' first note is on set 1.
    const trumpets = sections.Trumpets.notes;
    expect(trumpets[0].atCount).toBe(0);
    expect(trumpets.every((n: any) => n.midi >= 0 && n.midi <= 127 && n.lengthCounts > 0)).toBe(true);
    // The last set (17, count 368) is the final chord, a whole 6/8 measure: two counts.
    expect(sections.Tubas.notes.at(-1)).toMatchObject({ atCount: 368, lengthCounts: 2 });
  });
});
