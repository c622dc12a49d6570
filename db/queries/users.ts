import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "../client";
import { instrumentCatalogs, memberships, programs, users } from "../schema";

export async function findUserByEmail(email: string) {
  const rows = await db.select().from(users).where(eq(users.email, email)).limit(1);
  return rows[0] ?? null;
}

/** Sign-up: the user, a program of their own with them as its director, and its catalog, in one transaction. */
export async function createUserWithProgram(input: {
  email: string;
  name: string;
  passwordHash: string;
  programName: string;
  instruments: unknown;
}) {
  return db.transaction(async (tx) => {
    const id = randomUUID();
    await tx.insert(users).values({ id, email: input.email, name: input.name, passwordHash: input.passwordHash });
    const [program] = await tx.insert(programs).values({ name: input.programName }).returning({ id: programs.id });
    await tx.insert(memberships).values({ programId: program!.id, userId: id, role: "director" });
    await tx.insert(instrumentCatalogs).values({ programId: program!.id, version: 1, instruments: input.instruments, note: "Default catalog", createdBy: id });
    return { userId: id, programId: program!.id };
  });
}
