// Forwarding chains: with N trusted proxies the client's entry is the Nth from the right, counting what
// the server saw itself as the last; entries further left are the client's own words (common practice,
// no source; the same rule as Express's "trust proxy" hop count).
import { describe, expect, it } from "vitest";
import { addressKey, throughTrustedHops } from "@/lib/http/forwarded";

describe("throughTrustedHops", () => {
  it("ignores X-Forwarded-For entirely when no proxy is trusted", () => {
    expect(throughTrustedHops("203.0.113.9", "10.0.0.5", 0)).toBe("10.0.0.5");
    expect(throughTrustedHops(null, "10.0.0.5", 0)).toBe("10.0.0.5");
  });

  it("takes the entry the outermost trusted proxy appended, never one the client wrote", () => {
    // client wrote "1.1.1.1", the load balancer appended the real client 198.51.100.7, socket = balancer
    expect(throughTrustedHops("1.1.1.1, 198.51.100.7", "10.0.0.2", 1)).toBe("198.51.100.7");
    expect(throughTrustedHops("1.1.1.1, 198.51.100.7, 10.0.0.3", "10.0.0.2", 2)).toBe("198.51.100.7");
  });

  it("falls back to the leftmost entry when the chain is shorter than the hops", () => {
    expect(throughTrustedHops("198.51.100.7", "10.0.0.2", 3)).toBe("198.51.100.7");
    expect(throughTrustedHops(null, "10.0.0.2", 1)).toBe("10.0.0.2");
  });

  it("picks the host the outermost trusted proxy saw", () => {
    expect(throughTrustedHops("evil.example, farfield.example.org", "app:3000", 1)).toBe("farfield.example.org");
    expect(throughTrustedHops("evil.example", "127.0.0.1:3000", 0)).toBe("127.0.0.1:3000");
  });
});

describe("addressKey", () => {
  it("keys IPv4 as is, also when mapped into IPv6", () => {
    expect(addressKey("198.51.100.7")).toBe("198.51.100.7");
    expect(addressKey("::ffff:198.51.100.7")).toBe("198.51.100.7");
  });

  it("keys IPv6 by its /64 network (RFC 4291 §2.5.4: 64-bit interface ids), so rotating within it buys nothing", () => {
    expect(addressKey("2001:db8:1:2:aaaa::1")).toBe("2001:db8:1:2::/64");
    expect(addressKey("[2001:db8:1:2:bbbb::9]")).toBe("2001:db8:1:2::/64");
    expect(addressKey("2001:db8:1:3::1")).not.toBe(addressKey("2001:db8:1:2::1"));
  });
});
