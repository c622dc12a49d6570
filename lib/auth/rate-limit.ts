// Failed sign-ins are limited per account and per address; counters live in PostgreSQL so every app process agrees.
import "server-only";
import { clearAttempts, countAttemptsSince, pruneAttempts, recordAttempts } from "@/db/queries/sign-in-attempts";
import { tooManyAttempts } from "@/lib/http/errors";

const WINDOW_MS = 15 * 60 * 1000;
const PER_ACCOUNT = 8;
const PER_ADDRESS = 40;

const keysFor = (email: string, address: string) => ({ account: `account:${email}`, address: `address:${address}` });

/** Throws 429 when either counter is over its limit for the last 15 minutes. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const since = new Date(Date.now() - WINDOW_MS);
  const keys = keysFor(email, address);
  const [byAccount, byAddress] = await Promise.all([countAttemptsSince(keys.account, since), countAttemptsSince(keys.address, since)]);
  if (byAccount >= PER_ACCOUNT || byAddress >= PER_ADDRESS) {
    throw tooManyAttempts("Too many failed sign-ins. Wait 15 minutes and try again.");
  }
}

export async function recordFailedSignIn(email: string, address: string): Promise<void> {
  const keys = keysFor(email, address);
  await recordAttempts([keys.account, keys.address]);
  if (Math.random() < 0.05) await pruneAttempts(new Date(Date.now() - WINDOW_MS));
}

/** A successful sign-in clears the account's counter (not the address's). */
export async function recordSuccessfulSignIn(email: string): Promise<void> {
  await clearAttempts([`account:${email}`]);
}

/** The client's address: the first hop of X-Forwarded-For behind a proxy, else "direct". */
export function clientAddress(req: Request): string {
  const forwarded = req.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || req.headers.get("x-real-ip") || "direct";
}
