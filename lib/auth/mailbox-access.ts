// Who may read the local fake SMTP server's messages: only while that server is the transport
// (npm start, npm run dev and npm test with no SMTP settings), and each person only their own.
import "server-only";
import { env } from "@/lib/env";
import { mailboxEnabledFor } from "@/lib/mail/mailbox-enabled";
import { notFound } from "@/lib/http/errors";
import { requireUser } from "./access";

export const mailboxEnabled = () => mailboxEnabledFor(env);

/** 404 when no local mailbox runs (real SMTP settings, a deployment), 401 signed out; otherwise the reader. */
export async function requireMailboxReader() {
  if (!mailboxEnabled()) throw notFound();
  return requireUser();
}
