// Whether the local mailbox (/dev/mail) may open: only when the local fake SMTP server is the
// transport. Pure, so it reads the settings it is given, never process.env.

export interface MailboxSettings {
  DEV_MAILBOX?: "true" | "false";
  SMTP_HOST: string;
  SMTP_USER?: string;
  SMTP_PASSWORD?: string;
}

const LOOPBACK = new Set(["127.0.0.1", "localhost", "::1", "[::1]"]);

/**
 * True only when the start scripts ran the fake server (DEV_MAILBOX=true) and the app sends to it:
 * a loopback host with no credentials. Any real SMTP setting (another host, a user or password) closes
 * the mailbox even when DEV_MAILBOX was left set, so a deployment never exposes it.
 */
export function mailboxEnabledFor(s: MailboxSettings): boolean {
  return s.DEV_MAILBOX === "true" && LOOPBACK.has(s.SMTP_HOST.trim().toLowerCase()) && !s.SMTP_USER && !s.SMTP_PASSWORD;
}

/** The messages addressed to one person (case-insensitive), so each reader sees only their own mail. */
export function messagesFor<T extends { to: string[] }>(messages: T[], email: string): T[] {
  const me = email.trim().toLowerCase();
  return messages.filter((m) => m.to.some((to) => to.trim().toLowerCase() === me));
}
