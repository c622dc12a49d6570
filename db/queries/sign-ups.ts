import { randomUUID } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "../client";
import { instrumentCatalogs, memberships, programs, users } from "../schema";
import { pendingSignUps } from "../schema-mail";
import { isUniqueViolation } from "./pg-errors";

/** A sign-up waiting for the link mailed to its address. */
export async function createPendingSignUp(input: { email: string; name: string; passwordHash: string; programName: string; tokenHash: string; expiresAt: Date }) {
  await db.insert(pendingSignUps).values(input);
}

const open = (tokenHash: string, now: Date) => and(eq(pendingSignUps.tokenHash, tokenHash), isNull(pendingSignUps.usedAt), gt(pendingSignUps.expiresAt, now));

/** What the confirmation page shows about an open link (never the password hash); null when closed or unknown. */
export async function findOpenSignUp(tokenHash: string) {
  const rows = await db
    .select({ email: pendingSignUps.email, name: pendingSignUps.name, programName: pendingSignUps.programName })
    .from(pendingSignUps)
    .where(open(tokenHash, new Date()))
    .limit(1);
  return rows[0] ?? null;
}

export type ConfirmResult = { ok: true; userId: string; programId: string; email: string; name: string } | { ok: false; reason: "closed" | "account-exists" };

/**
 * Uses the link once: the user, a program of their own with them as its director and its catalog,
 * in one transaction; every other open sign-up of the address stops working with it.
 */
export async function confirmSignUp(tokenHash: string, instruments: unknown): Promise<ConfirmResult> {
  try {
    return await db.transaction(async (tx) => {
      const now = new Date();
      const [row] = await tx.update(pendingSignUps).set({ usedAt: now }).where(open(tokenHash, now)).returning();
      if (!row) return { ok: false as const, reason: "closed" as const };
      const userId = randomUUID();
      await tx.insert(users).values({ id: userId, email: row.email, name: row.name, passwordHash: row.passwordHash });
      const [program] = await tx.insert(programs).values({ name: row.programName }).returning({ id: programs.id });
      await tx.insert(memberships).values({ programId: program!.id, userId, role: "director" });
      await tx.insert(instrumentCatalogs).values({ programId: program!.id, version: 1, instruments, note: "Default catalog", createdBy: userId });
      await tx.update(pendingSignUps).set({ usedAt: now }).where(and(eq(pendingSignUps.email, row.email), isNull(pendingSignUps.usedAt)));
      return { ok: true as const, userId, programId: program!.id, email: row.email, name: row.name };
    });
  } catch (err) {
    // The address got an account after the link was sent (an invitation accepted, another link used).
    if (isUniqueViolation(err)) return { ok: false, reason: "account-exists" };
    throw err;
  }
}
