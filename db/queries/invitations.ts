import { randomUUID } from "node:crypto";
import { and, desc, eq, gt, isNull, TransactionRollbackError } from "drizzle-orm";
import { db } from "../client";
import { memberships, programs, users, type Role } from "../schema";
import { invitations } from "../schema-team";

/** What leaves the server about an invitation (never the token hash). */
const publicColumns = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  expiresAt: invitations.expiresAt,
  sentAt: invitations.sentAt,
  usedAt: invitations.usedAt,
  revokedAt: invitations.revokedAt,
};

export type InvitationRow = { id: string; email: string; role: Role; expiresAt: Date; sentAt: Date; usedAt: Date | null; revokedAt: Date | null };

/** The invitations still open (neither used nor revoked), newest first; expired ones are listed too. */
export async function listOpenInvitations(programId: string): Promise<InvitationRow[]> {
  return db
    .select(publicColumns)
    .from(invitations)
    .where(and(eq(invitations.programId, programId), isNull(invitations.usedAt), isNull(invitations.revokedAt)))
    .orderBy(desc(invitations.sentAt));
}

export async function isMemberByEmail(programId: string, email: string): Promise<boolean> {
  const rows = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.programId, programId), eq(users.email, email)))
    .limit(1);
  return rows.length > 0;
}

/** A new invitation; an open one for the same address in the program is revoked in the same transaction. */
export async function createInvitation(input: { programId: string; email: string; role: Role; tokenHash: string; expiresAt: Date; invitedBy: string }) {
  return db.transaction(async (tx) => {
    const now = new Date();
    await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(and(eq(invitations.programId, input.programId), eq(invitations.email, input.email), isNull(invitations.usedAt), isNull(invitations.revokedAt)));
    const [row] = await tx.insert(invitations).values({ ...input, sentAt: now }).returning(publicColumns);
    return row!;
  });
}

/** Resend: a fresh token and expiry for an open invitation of this program; null when there is none. */
export async function renewInvitation(programId: string, invitationId: string, tokenHash: string, expiresAt: Date) {
  const rows = await db
    .update(invitations)
    .set({ tokenHash, expiresAt, sentAt: new Date() })
    .where(and(eq(invitations.id, invitationId), eq(invitations.programId, programId), isNull(invitations.usedAt), isNull(invitations.revokedAt)))
    .returning(publicColumns);
  return rows[0] ?? null;
}

export async function revokeInvitation(programId: string, invitationId: string): Promise<boolean> {
  const rows = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.id, invitationId), eq(invitations.programId, programId), isNull(invitations.usedAt), isNull(invitations.revokedAt)))
    .returning({ id: invitations.id });
  return rows.length > 0;
}

/** The invitation behind a token with its program and inviter, whatever its state; null when unknown. */
export async function findInvitationByTokenHash(tokenHash: string) {
  const rows = await db
    .select({
      ...publicColumns,
      programId: invitations.programId,
      programName: programs.name,
      invitedByName: users.name,
    })
    .from(invitations)
    .innerJoin(programs, eq(programs.id, invitations.programId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return rows[0] ?? null;
}

export type AcceptResult =
  | { ok: true; programId: string; role: Role; alreadyMember: boolean }
  | { ok: false; reason: "not-open" };

/**
 * Uses the invitation once: the conditional UPDATE lets exactly one of concurrent accepts win.
 * `newUser` creates the account in the same transaction; an existing member keeps the role they have.
 */
export async function acceptInvitation(
  tokenHash: string,
  who: { userId: string } | { newUser: { email: string; name: string; passwordHash: string } },
): Promise<AcceptResult & { userId?: string }> {
  try {
    return await db.transaction(async (tx) => {
      const userId = "userId" in who ? who.userId : randomUUID();
      if ("newUser" in who) await tx.insert(users).values({ id: userId, ...who.newUser });
      const [used] = await tx
        .update(invitations)
        .set({ usedAt: new Date(), acceptedBy: userId })
        .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.usedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
        .returning({ programId: invitations.programId, role: invitations.role });
      if (!used) tx.rollback(); // nothing of a new account stays behind either
      const { programId, role: invitedRole } = used!;
      const inserted = await tx.insert(memberships).values({ programId, userId, role: invitedRole }).onConflictDoNothing().returning({ role: memberships.role });
      const [current] = await tx
        .select({ role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.programId, programId), eq(memberships.userId, userId)));
      return { ok: true as const, programId, role: current!.role, alreadyMember: inserted.length === 0, userId };
    });
  } catch (err) {
    // A rollback, or a second accept creating the same account at the same moment.
    if (err instanceof TransactionRollbackError || isUniqueViolation(err)) return { ok: false, reason: "not-open" };
    throw err;
  }
}

function isUniqueViolation(err: unknown): boolean {
  for (let e = err; e && typeof e === "object"; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: string }).code === "23505") return true;
  }
  return false;
}
