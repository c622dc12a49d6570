// The analysis answer's loudness (ISO 532-1, model version 2) on the demo, in real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
const setId = (number: string) => ids.show.sets.find((s: any) => s.number === number).id as string;
const analysisPath = (number: string) => `/api/shows/${ids.showId}/sets/${setId(number)}/analysis?listeningPointId=${ids.pressBoxId}`;

beforeAll(async () => {
  ids = await demoIds();
  staff = await signedIn(DEMO.staff);
});

describe("GET analysis: loudness at the listening point", () => {
  it("answers the band's sones and phons and, for every voice in the mix, its sones, share and whether it is heard", async () => {
    const res = await staff.get(analysisPath("7"));
    expect(res.status).toBe(200);
    expect(res.body.modelVersion).toBe(MODEL_VERSION);
    const { loudness, mix } = res.body;
    expect(loudness.totalSone).toBeGreaterThan(0);
    expect(loudness.totalPhon).toBeGreaterThan(40);
    expect(loudness.backgroundSone).toBe(0); // the demo's press box has no background yet
    expect(Object.keys(loudness.voices).sort()).toEqual(Object.keys(mix.voices).sort());
    for (const v of Object.values<any>(loudness.voices)) {
      expect(Object.keys(v).sort()).toEqual(["heard", "marginDb", "phon", "shareSone", "sone"]);
      expect(typeof v.heard).toBe("boolean");
      expect(v.shareSone).toBeGreaterThanOrEqual(0);
      expect(v.shareSone).toBeLessThanOrEqual(loudness.totalSone);
    }
    // The existing fields stay as they were.
    expect(typeof mix.totalDbA).toBe("number");
    expect(res.body.checks).toHaveLength(6);
  });
});
