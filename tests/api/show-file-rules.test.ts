// A show file is held to the rules of the routes that write the same things (positions, listening
// points, targets, music), to the limits of a show (lib/limits.ts), and refused whole — 400 or 413,
// never 500, nothing written — when it breaks any of them.
import { beforeAll, describe, expect, it } from "vitest";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
}, 60_000);

const showCount = async () => (await copy.director.get(`/api/programs/${copy.programId}/shows`)).body.shows.length as number;
const importText = (content: string) => uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "show.json", content, type: "application/json" });

/** The demo's export with one change made to it. */
function changed(change: (doc: any) => void): string {
  const doc = structuredClone(copy.original);
  change(doc);
  return JSON.stringify(doc);
}

async function refused(content: string, status: number) {
  const before = await showCount();
  const res = await importText(content);
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(status);
  expect(typeof res.body.error).toBe("string");
  expect(await showCount()).toBe(before);
  return res.body as { error: string; issues?: Record<string, string[]> };
}

describe("the show file keeps the rules of the routes", () => {
  it("the demo's own export is still accepted", async () => {
    const res = await importText(JSON.stringify(copy.original));
    expect(res.status).toBe(201);
  });

  it("refuses a position far off the field, as PUT positions does (x = 1e308)", async () => {
    const body = await refused(changed((d) => (d.sets[1].positions[0].x = 1e308)), 400);
    expect(body.issues?.["sets.1.positions.0.x"]?.join(" ")).toMatch(/off the field/);
  });

  it("refuses a listening point out of reach (z = 1e308), which would make every analysis null", async () => {
    const body = await refused(changed((d) => (d.listeningPoints[0].z = 1e308)), 400);
    expect(Object.keys(body.issues ?? {})).toContain("listeningPoints.0.z");
  });

  it("refuses check targets that are not the targets PUT /targets takes (1 MB of junk)", async () => {
    const body = await refused(changed((d) => (d.show.checkTargets = { junk: "x".repeat(1_000_000) })), 400);
    expect(JSON.stringify(body.issues)).toContain("junk");
    await refused(changed((d) => (d.show.checkTargets = { melodyLeadDb: "loud" })), 400);
  });

  it("refuses an array nested 20,000 deep with 400, not 500", async () => {
    const deep = "[".repeat(20_000) + "]".repeat(20_000);
    const text = changed((d) => (d.show.checkTargets = "DEEP")).replace('"DEEP"', deep);
    const body = await refused(text, 400);
    expect(body.error).toMatch(/levels deep/);
  });

  it("refuses two solos for one performer in one phrase with 400, not 500", async () => {
    const body = await refused(
      changed((d) => {
        const solo = { label: d.performers[0].label, voice: "melody", writtenDynamic: "f", playedDynamic: null, note: "" };
        d.phrases[0].overrides = [solo, { ...solo, writtenDynamic: "p" }];
      }),
      400,
    );
    expect(JSON.stringify(body.issues)).toContain(`${copy.original.performers[0].label} has two solos`);
  });

  it("refuses keys it does not know, naming them, instead of dropping them", async () => {
    const body = await refused(
      changed((d) => {
        d.show.colour = "blue";
        d.sets[0].positions[0].zIndex = 3;
      }),
      400,
    );
    expect(body.error).toContain("show.colour");
    expect(body.error).toContain("sets.0.positions.0.zIndex");
  });

  it("refuses a show larger than a show may be with 413 (more than 500 performers)", async () => {
    const body = await refused(
      changed((d) => {
        const model = d.performers[0];
        d.performers = Array.from({ length: 501 }, (_, i) => ({ ...model, label: `Q${i}` }));
        // Otherwise valid: no positions or music that would name the performers replaced.
        for (const s of d.sets) s.positions = [];
        d.phrases = [];
      }),
      413,
    );
    expect(body.error).toMatch(/at most 500 performers/);
  });
});
