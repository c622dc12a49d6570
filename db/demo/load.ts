// Loads the demo (Harbor Ridge and Westbrook) in one transaction, once: if the Harbor Ridge
// director exists the demo is there and nothing is written. `npx tsx db/demo/load.ts`.
import { eq, inArray, sql } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import { z } from "zod";
import type { Runner } from "@/db/client";
import * as schema from "@/db/schema";
import { showScores } from "@/db/schema-score";
import { uploads } from "@/db/schema-team";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { hashPassword, MIN_PASSWORD_LENGTH } from "@/lib/auth/password";
import { HARBOR_RIDGE, HARBOR_RIDGE_DIRECTOR } from "./harbor-ridge";
import { demoRows, type DemoRows } from "./rows";
import type { DemoProgram } from "./types";
import { WESTBROOK } from "./westbrook";

export const DEMO_PROGRAMS: DemoProgram[] = [HARBOR_RIDGE, WESTBROOK];
export const DEFAULT_DEMO_PASSWORD = "farfield-demo";

export type LoadDemoResult = { loaded: false } | { loaded: true; counts: Record<keyof DemoRows, number> };

// Far under PostgreSQL's 65 535 bind parameters per statement for every table here.
const CHUNK_ROWS = 2000;

async function insertAll(tx: Runner, table: PgTable, rows: Record<string, unknown>[]) {
  for (let i = 0; i < rows.length; i += CHUNK_ROWS) await tx.insert(table).values(rows.slice(i, i + CHUNK_ROWS) as never);
}

const directorExists = async (runner: Runner) =>
  (await runner.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, HARBOR_RIDGE_DIRECTOR)).limit(1)).length > 0;

export async function loadDemo(db: Runner, { password }: { password: string }): Promise<LoadDemoResult> {
  if (await directorExists(db)) return { loaded: false };

  const emails = [...new Set(DEMO_PROGRAMS.flatMap((p) => p.members.map((m) => m.email)))];
  // Hashing is slow by design: do it before the transaction opens. Each user gets its own salt.
  const hashes = new Map(await Promise.all(emails.map(async (e) => [e, await hashPassword(password)] as const)));

  return db.transaction(async (tx) => {
    // Two loaders started at once (npm start twice) wait for each other here; the second finds the demo.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext('farfield-demo-load'))`);
    if (await directorExists(tx)) return { loaded: false } as const;

    // A demo address someone already signed up with keeps its account and password.
    const existing = await tx
      .select({ id: schema.users.id, email: schema.users.email })
      .from(schema.users)
      .where(inArray(schema.users.email, emails));
    const existingIds = new Map(existing.map((u) => [u.email, u.id]));
    for (const e of existingIds.keys()) hashes.delete(e);

    const rows = demoRows(DEMO_PROGRAMS, DEFAULT_INSTRUMENTS, hashes, existingIds);
    // Parents before children, for the foreign keys.
    await insertAll(tx, schema.users, rows.users);
    await insertAll(tx, schema.programs, rows.programs);
    await insertAll(tx, schema.memberships, rows.memberships);
    await insertAll(tx, schema.instrumentCatalogs, rows.instrumentCatalogs);
    await insertAll(tx, schema.shows, rows.shows);
    await insertAll(tx, schema.listeningPoints, rows.listeningPoints);
    await insertAll(tx, schema.performers, rows.performers);
    await insertAll(tx, schema.movements, rows.movements);
    await insertAll(tx, schema.sets, rows.sets);
    await insertAll(tx, schema.positions, rows.positions);
    await insertAll(tx, schema.phrases, rows.phrases);
    await insertAll(tx, schema.voiceAssignments, rows.voiceAssignments);
    await insertAll(tx, schema.performerOverrides, rows.performerOverrides);
    await insertAll(tx, uploads, rows.uploads);
    await insertAll(tx, showScores, rows.showScores);

    const counts = Object.fromEntries(Object.entries(rows).map(([k, v]) => [k, v.length])) as Record<keyof DemoRows, number>;
    return { loaded: true, counts } as const;
  });
}

if (require.main === module) {
  const started = performance.now();
  const password = z.string().min(MIN_PASSWORD_LENGTH).default(DEFAULT_DEMO_PASSWORD).safeParse(process.env.DEMO_PASSWORD || undefined);
  (async () => {
    if (!password.success) throw new Error(`DEMO_PASSWORD must have at least ${MIN_PASSWORD_LENGTH} characters`);
    const client = await import("@/db/client");
    try {
      const result = await loadDemo(client.db, { password: password.data });
      const s = ((performance.now() - started) / 1000).toFixed(1);
      console.log(
        result.loaded
          ? `[farfield] demo loaded: ${DEMO_PROGRAMS.length} programs, ${result.counts.users} users, ${result.counts.performers} performers, ${result.counts.sets} sets, ${result.counts.phrases} phrases, ${result.counts.positions} positions in ${s} s`
          : "[farfield] demo already loaded; nothing changed",
      );
    } finally {
      await client.sql.end();
    }
  })().catch((err: Error) => {
    console.error("[farfield] demo load failed:", err.message);
    process.exit(1);
  });
}
