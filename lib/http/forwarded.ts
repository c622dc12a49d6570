// Which address or host a request came from, when proxies may stand in front of the app. Pure: no
// framework imports, so the custom server (server.ts), the proxy and the route handlers share it.
import ipaddr from "ipaddr.js";

/** The header server.ts sets from the connection's socket (any copy a client sends is overwritten). */
export const PEER_HEADER = "x-farfield-peer";

/**
 * The entry `hops` places left of `last` in a forwarding chain: `forwarded` is a comma-separated
 * X-Forwarded-For or X-Forwarded-Host as received, `last` what this server saw itself (the socket's
 * address, or the Host header). Each trusted proxy appends one entry, so the entries further left are
 * the client's own words and never chosen; with no trusted hop the answer is always `last`.
 */
export function throughTrustedHops(forwarded: string | null | undefined, last: string, hops: number): string {
  if (hops <= 0) return last;
  const chain = [
    ...(forwarded ?? "")
      .split(",")
      .map((s) => s.trim())
      .filter(Boolean),
    last,
  ];
  return chain[Math.max(0, chain.length - 1 - hops)]!;
}

/**
 * The key sign-in limits count an address under: IPv4 as is (also when IPv4-mapped in IPv6), IPv6 by
 * its /64 network, since one customer line usually holds a whole /64 and could rotate through it.
 */
export function addressKey(address: string): string {
  const raw = address.trim().replace(/^\[(.*)\]$/, "$1");
  if (!ipaddr.isValid(raw)) return raw.slice(0, 100).toLowerCase() || "unknown";
  const parsed = ipaddr.process(raw);
  if (parsed.kind() === "ipv4") return parsed.toString();
  const network = ipaddr.IPv6.networkAddressFromCIDR(`${parsed.toString()}/64`);
  return `${network.toString()}/64`;
}
