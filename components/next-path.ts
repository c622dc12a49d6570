// Where to go after signing in: only a path of this site, never another origin.

const BASE = "http://farfield.invalid";

/**
 * `next` when it is a same-site path ("/programs/…"), else the fallback. The answer is the target after
 * normalisation ("/a/../b" resolved, "\" read as "/"), and is checked again as sent, because a path
 * like "/..//evil.example" only becomes the protocol-relative "//evil.example" once resolved.
 */
export function safeNextPath(next: string | null | undefined, fallback = "/programs"): string {
  if (!next || !next.startsWith("/") || /[\u0000-\u001f\u007f\\]/.test(next)) return fallback;
  try {
    const url = new URL(next, BASE);
    const path = url.pathname + url.search + url.hash;
    // One leading slash only; and read as a browser would read it (a Location header, router.replace), it stays here.
    if (url.origin !== BASE || !/^\/(?![/\\])/.test(path)) return fallback;
    const again = new URL(path, BASE);
    if (again.origin !== BASE || again.pathname + again.search + again.hash !== path) return fallback;
    if (url.pathname === "/sign-in" || url.pathname === "/sign-up") return fallback;
    return path;
  } catch {
    return fallback;
  }
}

export function signInPath(next: string): string {
  return `/sign-in?next=${encodeURIComponent(next)}`;
}
