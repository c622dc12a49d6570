// The program's instrument catalog history: list versions, read one, add a version (adopting a fit or restoring an old one).
import { and, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { instrumentCatalogs, users } from "../schema";
import { isUniqueViolation } from "./pg-errors";

export async function listCatalogVersions(programId: string) {
  return db
    .select({
      version: instrumentCatalogs.version,
      instruments: instrumentCatalogs.instruments,
      note: instrumentCatalogs.note,
      createdBy: users.name,
      createdAt: instrumentCatalogs.createdAt,
    })
    .from(instrumentCatalogs)
    .leftJoin(users, eq(users.id, instrumentCatalogs.createdBy))
    .where(eq(instrumentCatalogs.programId, programId))
    .orderBy(desc(instrumentCatalogs.version));
}

export async function findCatalogVersion(programId: string, version: number) {
  const rows = await db
    .select({ version: instrumentCatalogs.version, instruments: instrumentCatalogs.instruments, note: instrumentCatalogs.note })
    .from(instrumentCatalogs)
    .where(and(eq(instrumentCatalogs.programId, programId), eq(instrumentCatalogs.version, version)))
    .limit(1);
  return rows[0] ?? null;
}

export type AddCatalogResult = { ok: true; version: number } | { ok: false; currentVersion: number };

/**
 * Adds the next catalog version if `baseVersion` is still the newest, in one transaction; a
 * concurrent add of the same version loses on the unique index and is answered as stale.
 */
export async function addCatalogVersion(args: { programId: string; baseVersion: number; instruments: unknown; note: string; userId: string }): Promise<AddCatalogResult> {
  try {
    return await db.transaction(async (tx) => {
      const newest = await tx
        .select({ version: instrumentCatalogs.version })
        .from(instrumentCatalogs)
        .where(eq(instrumentCatalogs.programId, args.programId))
        .orderBy(desc(instrumentCatalogs.version))
        .limit(1);
      const current = newest[0]?.version ?? 0;
      if (current !== args.baseVersion) return { ok: false as const, currentVersion: current };
      await tx.insert(instrumentCatalogs).values({
        programId: args.programId,
        version: current + 1,
        instruments: args.instruments,
        note: args.note,
        createdBy: args.userId,
      });
      return { ok: true as const, version: current + 1 };
    });
  } catch (err) {
    if (isUniqueViolation(err)) {
      const newest = await db
        .select({ version: instrumentCatalogs.version })
        .from(instrumentCatalogs)
        .where(eq(instrumentCatalogs.programId, args.programId))
        .orderBy(desc(instrumentCatalogs.version))
        .limit(1);
      return { ok: false, currentVersion: newest[0]?.version ?? 0 };
    }
    throw err;
  }
}
