import { asc, eq } from "drizzle-orm";
import { db } from "../client";
import { memberships, programs, users } from "../schema";

export async function findProgram(programId: string) {
  const rows = await db.select({ id: programs.id, name: programs.name }).from(programs).where(eq(programs.id, programId)).limit(1);
  return rows[0] ?? null;
}

export async function listMembers(programId: string) {
  return db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.programId, programId))
    .orderBy(asc(memberships.role), asc(users.name));
}
