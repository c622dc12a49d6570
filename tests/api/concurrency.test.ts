// No lost update: concurrent saves of one set with one version.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
let designer: Client;

beforeAll(async () => {
  ids = await demoIds();
  designer = await signedIn(DEMO.designer);
});

describe("concurrent saves", () => {
  it("of 20 saves with the same version exactly one succeeds, the rest get 409, and its positions are stored", async () => {
    const path = `/api/shows/${ids.showId}/sets/${ids.setIds.at(-1)}`;
    const before = (await designer.get(path)).body;
    const target = before.positions[0];
    const saves = Array.from({ length: 20 }, (_, i) => ({ ...target, x: -20 + i, y: 5 + i / 2 }));
    const answers = await Promise.all(saves.map((p) => designer.put(`${path}/positions`, { version: before.set.version, positions: [p] })));
    const ok = answers.map((r, i) => ({ r, i })).filter(({ r }) => r.status === 200);
    expect(ok.length).toBe(1);
    expect(answers.filter((r) => r.status === 409).length).toBe(19);
    const after = (await designer.get(path)).body;
    expect(after.set.version).toBe(before.set.version + 1);
    const stored = after.positions.find((p: any) => p.performerId === target.performerId);
    const winner = saves[ok[0]!.i]!;
    expect(stored.x).toBeCloseTo(winner.x, 9);
    expect(stored.y).toBeCloseTo(winner.y, 9);
  });
});
