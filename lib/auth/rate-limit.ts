// Sign-in limits, counted in PostgreSQL so every app process agrees, and reserved before the password
// is checked, so parallel attempts cannot all be tried.
//
// Per address: strict, at most 40 failures in 15 minutes. Per account: never locked; after 5 failures
// each further attempt waits 15 s, 30 s, 60 s … at most 5 minutes after the one before (counters reset
// a day after the first failure, or on a right password). That keeps online guessing at a few hundred
// a day, far below the 10^8 guesses a password of zxcvbn score 3 needs, while its owner can still get in. A
// browser that signed in to the account before (device cookie) is not slowed by other people's
// failures: it has a counter of its own, strict like an address's.
import "server-only";
import { pruneLimits, releaseAttempt, reserveAttempt, type LimitRule } from "@/db/queries/sign-in-limits";
import { clientAddress } from "@/lib/http/client-address";
import { tooManyAttempts } from "@/lib/http/errors";
import { knownDeviceFor, rememberDevice } from "./known-device";

export { clientAddress };

const ADDRESS = { max: 40, windowSeconds: 15 * 60 };
const ACCOUNT = { max: 1_000_000, windowSeconds: 24 * 3600, slowDown: { after: 5, firstSeconds: 15, maxSeconds: 5 * 60 } };
const DEVICE = { max: 10, windowSeconds: 15 * 60 };

export interface SignInAttempt {
  /** The password was right: the attempt is no failure, the account starts afresh, this browser is remembered. */
  succeeded(): Promise<void>;
}

function wait(seconds: number): string {
  return seconds < 90 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`;
}

/**
 * Counts one sign-in attempt for `email` from this request before its password is checked (a failure
 * unless `succeeded` is called); throws 429 with Retry-After when a limit refuses it.
 */
export async function beginSignIn(email: string, req: Request): Promise<SignInAttempt> {
  const address: LimitRule = { key: `address:${clientAddress(req)}`, ...ADDRESS };
  const device = await knownDeviceFor(email);
  const own: LimitRule = device ? { key: `device:${device}`, ...DEVICE } : { key: `account:${email}`, ...ACCOUNT };
  const refused = await reserveAttempt([address, own]);
  if (refused) {
    const message =
      refused.refused === address
        ? `Too many failed sign-ins from your network. Try again in ${wait(refused.retryAfterSeconds)}.`
        : `Too many failed sign-ins for this account. Wait ${wait(refused.retryAfterSeconds)} and try again.`;
    throw tooManyAttempts(message, refused.retryAfterSeconds);
  }
  if (Math.random() < 0.05) await pruneLimits(new Date(Date.now() - ACCOUNT.windowSeconds * 1000));
  return {
    async succeeded() {
      await releaseAttempt([address.key], [own.key, `account:${email}`]);
      await rememberDevice(email);
    },
  };
}
