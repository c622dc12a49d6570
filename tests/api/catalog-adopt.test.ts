// Calibration through the API: fit preview, a director adopts it (new catalog version, stored mixes
// recompute), restore an earlier version; roles and stale versions.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";
import { readingBody, removeReadings } from "./readings-support";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
let designer: Client;
const created: string[] = [];
let startVersion = 0;
const catalog = () => `/api/programs/${ids.programId}/catalog`;
const analysis = () => `/api/shows/${ids.showId}/sets/${ids.setIds[0]}/analysis?listeningPointId=${ids.pressBoxId}`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
  startVersion = (await ids.director.get(`/api/programs/${ids.programId}/catalog`)).body.currentVersion;
  // An evening at the box: trumpets alone twice, tubas alone, both together.
  const bodies = [
    readingBody(ids, { sections: [{ section: "Trumpets", dynamic: "f" }], measuredDb: 78 }),
    readingBody(ids, { sections: [{ section: "Trumpets", dynamic: "mf" }], measuredDb: 73 }),
    readingBody(ids, { sections: [{ section: "Tubas", dynamic: "ff" }], measuredDb: 70 }),
    readingBody(ids, { sections: [{ section: "Trumpets", dynamic: "ff" }, { section: "Tubas", dynamic: "ff" }], measuredDb: 82 }),
  ];
  for (const b of bodies) {
    const res = await staff.post(`/api/shows/${ids.showId}/readings`, b);
    if (res.status !== 201) throw new Error(`reading answered ${res.status}: ${JSON.stringify(res.body)}`);
    created.push(res.body.reading.id);
  }
});
afterAll(async () => {
  await removeReadings(ids.director, ids.showId, created);
  // Put the catalog in force at the start back, should a test have stopped between adopt and restore.
  const now = (await ids.director.get(catalog())).body.currentVersion;
  if (now !== startVersion) await ids.director.post(`${catalog()}/restore`, { version: startVersion, baseVersion: now });
});

describe("catalog fit, adopt and restore", () => {
  it("previews predicted against measured before and after, changing only instruments the readings involve", async () => {
    const fit = await staff.get(`${catalog()}/fit?showId=${ids.showId}`);
    expect(fit.status).toBe(200);
    const mine = fit.body.readings.filter((r: any) => created.includes(r.id));
    expect(mine).toHaveLength(4);
    // Only instruments of sections some reading of the show names (other readings may exist besides ours).
    const all = (await staff.get(`/api/shows/${ids.showId}/readings`)).body.readings;
    const named = new Set(all.flatMap((r: any) => r.sections.map((s: any) => s.section)));
    const involved = new Set(ids.show.performers.filter((p: any) => named.has(p.section)).map((p: any) => p.instrument));
    expect(Object.keys(fit.body.offsetsDb)).toEqual(expect.arrayContaining(["trumpet", "tuba"]));
    for (const k of Object.keys(fit.body.offsetsDb)) expect(involved.has(k), k).toBe(true);
    expect(fit.body.rmsAfterDb).toBeLessThan(fit.body.rmsBeforeDb);
    // A section heard alone moves its instrument by about measured − predicted (Tikhonov shrinks it a little).
    const alone = mine.find((r: any) => r.sections.length === 1 && r.sections[0].section === "Tubas");
    expect(Math.abs(alone.predictedAfterDb - alone.measuredDb)).toBeLessThan(1.5);
    expect(fit.body.instruments.map((i: any) => i.key)).toEqual(Object.keys(fit.body.offsetsDb).sort());
    // Degrees of freedom: readings used minus offsets fitted.
    expect(fit.body.degreesOfFreedom).toBe(fit.body.readings.length - Object.keys(fit.body.offsetsDb).length);
    expect(fit.body.indistinguishable.flat()).not.toContain("tuba");
  });

  it("lets only a director adopt (403 for staff and designer, 404 for another program, 400 with no readings)", async () => {
    const base = (await staff.get(catalog())).body.currentVersion;
    expect((await staff.post(`${catalog()}/adopt`, { baseVersion: base })).status).toBe(403);
    expect((await designer.post(`${catalog()}/adopt`, { baseVersion: base })).status).toBe(403);
    expect((await ids.other.post(`${catalog()}/adopt`, { baseVersion: base })).status).toBe(404);
    expect((await ids.director.post(`${catalog()}/adopt`, { baseVersion: "one" })).status).toBe(400);
    const otherBase = (await ids.other.get(`/api/programs/${ids.otherProgramId}/catalog`)).body.currentVersion;
    expect((await ids.other.post(`/api/programs/${ids.otherProgramId}/catalog/adopt`, { baseVersion: otherBase })).status).toBe(400);
    expect((await staff.get(catalog())).body.currentVersion).toBe(base);
  });

  it("adopts the fit as a new version, after which the stored analysis recomputes; restoring goes back", async () => {
    const before = (await staff.get(catalog())).body;
    const base = before.currentVersion as number;
    const carry0 = before.versions[0].carryDb;
    await ids.director.get(analysis());
    const settled = await ids.director.get(analysis());
    expect(settled.body.reused).toBe(true);
    const totalBefore = settled.body.mix.totalDbA as number;
    const trumpetsBefore = settled.body.mix.sections.Trumpets.dbA as number;

    expect((await ids.director.post(`${catalog()}/adopt`, { baseVersion: base - 1 })).status).toBe(409);
    const fit = (await ids.director.get(`${catalog()}/fit?showId=${ids.showId}`)).body;
    const adopt = await ids.director.post(`${catalog()}/adopt`, { baseVersion: base, showId: ids.showId });
    expect(adopt.status).toBe(201);
    expect(adopt.body.version).toBe(base + 1);
    expect(adopt.body.offsetsDb).toEqual(fit.offsetsDb);

    const after = (await staff.get(catalog())).body;
    expect(after.currentVersion).toBe(base + 1);
    expect(after.versions[0].note).toMatch(/Fit to \d+ box readings/);
    for (const k of Object.keys(carry0)) {
      if (k in fit.offsetsDb) expect(after.versions[0].carryDb[k], k).toBeCloseTo(carry0[k] + fit.offsetsDb[k], 9);
      else expect(after.versions[0].carryDb[k], k).toBe(carry0[k]); // never touched: no reading involves it
    }

    const recomputed = await ids.director.get(analysis());
    expect(recomputed.status).toBe(200);
    expect(recomputed.body.reused).toBe(false);
    // Carry is a plain dB offset on every trumpet, so the Trumpets section at the box moves by exactly the change.
    expect(recomputed.body.mix.sections.Trumpets.dbA - trumpetsBefore).toBeCloseTo(fit.offsetsDb.trumpet, 6);
    // The same readings refitted from the adopted catalog need (almost) nothing more.
    const refit = (await ids.director.get(`${catalog()}/fit?showId=${ids.showId}`)).body;
    expect(refit.baseVersion).toBe(base + 1);
    expect(Math.abs(refit.offsetsDb.trumpet)).toBeLessThan(0.2);

    expect((await staff.post(`${catalog()}/restore`, { version: base, baseVersion: base + 1 })).status).toBe(403);
    expect((await ids.director.post(`${catalog()}/restore`, { version: 9999, baseVersion: base + 1 })).status).toBe(404);
    expect((await ids.director.post(`${catalog()}/restore`, { version: base, baseVersion: base })).status).toBe(409);
    const restore = await ids.director.post(`${catalog()}/restore`, { version: base, baseVersion: base + 1 });
    expect(restore.status).toBe(201);
    expect(restore.body.version).toBe(base + 2);
    const restored = (await staff.get(catalog())).body;
    expect(restored.versions[0].carryDb).toEqual(carry0);
    expect(restored.versions[0].note).toMatch(new RegExp(`Restored version ${base}`));
    const back = await ids.director.get(analysis());
    expect(back.body.reused).toBe(false);
    expect(back.body.mix.totalDbA).toBeCloseTo(totalBefore, 9);
    expect(back.body.mix.sections.Trumpets.dbA).toBeCloseTo(trumpetsBefore, 9);
  });

  it("names the shows an adoption changes, marks the fitted instruments, and undoes it in one call", async () => {
    const start = (await staff.get(catalog())).body;
    const base = start.currentVersion as number;
    const fit = (await staff.get(`${catalog()}/fit?showId=${ids.showId}`)).body;
    // The demo show has trumpets and tubas, the instruments the readings move.
    expect(fit.affectedShows.map((s: any) => s.id)).toContain(ids.showId);
    const demo = fit.affectedShows.find((s: any) => s.id === ids.showId);
    const playing = ids.show.performers.filter((p: any) => Math.abs(fit.offsetsDb[p.instrument] ?? 0) >= 0.05).length;
    expect(demo.performers).toBe(playing);
    // Another program's show is never named.
    expect(fit.affectedShows.every((s: any) => s.id !== ids.otherShowId)).toBe(true);

    const adopt = await ids.director.post(`${catalog()}/adopt`, { baseVersion: base, showId: ids.showId });
    expect(adopt.status).toBe(201);
    expect(adopt.body.affectedShows).toEqual(fit.affectedShows);
    // Each fitted instrument now says so, with the fit's standard error as its uncertainty.
    const adopted = (await staff.get(catalog())).body.versions[0];
    const trumpetFit = fit.instruments.find((i: any) => i.key === "trumpet");
    expect(adopted.provenance.trumpet).toEqual({ kind: "fitted", text: `fitted from ${trumpetFit.readings} box readings`, uncertaintyDb: trumpetFit.stdErrorDb });
    expect(start.versions[0]?.provenance?.trumpet.kind ?? "memory").not.toBe("fitted");
    expect(adopted.provenance.flute.kind).toBe(start.versions[0]?.provenance?.flute.kind ?? "memory");

    expect((await staff.post(`${catalog()}/undo`, { version: adopt.body.version })).status).toBe(403);
    expect((await ids.director.post(`${catalog()}/undo`, { version: adopt.body.version + 5 })).status).toBe(404);
    expect((await ids.director.post(`${catalog()}/undo`, { version: base })).status).toBe(base === 0 ? 400 : 409);
    const undo = await ids.director.post(`${catalog()}/undo`, { version: adopt.body.version });
    expect(undo.status).toBe(201);
    expect(undo.body).toMatchObject({ version: base + 2, undid: base + 1 });
    const after = (await staff.get(catalog())).body;
    expect(after.versions[0].note).toMatch(new RegExp(`Undid version ${base + 1}`));
    // The carries and provenance in force are those before the adoption again.
    const back = (await staff.get(catalog())).body;
    if (start.versions[0]) {
      expect(back.versions[0].carryDb).toEqual(start.versions[0].carryDb);
      expect(back.versions[0].provenance).toEqual(start.versions[0].provenance);
    } else {
      expect(back.versions[0].provenance.trumpet.kind).toBe("memory");
    }
    // Undoing again is stale: the undone version is no longer in force.
    expect((await ids.director.post(`${catalog()}/undo`, { version: adopt.body.version })).status).toBe(409);
  });

  it("lists versions to every member and to no one else", async () => {
    const res = await staff.get(catalog());
    expect(res.status).toBe(200);
    const versions = res.body.versions.map((v: any) => v.version);
    expect(versions).toEqual([...versions].sort((a: number, b: number) => b - a));
    expect((await ids.other.get(catalog())).status).toBe(404);
    expect((await ids.other.get(`${catalog()}/fit`)).status).toBe(404);
    expect((await new Client().get(catalog())).status).toBe(401);
    expect((await staff.get(`${catalog()}/fit?showId=nope`)).status).toBe(400);
  });
});
