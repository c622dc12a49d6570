// Reads what the fake SMTP server kept (scripts/test.sh exports MAIL_DIR) and finds links in it.
import path from "node:path";
import { readMailbox, type KeptMessage } from "@/lib/mail/mailbox";

export const MAIL_DIR = path.resolve(process.env.MAIL_DIR ?? ".data/mail");

/** Waits (polling, up to `ms`) for a message to `to` received after `since` and matching `match`. */
export async function waitForMail(to: string, opts: { since?: Date; match?: (m: KeptMessage) => boolean; ms?: number } = {}): Promise<KeptMessage> {
  const deadline = Date.now() + (opts.ms ?? 10_000);
  const since = opts.since?.getTime() ?? 0;
  for (;;) {
    const found = (await readMailbox(MAIL_DIR)).find(
      (m) => m.to.includes(to) && new Date(m.receivedAt).getTime() >= since && (opts.match?.(m) ?? true),
    );
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no message to ${to} arrived in ${MAIL_DIR}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Every message to `to` kept so far. */
export async function mailTo(to: string): Promise<KeptMessage[]> {
  return (await readMailbox(MAIL_DIR)).filter((m) => m.to.includes(to));
}

/** The first link in a message's plain text that goes to `pathPrefix` (e.g. "/invitations/"). */
export function linkIn(message: KeptMessage, pathPrefix: string): URL {
  const match = message.text.match(/https?:\/\/\S+/g)?.map((s) => new URL(s)).find((u) => u.pathname.startsWith(pathPrefix));
  if (!match) throw new Error(`no ${pathPrefix} link in "${message.subject}"`);
  return match;
}

/** The token at the end of such a link. */
export const tokenOf = (link: URL) => decodeURIComponent(link.pathname.split("/").pop() ?? "");
