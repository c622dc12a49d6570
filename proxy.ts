// Runs before pages, where it sets the security headers with a per-request nonce in the CSP, and before
// API requests that carry an Origin, where it refuses cross-site writes. API answers get their headers
// from lib/http/handler.ts; skipping the proxy on API requests without an Origin (scripts, same-origin
// reads) roughly halves their cost.
import { NextResponse, type NextRequest } from "next/server";
import { requestHost } from "@/lib/http/client-address";
import { API_CSP, setSecurityHeaders } from "@/lib/http/security-headers";

const WRITE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

function sameOrigin(req: NextRequest): boolean {
  const origin = req.headers.get("origin");
  if (!origin) return true; // scripts and same-origin navigations without Origin; browsers send it on cross-site writes
  const host = requestHost(req); // X-Forwarded-Host only from the proxies TRUSTED_PROXY_HOPS names
  try {
    return new URL(origin).host === host;
  } catch {
    return false;
  }
}

function contentSecurityPolicy(nonce: string): string {
  const dev = process.env.NODE_ENV === "development";
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // Style attributes come from React, Konva and the chart library.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

export function proxy(req: NextRequest) {
  if (WRITE_METHODS.has(req.method) && !sameOrigin(req)) {
    const refused = NextResponse.json({ error: "Cross-site requests are refused." }, { status: 403 });
    setSecurityHeaders(refused.headers, API_CSP);
    return refused;
  }
  if (req.nextUrl.pathname.startsWith("/api/")) return NextResponse.next();
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce);
  const headers = new Headers(req.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", csp);
  const res = NextResponse.next({ request: { headers } });
  setSecurityHeaders(res.headers, csp);
  return res;
}

export const config = {
  matcher: [
    "/((?!api/|_next/static|_next/image|fonts/|favicon.ico).*)",
    // Browsers send Origin on every cross-site request and on every write; a request without one is not cross-site.
    { source: "/api/:path*", has: [{ type: "header", key: "origin" }] },
  ],
};
