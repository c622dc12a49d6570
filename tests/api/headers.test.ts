// Security headers on pages and API answers.
import { describe, expect, it } from "vitest";
import { APP_URL, DEMO, signedIn } from "../support/api";

function expectStaticHeaders(res: Response) {
  expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
  expect(res.headers.get("x-frame-options")).toBe("DENY");
}

describe("security headers", () => {
  it("are set on a page, with a nonce for its scripts", async () => {
    const res = await fetch(APP_URL + "/sign-in");
    const csp = res.headers.get("content-security-policy") ?? "";
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expectStaticHeaders(res);
  });

  // API answers are JSON or files: their policy allows nothing at all.
  const apiCases: [string, RequestInit][] = [
    ["a script's read (no Origin)", {}],
    ["a browser's read (same Origin)", { headers: { origin: APP_URL } }],
    ["an error answer", { method: "POST", headers: { "content-type": "application/json" }, body: "{" }],
  ];
  for (const [name, init] of apiCases) {
    it(`are set on ${name}`, async () => {
      const res = await fetch(APP_URL + (init.method === "POST" ? "/api/auth/sign-in" : "/api/health"), init);
      expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
      expectStaticHeaders(res);
    });
  }

  it("are set on the JSON 404 of a path no API route handles, for any method", async () => {
    for (const method of ["GET", "POST", "PUT", "PATCH", "DELETE"]) {
      const res = await fetch(APP_URL + "/api/no-such-thing/here", { method });
      expect(res.status, method).toBe(404);
      expect(res.headers.get("content-type"), method).toContain("application/json");
      expect((await res.json()).error, method).toMatch(/no such API route/);
      expect(res.headers.get("content-security-policy"), method).toBe("default-src 'none'; frame-ancestors 'none'");
      expectStaticHeaders(res);
    }
  });

  it("are set on the refusal of a cross-site write", async () => {
    const res = await fetch(APP_URL + "/api/auth/sign-out", { method: "POST", headers: { origin: "https://elsewhere.example" } });
    expect(res.status).toBe(403);
    expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
    expectStaticHeaders(res);
  });

  it("answer a method a route does not have with a JSON 405 and the API's headers", async () => {
    for (const [method, path] of [["DELETE", "/api/health"], ["PUT", "/api/auth/sign-in"], ["PATCH", "/api/me"]] as const) {
      const res = await fetch(APP_URL + path, { method });
      expect(res.status, `${method} ${path}`).toBe(405);
      expect(res.headers.get("content-type"), method).toContain("application/json");
      expect((await res.json()).error, method).toMatch(/does not accept that method/);
      expect(res.headers.get("content-security-policy"), method).toBe("default-src 'none'; frame-ancestors 'none'");
      expectStaticHeaders(res);
    }
  });

  it("keep signed-in API answers out of every cache (Cache-Control: no-store)", async () => {
    const c = await signedIn(DEMO.director);
    const me = await c.get("/api/me");
    expect(me.status).toBe(200);
    expect(me.headers.get("cache-control")).toBe("no-store");
    const programId = me.body.memberships[0].programId;
    const shows = await c.get(`/api/programs/${programId}/shows`);
    expect(shows.headers.get("cache-control")).toBe("no-store");
    expect((await c.get("/api/no-such-thing")).headers.get("cache-control")).toBe("no-store");
  });

  it("mark /favicon.ico, fonts and built static files nosniff", async () => {
    const html = await (await fetch(APP_URL + "/sign-in")).text();
    const script = html.match(/\/_next\/static\/[^"']+\.js/)?.[0];
    expect(script).toBeTruthy();
    for (const path of ["/favicon.ico", script!, "/fonts/inter-latin-400-normal.woff2"]) {
      const res = await fetch(APP_URL + path);
      await res.arrayBuffer();
      expect(res.headers.get("x-content-type-options"), path).toBe("nosniff");
    }
  });

  it("refuse a cross-site write that names its own host in X-Forwarded-Host (no proxy is trusted)", async () => {
    const res = await fetch(APP_URL + "/api/auth/sign-out", {
      method: "POST",
      headers: { origin: "https://evil.example", "x-forwarded-host": "evil.example" },
    });
    expect(res.status).toBe(403);
    expect((await res.json()).error).toMatch(/Cross-site/);
  });

  it("gives every page answer a fresh nonce", async () => {
    const one = (await fetch(APP_URL + "/sign-in")).headers.get("content-security-policy");
    const two = (await fetch(APP_URL + "/sign-in")).headers.get("content-security-policy");
    expect(one).not.toBe(two);
  });
});
