// Stored analyses: one row per set and listening point, with the inputs hash and the revisions it matched.
import { and, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { analyses, sets, shows } from "../schema";

/** The show's and the set's input revisions (see migration 0005), as read with the show and set rows. */
export type InputRevisions = { showRevision: number; setRevision: number };

/** The stored result, while it still has this hash (null if another reader replaced it meanwhile). */
export async function findStoredResult(setId: string, listeningPointId: string, inputsHash: string) {
  const rows = await db
    .select({ result: analyses.result, computedAt: analyses.computedAt })
    .from(analyses)
    .where(and(eq(analyses.setId, setId), eq(analyses.listeningPointId, listeningPointId), eq(analyses.inputsHash, inputsHash)))
    .limit(1);
  return rows[0] ?? null;
}

// Current: stored under this model version, and the show's and set's revisions are still the ones it
// matched, compared with the current rows in the same statement.
const isCurrent = sql<boolean>`(${analyses.modelVersion} = ${sql.placeholder("modelVersion")} and ${analyses.showRevision} = ${shows.inputsRevision} and ${analyses.setRevision} = ${sets.inputsRevision})`;

const storedRow = db
  .select({
    inputsHash: analyses.inputsHash,
    modelVersion: analyses.modelVersion,
    computedAt: analyses.computedAt,
    showRevision: shows.inputsRevision,
    setRevision: sets.inputsRevision,
    // Read (and decompressed) only when it can be served.
    currentText: sql<string | null>`case when ${isCurrent} then ${analyses.result}::text end`,
  })
  .from(analyses)
  .innerJoin(sets, eq(sets.id, analyses.setId))
  .innerJoin(shows, eq(shows.id, sets.showId))
  .where(and(eq(analyses.setId, sql.placeholder("setId")), eq(analyses.listeningPointId, sql.placeholder("listeningPointId"))))
  .limit(1)
  .prepare("farfield_stored_analysis");

/**
 * The stored row of a set at a listening point: its hash and version, and its result as JSON text when it
 * is current (then `showRevision` and `setRevision` are the revisions it matched). Never parsed here: the
 * analysis answer sends the text on as it is. Prepared once: it serves every analysis read.
 */
export async function findStoredAnalysis(setId: string, listeningPointId: string, modelVersion: string) {
  const rows = await storedRow.execute({ setId, listeningPointId, modelVersion });
  return rows[0] ?? null;
}

export type StoredAnalysisRow = NonNullable<Awaited<ReturnType<typeof findStoredAnalysis>>>;

export async function storeAnalysis(
  row: { setId: string; listeningPointId: string; inputsHash: string; modelVersion: string; result: unknown } & InputRevisions,
) {
  const computedAt = new Date();
  await db
    .insert(analyses)
    .values({ ...row, computedAt })
    .onConflictDoUpdate({
      target: [analyses.setId, analyses.listeningPointId],
      set: { inputsHash: row.inputsHash, modelVersion: row.modelVersion, result: row.result, computedAt, showRevision: row.showRevision, setRevision: row.setRevision },
    });
  return computedAt;
}

/**
 * The stored result was found to match its inputs again: remember the revisions it matched. Only while the
 * row still holds that hash, since a slower reader may have stored a result of older inputs meanwhile.
 */
export async function markAnalysisCurrent(
  key: { setId: string; listeningPointId: string; inputsHash: string; modelVersion: string },
  revisions: InputRevisions,
) {
  await db
    .update(analyses)
    .set(revisions)
    .where(
      and(
        eq(analyses.setId, key.setId),
        eq(analyses.listeningPointId, key.listeningPointId),
        eq(analyses.inputsHash, key.inputsHash),
        eq(analyses.modelVersion, key.modelVersion),
      ),
    );
}
