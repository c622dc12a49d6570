// The security headers of every answer. Pages add a CSP with a per-request nonce (proxy.ts); JSON and
// files from the API need no script, style or frame, so theirs refuses everything.

/** The headers every answer carries, whatever it holds (next.config.ts adds them to static files). */
export const STATIC_HEADERS: Record<string, string> = {
  "X-Content-Type-Options": "nosniff",
  "Referrer-Policy": "strict-origin-when-cross-origin",
  "X-Frame-Options": "DENY",
};

export const API_CSP = "default-src 'none'; frame-ancestors 'none'";

export function setSecurityHeaders(headers: Headers, csp: string): void {
  for (const [name, value] of Object.entries(STATIC_HEADERS)) headers.set(name, value);
  headers.set("Content-Security-Policy", csp);
}
