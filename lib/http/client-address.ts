// Where a request came from, as far as this server can tell without believing the client.
import { env } from "@/lib/env";
import { addressKey, PEER_HEADER, throughTrustedHops } from "./forwarded";

let warned = false;

/**
 * The client's address as a counting key: the connection's own address (server.ts passes it on), or,
 * with TRUSTED_PROXY_HOPS set, the address the outermost trusted proxy put in X-Forwarded-For.
 * Served without server.ts (next dev) the connection is unknown and every direct client shares one key.
 */
export function clientAddress(req: Request): string {
  const peer = env.FARFIELD_PEER_HEADER ? req.headers.get(PEER_HEADER) : null;
  if (!peer && !warned) {
    warned = true;
    console.warn("[farfield] no connection address (not served by server.ts): sign-in limits count all direct clients as one");
  }
  return addressKey(throughTrustedHops(req.headers.get("x-forwarded-for"), peer || "unknown", env.TRUSTED_PROXY_HOPS));
}

/** The host the client asked for: Host, or X-Forwarded-Host as the outermost trusted proxy wrote it. */
export function requestHost(req: Request): string | null {
  const host = req.headers.get("host");
  return host === null ? null : throughTrustedHops(req.headers.get("x-forwarded-host"), host, env.TRUSTED_PROXY_HOPS);
}
