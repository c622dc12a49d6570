// Browsers that signed in to an account before (table known_devices), by the hash of their cookie's token.
import { and, eq, lt } from "drizzle-orm";
import { db } from "../client";
import { knownDevices } from "../schema";

export async function isKnownDevice(tokenHash: string, email: string): Promise<boolean> {
  const rows = await db
    .select({ email: knownDevices.email })
    .from(knownDevices)
    .where(and(eq(knownDevices.tokenHash, tokenHash), eq(knownDevices.email, email)));
  return rows.length > 0;
}

export async function addKnownDevice(tokenHash: string, email: string): Promise<void> {
  await db.insert(knownDevices).values({ tokenHash, email }).onConflictDoNothing();
}

export async function pruneKnownDevices(before: Date): Promise<void> {
  await db.delete(knownDevices).where(lt(knownDevices.createdAt, before));
}
