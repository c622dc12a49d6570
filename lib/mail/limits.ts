// How much mail people can make Farfield send, counted in PostgreSQL (db/queries/mail-log.ts) so
// every app process applies the same limits.
import "server-only";
import { reserveMail, type MailLimit } from "@/db/queries/mail-log";
import { tooManyAttempts } from "@/lib/http/errors";

const HOUR = 60 * 60 * 1000;
const DAY = 24 * HOUR;

/** Invitations and resends: a program may send this many a day, and one person across all their programs this many. */
export const INVITATION_LIMITS: MailLimit[] = [
  { scope: "program", max: 30, windowMs: DAY },
  { scope: "sender", max: 50, windowMs: DAY },
];

/** Sign-up messages (confirmation links and notices to existing accounts) to one address. */
export const SIGN_UP_LIMITS: MailLimit[] = [{ scope: "recipient", max: 3, windowMs: HOUR }];

/** Counts one invitation message of `senderId` in `programId`, or throws 429 when a limit is reached. */
export async function reserveInvitationMail(programId: string, senderId: string, recipient: string): Promise<void> {
  const r = await reserveMail({ kind: "invitation", programId, senderId, recipient }, INVITATION_LIMITS);
  if (r.ok) return;
  throw tooManyAttempts(
    r.limit.scope === "program"
      ? `This program has sent ${r.limit.max} invitations in the last 24 hours, the most Farfield sends for one program. Try again tomorrow.`
      : `You have sent ${r.limit.max} invitations in the last 24 hours, the most Farfield sends for one person. Try again tomorrow.`,
  );
}

/** Counts one sign-up message to `recipient`; false when that address has had its share this hour (nothing is sent then). */
export async function reserveSignUpMail(recipient: string): Promise<boolean> {
  return (await reserveMail({ kind: "sign-up", recipient }, SIGN_UP_LIMITS)).ok;
}
