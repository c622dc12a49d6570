import { desc, eq } from "drizzle-orm";
import { db } from "../client";
import { instrumentCatalogs } from "../schema";

/** The program's catalog in force (the newest version), or null when it has none. */
export async function currentCatalog(programId: string) {
  const rows = await db
    .select({ version: instrumentCatalogs.version, instruments: instrumentCatalogs.instruments })
    .from(instrumentCatalogs)
    .where(eq(instrumentCatalogs.programId, programId))
    .orderBy(desc(instrumentCatalogs.version))
    .limit(1);
  return rows[0] ?? null;
}
