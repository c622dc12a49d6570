// Errors a Server Component may throw on purpose; the digest survives into error.tsx in production.
export const DATABASE_DOWN_DIGEST = "FARFIELD_DATABASE_DOWN";

export function databaseDownError(): Error {
  return Object.assign(new Error("The database cannot be reached right now."), { digest: DATABASE_DOWN_DIGEST });
}

export function isDatabaseDownDigest(error: unknown): boolean {
  return typeof error === "object" && error !== null && (error as { digest?: unknown }).digest === DATABASE_DOWN_DIGEST;
}
