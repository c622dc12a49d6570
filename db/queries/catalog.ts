import { desc, eq } from "drizzle-orm";
import { db } from "../client";
import { instrumentCatalogs } from "../schema";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import type { InstrumentCatalog } from "@/lib/acoustics/types";

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

/** Every instrument a show of the program may use: the built-in catalog with the program's own values over it. */
export async function programInstruments(programId: string): Promise<InstrumentCatalog> {
  return { ...DEFAULT_INSTRUMENTS, ...((await currentCatalog(programId))?.instruments as InstrumentCatalog | undefined) };
}
