// With TRUSTED_PROXY_HOPS=1 (one load balancer in front), the app believes the entry that proxy appends
// to X-Forwarded-For and its X-Forwarded-Host; without it (the main test app) it believes neither.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { uniqueEmail } from "../support/api";
import { DATABASE_URL } from "../support/database";
import { loopbackAddress, requestFrom } from "../support/loopback";
import { startApp, type App } from "../support/stack";

let app: App;
beforeAll(async () => {
  app = await startApp(DATABASE_URL, { TRUSTED_PROXY_HOPS: "1" });
});
afterAll(() => app?.stop());

describe("behind one trusted proxy", () => {
  it("counts sign-in failures per address the proxy forwarded, not per connection", async () => {
    const proxy = loopbackAddress(); // every request arrives from the proxy's one address
    const clientA = `198.51.100.${Math.floor(Math.random() * 200) + 1}`;
    const tries = (client: string, n: number) =>
      Promise.all(
        Array.from({ length: n }, (_, i) =>
          requestFrom(proxy, "POST", "/api/auth/sign-in", {
            body: { email: uniqueEmail(`proxied${i}`), password: "some-wrong-password" },
            headers: { "x-forwarded-for": `10.9.9.9, ${client}` },
            base: app.url,
          }),
        ),
      );
    const a = await tries(clientA, 45);
    expect(a.filter((r) => r.status === 401).length).toBe(40);
    expect(a.filter((r) => r.status === 429).length).toBe(5);
    // Another client behind the same proxy is counted on its own; the left entry (the client's own words) is ignored.
    const b = await tries(`203.0.113.${Math.floor(Math.random() * 200) + 1}`, 3);
    expect(b.map((r) => r.status)).toEqual([401, 401, 401]);
  });

  it("accepts a write whose Origin matches the X-Forwarded-Host the proxy passed on", async () => {
    const from = loopbackAddress();
    const ok = await requestFrom(from, "POST", "/api/auth/sign-out", { headers: { origin: "https://farfield.example.org", "x-forwarded-host": "farfield.example.org" }, base: app.url });
    expect(ok.status).toBe(204);
    const other = await requestFrom(from, "POST", "/api/auth/sign-out", { headers: { origin: "https://evil.example", "x-forwarded-host": "farfield.example.org" }, base: app.url });
    expect(other.status).toBe(403);
  });
});
