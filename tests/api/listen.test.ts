// GET …/sets/{setId}/listen: what the Listen control plays, against the demo in real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const setId = (number: string) => ids.show.sets.find((s: any) => s.number === number).id as string;
const path = (number: string, lp = ids.pressBoxId) => `/api/shows/${ids.showId}/sets/${setId(number)}/listen?listeningPointId=${lp}`;
const energy = (levels: number[]) => levels.reduce((s, l) => s + 10 ** (l / 10), 0);

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});

describe("GET listen", () => {
  it("answers one part per section and voice, as written, with the plan's change and an arrival among its players'", async () => {
    const [listen, analysis] = await Promise.all([staff.get(path("7")), staff.get(`/api/shows/${ids.showId}/sets/${setId("7")}/analysis?listeningPointId=${ids.pressBoxId}`)]);
    expect(listen.status).toBe(200);
    const parts = listen.body.parts as any[];
    expect(parts.length).toBeGreaterThan(3);
    expect(new Set(parts.map((p) => p.key)).size).toBe(parts.length);
    const sections = new Set(ids.show.performers.map((p: any) => p.section));
    const arrivals = analysis.body.mix.performers.map((p: any) => p.arrivalMs);
    for (const p of parts) {
      expect(sections.has(p.section)).toBe(true);
      expect(p.key).toBe(`${p.section}|${p.voice}`);
      expect(p.bandsDb).toHaveLength(8);
      expect(p.arrivalMs).toBeGreaterThanOrEqual(Math.min(...arrivals) - 1e-6);
      expect(p.arrivalMs).toBeLessThanOrEqual(Math.max(...arrivals) + 1e-6);
    }
    // The demo's clarinet song (set 7) is planned up: its part is louder with the plan, by the plan's change.
    const clarinets = parts.find((p) => p.section === "Clarinets" && p.voice === "melody");
    const entry = analysis.body.plan.find((e: any) => e.section === "Clarinets" && e.voice === "melody");
    expect(clarinets.planChangeDb).toBeCloseTo(entry.changeDb, 6);
    // As written the clarinets play p: their 1 kHz band is well under the brass chorale's loudest part.
    const brass = Math.max(...parts.filter((p) => p.voice === "accompaniment").map((p) => energy(p.bandsDb)));
    expect(energy(clarinets.bandsDb)).toBeLessThan(brass);
    // The press box hears a crowd (the demo's preset of 55 dBA, speech-shaped): the loudest octave is 250 Hz–1 kHz.
    const bg = listen.body.backgroundOctaveDb as number[];
    expect(bg).toHaveLength(8);
    expect([2, 3, 4]).toContain(bg.indexOf(Math.max(...bg)));
  });

  it("refuses a missing listening point (400) and one of another show (404)", async () => {
    expect((await staff.get(`/api/shows/${ids.showId}/sets/${setId("7")}/listen`)).status).toBe(400);
    expect((await staff.get(path("7", "00000000-0000-4000-8000-000000000000"))).status).toBe(404);
  });
});
