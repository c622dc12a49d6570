// Database outage, app restarts and two app processes on one database, each on a private cluster.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, uniqueEmail } from "../support/api";
import { launchBrowser } from "../support/browser";
import { createCluster, startApp, type App, type Cluster } from "../support/stack";
import { signUp } from "../support/sign-up";

let cluster: Cluster;
let a: App;
let b: App;
let client: Client;

beforeAll(async () => {
  cluster = await createCluster("faults");
  [a, b] = await Promise.all([startApp(cluster.url), startApp(cluster.url)]);
  client = new Client(a.url);
  const res = await signUp(client, { name: "Fault Check", email: uniqueEmail("faults"), password: "fault-check-pass", programName: "Fault Band" });
  expect(res.status).toBe(201);
}, 120_000);

afterAll(async () => {
  await Promise.all([a?.stop(), b?.stop()]);
  cluster?.remove();
});

describe("two app processes on one database", () => {
  it("a session made on one is valid on the other", async () => {
    const onB = new Client(b.url);
    onB.cookie = client.cookie;
    const me = await onB.get("/api/me");
    expect(me.status).toBe(200);
    expect(me.body.memberships[0].programName).toBe("Fault Band");
  });

  it("an analysis kept by one process is not served after a save on the other", async () => {
    const programId = (await client.get("/api/me")).body.memberships[0].programId;
    const made = (await client.post(`/api/programs/${programId}/shows`, { name: "Two Process Show" })).body.show;
    const setPath = `/api/shows/${made.id}/sets/${made.firstSetId}`;
    const pressBox = (await client.get(`/api/shows/${made.id}`)).body.listeningPoints[0].id;
    const performerId = (await client.post(`/api/shows/${made.id}/performers`, { instrument: "trumpet" })).body.performers[0].id;
    const save = (on: Client, version: number, y: number) => on.put(`${setPath}/positions`, { version, positions: [{ performerId, x: 0, y, facingDeg: 0 }] });
    const placed = await save(client, (await client.get(setPath)).body.set.version, 5);
    expect(placed.status).toBe(200);

    const analysis = `${setPath}/analysis?listeningPointId=${pressBox}`;
    await client.get(analysis);
    const kept = await client.get(analysis);
    expect(kept.body.reused).toBe(true);
    const onB = new Client(b.url);
    onB.cookie = client.cookie;
    expect((await save(onB, placed.body.version, 40)).status).toBe(200);
    const after = await client.get(analysis);
    expect(after.body.reused).toBe(false);
    expect(after.body.mix.performers[0].dbA).toBeLessThan(kept.body.mix.performers[0].dbA - 3);
  });

  it("sign-in limits are shared: failures on one process lock the account on the other", async () => {
    const email = uniqueEmail("shared-limit");
    await signUp(new Client(a.url), { name: "Limit", email, password: "right-password-1", programName: "Limit Band" });
    for (let i = 0; i < 8; i++) await new Client(i % 2 ? a.url : b.url).post("/api/auth/sign-in", { email, password: `wrong-${i}` });
    expect((await new Client(b.url).post("/api/auth/sign-in", { email, password: "right-password-1" })).status).toBe(429);
  });
});

describe("database outage", () => {
  it("answers 503 JSON within 2 s while PostgreSQL is down, and recovers without a restart", async () => {
    cluster.stop();
    try {
      for (const path of ["/api/me", "/api/health"]) {
        const started = Date.now();
        const res = await client.get(path);
        expect(Date.now() - started, path).toBeLessThan(2000);
        expect(res.status, path).toBe(503);
        expect(res.headers.get("content-type"), path).toContain("application/json");
        expect(typeof res.body.error, path).toBe("string");
      }
      // A page says so in plain words, in a real browser.
      const browser = await launchBrowser();
      try {
        const [name, value] = client.cookie!.split("=") as [string, string];
        await browser.context.addCookies([{ name, value, url: a.url }]);
        await browser.page.goto(`${a.url}/programs`);
        await expect.poll(() => browser.page.textContent("body"), { timeout: 10_000 }).toContain("database cannot be reached");
      } finally {
        await browser.close();
      }
    } finally {
      cluster.start();
    }
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await client.get("/api/me")).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
  });

  it("restarting the app loses no session", async () => {
    await a.stop();
    a = await startApp(cluster.url);
    const again = new Client(a.url);
    again.cookie = client.cookie;
    expect((await again.get("/api/me")).status).toBe(200);
  });
});
