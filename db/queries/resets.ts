import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { db } from "../client";
import { users } from "../schema";
import { passwordResets } from "../schema-team";

export async function countRecentResets(userId: string, since: Date): Promise<number> {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(passwordResets)
    .where(and(eq(passwordResets.userId, userId), gt(passwordResets.createdAt, since)));
  return row?.n ?? 0;
}

export async function createReset(userId: string, tokenHash: string, expiresAt: Date): Promise<void> {
  await db.insert(passwordResets).values({ userId, tokenHash, expiresAt });
}

/**
 * Uses a reset token once and sets the new password in one transaction; every other open
 * reset of that user is used up too. Null when the token is unknown, used or expired.
 */
export async function useResetToken(tokenHash: string, passwordHash: string): Promise<{ userId: string } | null> {
  return db.transaction(async (tx) => {
    const now = new Date();
    const [used] = await tx
      .update(passwordResets)
      .set({ usedAt: now })
      .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
      .returning({ userId: passwordResets.userId });
    if (!used) return null;
    await tx.update(users).set({ passwordHash }).where(eq(users.id, used.userId));
    await tx
      .update(passwordResets)
      .set({ usedAt: now })
      .where(and(eq(passwordResets.userId, used.userId), isNull(passwordResets.usedAt)));
    return used;
  });
}

/** Whether a token would still work (for the page that asks for the new password). */
export async function isResetTokenOpen(tokenHash: string): Promise<boolean> {
  const rows = await db
    .select({ id: passwordResets.id })
    .from(passwordResets)
    .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
    .limit(1);
  return rows.length > 0;
}
