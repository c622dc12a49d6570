import { and, count, eq, gt, inArray, lt } from "drizzle-orm";
import { db } from "../client";
import { signInAttempts } from "../schema";

export async function countAttemptsSince(key: string, since: Date): Promise<number> {
  const rows = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), gt(signInAttempts.attemptedAt, since)));
  return rows[0]?.n ?? 0;
}

export async function recordAttempts(keys: string[]): Promise<void> {
  await db.insert(signInAttempts).values(keys.map((key) => ({ key })));
}

export async function clearAttempts(keys: string[]): Promise<void> {
  await db.delete(signInAttempts).where(inArray(signInAttempts.key, keys));
}

export async function pruneAttempts(before: Date): Promise<void> {
  await db.delete(signInAttempts).where(lt(signInAttempts.attemptedAt, before));
}
