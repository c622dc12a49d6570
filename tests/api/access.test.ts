// The role model on every route of shared/API.md: anonymous 401, another program 404, staff 403 on writes.
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
const as: Record<string, Client> = {};

beforeAll(async () => {
  ids = await demoIds();
  as.anonymous = new Client();
  as.director = ids.director;
  as.designer = await signedIn(DEMO.designer);
  as.staff = await signedIn(DEMO.staff);
  as.other = ids.other;
});

const reads = () => [
  `/api/programs/${ids.programId}`,
  `/api/programs/${ids.programId}/shows`,
  `/api/shows/${ids.showId}`,
  `/api/shows/${ids.showId}/sets/${ids.setIds[0]}`,
  `/api/shows/${ids.showId}/sets/${ids.setIds[0]}/mix-input`,
  `/api/shows/${ids.showId}/sets/${ids.setIds[0]}/analysis?listeningPointId=${ids.pressBoxId}`,
];

describe("reads", () => {
  it("anonymous callers get 401 JSON", async () => {
    for (const path of [...reads(), "/api/me"]) {
      const res = await as.anonymous!.get(path);
      expect(res.status, path).toBe(401);
      expect(typeof res.body.error, path).toBe("string");
    }
  });

  it("a member of another program gets 404, with no data", async () => {
    for (const path of reads()) {
      const res = await as.other!.get(path);
      expect(res.status, path).toBe(404);
      expect(Object.keys(res.body), path).toEqual(["error"]);
    }
  });

  it("an unknown id answers exactly like another program's id", async () => {
    const unknown = "00000000-0000-4000-8000-000000000000";
    const a = await as.director!.get(`/api/shows/${unknown}`);
    const b = await as.director!.get(`/api/shows/${ids.otherShowId}`);
    expect(a.status).toBe(404);
    expect(b).toMatchObject({ status: 404, body: a.body });
    expect((await as.director!.get(`/api/shows/not-a-uuid`)).status).toBe(404);
  });

  it("every role of the program reads everything", async () => {
    for (const who of ["director", "designer", "staff"]) {
      for (const path of reads()) expect((await as[who]!.get(path)).status, `${who} ${path}`).toBe(200);
    }
  });
});

describe("writes", () => {
  async function putSame(who: string) {
    const set = (await as.director!.get(`/api/shows/${ids.showId}/sets/${ids.setIds[1]}`)).body;
    const first = set.positions[0];
    return as[who]!.put(`/api/shows/${ids.showId}/sets/${ids.setIds[1]}/positions`, { version: set.set.version, positions: [first] });
  }

  it("anonymous 401, other program 404, staff 403, designer and director 200", async () => {
    expect((await putSame("anonymous")).status).toBe(401);
    expect((await putSame("other")).status).toBe(404);
    expect((await putSame("staff")).status).toBe(403);
    expect((await putSame("designer")).status).toBe(200);
    expect((await putSame("director")).status).toBe(200);
  });

  it("refuses a cross-site write by its Origin", async () => {
    const set = (await as.director!.get(`/api/shows/${ids.showId}/sets/${ids.setIds[1]}`)).body;
    const res = await as.director!.call("PUT", `/api/shows/${ids.showId}/sets/${ids.setIds[1]}/positions`, { version: set.set.version, positions: [] }, { headers: { origin: "https://elsewhere.example" } });
    expect(res.status).toBe(403);
    const after = (await as.director!.get(`/api/shows/${ids.showId}/sets/${ids.setIds[1]}`)).body;
    expect(after.set.version).toBe(set.set.version);
  });
});
