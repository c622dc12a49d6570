// Who may read the local fake SMTP server's messages: only while it runs (development, npm start
// with no SMTP settings, npm test), and only the demo's directors.
import "server-only";
import { HARBOR_RIDGE } from "@/db/demo/harbor-ridge";
import { WESTBROOK } from "@/db/demo/westbrook";
import { env } from "@/lib/env";
import { forbidden, notFound } from "@/lib/http/errors";
import { requireUser } from "./access";

const DEMO_DIRECTORS = new Set([HARBOR_RIDGE, WESTBROOK].flatMap((p) => p.members.filter((m) => m.role === "director").map((m) => m.email)));

export const mailboxEnabled = () => env.NODE_ENV === "development" || env.DEV_MAILBOX === "true";

/** 404 when no local mailbox runs (a real deployment), 401 signed out, 403 for anyone but a demo director. */
export async function requireMailboxReader() {
  if (!mailboxEnabled()) throw notFound();
  const user = await requireUser();
  if (!DEMO_DIRECTORS.has(user.email)) throw forbidden("Only the demo's directors may read the local mailbox.");
  return user;
}
