/** True for PostgreSQL's unique violation (23505), however the driver wraps it. */
export function isUniqueViolation(err: unknown): boolean {
  for (let e = err as { code?: string; cause?: unknown } | undefined; e && typeof e === "object"; e = e.cause as typeof e) {
    if (e.code === "23505") return true;
  }
  return false;
}
