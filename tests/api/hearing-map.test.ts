// The hearing map of a set through the API: every placed performer, doses against NIOSH and OSHA.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const hearing = (q = "") => `/api/shows/${ids.showId}/sets/${ids.setIds[0]}/hearing${q}`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});

describe("GET hearing", () => {
  it("answers each placed performer's level and doses, the dose scaling with the rehearsal's length", async () => {
    const set = (await staff.get(`/api/shows/${ids.showId}/sets/${ids.setIds[0]}`)).body;
    const [a, b] = await Promise.all([staff.get(hearing("?minutes=60")), staff.get(hearing("?minutes=180"))]);
    expect(a.status).toBe(200);
    expect(a.body.performers).toHaveLength(set.positions.length);
    expect(a.body.criteria.niosh).toMatchObject({ levelDbA: 85, hours: 8, exchangeDb: 3 });
    expect(a.body.criteria.osha).toMatchObject({ levelDbA: 90, hours: 8, exchangeDb: 5 });
    for (const p of a.body.performers) {
      expect(Number.isFinite(p.dbA)).toBe(true);
      // NIOSH 98-126: T = 480 min / 2^((L − 85)/3); the level is rounded to 0.1 dB in the answer.
      expect(p.niosh.limitMinutes / (480 / 2 ** ((p.dbA - 85) / 3))).toBeCloseTo(1, 1);
      expect(p.niosh.dose).toBeCloseTo(60 / p.niosh.limitMinutes, 9);
      const q = b.body.performers.find((x: any) => x.performerId === p.performerId);
      expect(q.niosh.dose).toBeCloseTo(3 * p.niosh.dose, 9);
    }
  });

  it("answers 400 for a bad rehearsal length, 404 to another program, 401 without a session", async () => {
    expect((await staff.get(hearing("?minutes=0"))).status).toBe(400);
    expect((await staff.get(hearing("?minutes=abc"))).status).toBe(400);
    expect((await ids.other.get(hearing())).status).toBe(404);
    expect((await new Client().get(hearing())).status).toBe(401);
  });
});
