// Errors a route handler or server action may throw; the handler wrapper turns them into JSON answers.
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly extra: Record<string, unknown> = {},
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
  }
}

export const unauthorized = () => new HttpError(401, "Sign in to continue.");
export const forbidden = (what = "Your role in this program may not do this.") => new HttpError(403, what);
/** Unknown ids and ids of programs the user is not in answer the same, so nothing leaks. */
export const notFound = (what = "Not found.") => new HttpError(404, what);
export const conflict = (message: string, extra: Record<string, unknown> = {}) => new HttpError(409, message, extra);
export const tooLarge = (message = "The request body is too large.") => new HttpError(413, message);
/** Well-formed, but more than a show may hold or a request may compute (lib/limits.ts). */
export const unprocessable = (message: string) => new HttpError(422, message);
export const tooManyAttempts = (message: string, retryAfterSeconds?: number) =>
  new HttpError(429, message, {}, retryAfterSeconds ? { "Retry-After": String(retryAfterSeconds) } : {});
export const badRequest = (message: string, issues?: Record<string, string[]>) =>
  new HttpError(400, message, issues ? { issues } : {});

/** True for errors that mean the database cannot be reached (refused, reset, closed under a write, timed out, shutting down). */
export function isDatabaseDown(err: unknown): boolean {
  const seen = new Set<unknown>();
  let e: unknown = err;
  while (e && typeof e === "object" && !seen.has(e)) {
    seen.add(e);
    const code = (e as { code?: string }).code;
    if (
      code &&
      ["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "CONNECT_TIMEOUT", "CONNECTION_CLOSED", "CONNECTION_ENDED", "CONNECTION_DESTROYED", "57P01", "57P02", "57P03", "08006", "08001", "08003", "08004"].includes(code)
    ) {
      return true;
    }
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/**
 * An unexpected error for the log: its stack and the codes and messages of its causes, without the
 * query parameters a database error carries (they can hold session ids, e-mail addresses and hashes).
 */
export function describeError(err: unknown): string {
  const lines: string[] = [];
  const seen = new Set<unknown>();
  for (let e: unknown = err; e && !seen.has(e); e = (e as { cause?: unknown }).cause) {
    seen.add(e);
    const text = e instanceof Error ? (e === err ? (e.stack ?? e.message) : e.message) : String(e);
    const code = (e as { code?: unknown }).code;
    const kept = text.split("\n").filter((l) => !/^\s*params:/.test(l)).join("\n");
    lines.push(e === err ? kept : `caused by${code ? ` [${String(code)}]` : ""}: ${kept.split("\n")[0]}`);
  }
  return lines.join("\n");
}
