// The director's balance thresholds per show: validated, stored, used by every analysis, and reset.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_TARGETS } from "@/lib/acoustics/targets";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const targetsPath = () => `/api/shows/${ids.showId}/targets`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});
afterAll(async () => {
  await ids.director.put(targetsPath(), { reset: true });
});

describe("balance targets", () => {
  it("start at the documented defaults, readable by staff, changeable only by directors", async () => {
    const read = await staff.get(targetsPath());
    expect(read.status).toBe(200);
    expect(read.body.canEdit).toBe(false);
    expect(read.body.targets.melodyLeadDb).toBe(DEFAULT_TARGETS.melodyLeadDb);
    expect((await staff.put(targetsPath(), { targets: { melodyLeadDb: 5 } })).status).toBe(403);
  });

  it("refuse values out of range and unknown fields, keeping what was stored", async () => {
    for (const targets of [{ melodyLeadDb: 25 }, { arrivalSpreadMs: 0 }, { melodyLeadDb: "3" }, { loudness: 3 }, { pyramidVoices: ["tacet"] }]) {
      const res = await ids.director.put(targetsPath(), { targets });
      expect(res.status, JSON.stringify(targets)).toBe(400);
    }
    expect((await ids.director.get(targetsPath())).body.custom).toBeNull();
  });

  it("are used by the stored analysis, which recomputes when they change", async () => {
    const path = `/api/shows/${ids.showId}/sets/${ids.setIds[2]}/analysis?listeningPointId=${ids.pressBoxId}`;
    await ids.director.get(path);
    const before = await ids.director.get(path);
    expect(before.body.reused).toBe(true);
    const spread = before.body.mix.arrivalSpreadMs as number;
    // With a level window wide enough to take in every player, a limit just above the set's spread passes; just below it fails.
    const wide = { arrivalWindowDb: 40 };
    expect((await ids.director.put(targetsPath(), { targets: { ...wide, arrivalSpreadMs: Math.ceil(spread) + 1 } })).status).toBe(200);
    const passing = await ids.director.get(path);
    expect(passing.body.reused).toBe(false);
    expect(passing.body.checks.find((c: any) => c.id === "arrival-spread").passed).toBe(true);
    expect((await ids.director.put(targetsPath(), { targets: { ...wide, arrivalSpreadMs: Math.max(1, Math.floor(spread) - 1) } })).status).toBe(200);
    const failing = await ids.director.get(path);
    expect(failing.body.checks.find((c: any) => c.id === "arrival-spread").passed).toBe(false);
    expect((await ids.director.put(targetsPath(), { reset: true })).status).toBe(200);
    expect((await ids.director.get(targetsPath())).body.targets.arrivalSpreadMs).toBe(DEFAULT_TARGETS.arrivalSpreadMs);
  });
});
