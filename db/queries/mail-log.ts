import { and, count, eq, gt, sql, type SQL } from "drizzle-orm";
import { db } from "../client";
import { mailLog } from "../schema-mail";

export type MailScope = "program" | "sender" | "recipient";
export interface MailLimit {
  scope: MailScope;
  max: number;
  windowMs: number;
}
export interface MailEntry {
  kind: "invitation" | "sign-up";
  programId?: string;
  senderId?: string;
  recipient: string;
}

const column = { program: mailLog.programId, sender: mailLog.senderId, recipient: mailLog.recipient } as const;
const valueOf = (e: MailEntry, scope: MailScope) => (scope === "program" ? e.programId : scope === "sender" ? e.senderId : e.recipient);

/**
 * Counts the entry's recent mail against each limit and, when every one has room, logs it; otherwise
 * returns the first limit reached. Transaction-scoped advisory locks on each counted key, always taken
 * in the same order, make parallel requests count one after another, so they cannot all pass.
 */
export async function reserveMail(entry: MailEntry, limits: MailLimit[]): Promise<{ ok: true } | { ok: false; limit: MailLimit }> {
  const keyed = limits.map((l) => ({ l, value: valueOf(entry, l.scope) })).filter((k): k is { l: MailLimit; value: string } => !!k.value);
  return db.transaction(async (tx) => {
    const keys = [...new Set(keyed.map((k) => `mail:${entry.kind}:${k.l.scope}:${k.value}`))].sort();
    for (const key of keys) await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${key}, 0))`);
    for (const { l, value } of keyed) {
      const where: SQL[] = [eq(mailLog.kind, entry.kind), eq(column[l.scope], value), gt(mailLog.sentAt, new Date(Date.now() - l.windowMs))];
      const [row] = await tx.select({ n: count() }).from(mailLog).where(and(...where));
      if ((row?.n ?? 0) >= l.max) return { ok: false as const, limit: l };
    }
    await tx.insert(mailLog).values({ kind: entry.kind, programId: entry.programId, senderId: entry.senderId, recipient: entry.recipient });
    return { ok: true as const };
  });
}
