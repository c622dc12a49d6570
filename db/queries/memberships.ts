import { and, eq } from "drizzle-orm";
import { db, type Runner } from "../client";
import { memberships, programs, type Role } from "../schema";

export async function findMembership(userId: string, programId: string, runner: Runner = db): Promise<Role | null> {
  const rows = await runner
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.programId, programId)))
    .limit(1);
  return rows[0]?.role ?? null;
}

export async function listMemberships(userId: string) {
  return db
    .select({ programId: programs.id, programName: programs.name, role: memberships.role })
    .from(memberships)
    .innerJoin(programs, eq(programs.id, memberships.programId))
    .where(eq(memberships.userId, userId))
    .orderBy(programs.name);
}
