import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { memberships, programs, users, type Role } from "../schema";

export async function listProgramMembers(programId: string) {
  return db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, since: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.programId, programId))
    .orderBy(asc(memberships.role), asc(users.name));
}

export type MemberChange = { ok: true } | { ok: false; reason: "not-member" | "last-director" | "actor-not-director" };

/**
 * Gives a member a new role, or removes them (role null). The program row is locked first, so
 * concurrent changes of one program run one after the other and the last-director rule is
 * checked against what is committed: a program always keeps at least one director. The acting
 * director is checked again under the lock, so one demoted a moment ago changes nothing.
 */
export async function changeMembership(programId: string, userId: string, role: Role | null, actorId: string): Promise<MemberChange> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select 1 from ${programs} where ${programs.id} = ${programId} for update`);
    const [actor] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.programId, programId), eq(memberships.userId, actorId)));
    if (actor?.role !== "director") return { ok: false, reason: "actor-not-director" };
    const where = and(eq(memberships.programId, programId), eq(memberships.userId, userId));
    const [member] = await tx.select({ role: memberships.role }).from(memberships).where(where);
    if (!member) return { ok: false, reason: "not-member" };
    if (member.role === "director" && role !== "director") {
      const [row] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(memberships)
        .where(and(eq(memberships.programId, programId), eq(memberships.role, "director")));
      if ((row?.n ?? 0) <= 1) return { ok: false, reason: "last-director" };
    }
    if (role) await tx.update(memberships).set({ role }).where(where);
    else await tx.delete(memberships).where(where);
    return { ok: true };
  });
}
