// Security headers on pages and API answers.
import { describe, expect, it } from "vitest";
import { APP_URL } from "../support/api";

describe("security headers", () => {
  for (const path of ["/sign-in", "/api/health"]) {
    it(`are set on ${path}`, async () => {
      const res = await fetch(APP_URL + path);
      const csp = res.headers.get("content-security-policy") ?? "";
      expect(csp).toContain("default-src 'self'");
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    });
  }

  it("gives every page answer a fresh nonce", async () => {
    const one = (await fetch(APP_URL + "/sign-in")).headers.get("content-security-policy");
    const two = (await fetch(APP_URL + "/sign-in")).headers.get("content-security-policy");
    expect(one).not.toBe(two);
  });
});
