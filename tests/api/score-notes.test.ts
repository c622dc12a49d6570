// The notes contract the Listen control reads (GET /api/shows/{id}/score/notes): `{ score: null }`
// while the show has no confirmed score. The answer with a score is checked in score-import.test.ts.
import { beforeAll, describe, expect, it } from "vitest";
import { privateShowCopy } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

describe("GET …/score/notes", () => {
  it("answers { score: null } for a show with no confirmed score", async () => {
    const res = await copy.director.get(`/api/shows/${copy.showId}/score/notes`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ score: null });
  });
});
