// Where to go after signing in: only a path of this site, never another origin.

/** `next` when it is a same-site path ("/programs/…"), else the fallback. Rejects "//host" and "/\\host". */
export function safeNextPath(next: string | null | undefined, fallback = "/programs"): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  if (/[\u0000-\u001f]/.test(next)) return fallback;
  try {
    const url = new URL(next, "http://farfield.invalid");
    if (url.origin !== "http://farfield.invalid") return fallback;
    if (url.pathname === "/sign-in" || url.pathname === "/sign-up") return fallback;
    return url.pathname + url.search + url.hash;
  } catch {
    return fallback;
  }
}

export function signInPath(next: string): string {
  return `/sign-in?next=${encodeURIComponent(next)}`;
}
