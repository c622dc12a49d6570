// Stored analyses: one row per set and listening point, with the inputs hash and the revisions it matched.
import { and, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { analyses, sets, shows } from "../schema";

/** The show's and the set's input revisions (see migration 0005), as read with the show and set rows. */
export type InputRevisions = { showRevision: number; setRevision: number };

/** What decides whether the stored result still holds, without the result itself (tens of KB to parse). */
export async function findStoredAnalysisKey(setId: string, listeningPointId: string) {
  const rows = await db
    .select({
      inputsHash: analyses.inputsHash,
      modelVersion: analyses.modelVersion,
      showRevision: analyses.showRevision,
      setRevision: analyses.setRevision,
      computedAt: analyses.computedAt,
    })
    .from(analyses)
    .where(and(eq(analyses.setId, setId), eq(analyses.listeningPointId, listeningPointId)))
    .limit(1);
  return rows[0] ?? null;
}

/** The stored result, while it still has this hash (null if another reader replaced it meanwhile). */
export async function findStoredResult(setId: string, listeningPointId: string, inputsHash: string) {
  const rows = await db
    .select({ result: analyses.result, computedAt: analyses.computedAt })
    .from(analyses)
    .where(and(eq(analyses.setId, setId), eq(analyses.listeningPointId, listeningPointId), eq(analyses.inputsHash, inputsHash)))
    .limit(1);
  return rows[0] ?? null;
}

const currentAnalysisText = db
  .select({
    computedAt: analyses.computedAt,
    showRevision: shows.inputsRevision,
    setRevision: sets.inputsRevision,
    resultText: sql<string>`${analyses.result}::text`,
  })
  .from(analyses)
  .innerJoin(sets, eq(sets.id, analyses.setId))
  .innerJoin(shows, eq(shows.id, sets.showId))
  .where(
    and(
      eq(analyses.setId, sql.placeholder("setId")),
      eq(analyses.listeningPointId, sql.placeholder("listeningPointId")),
      eq(analyses.modelVersion, sql.placeholder("modelVersion")),
      eq(analyses.showRevision, shows.inputsRevision),
      eq(analyses.setRevision, sets.inputsRevision),
    ),
  )
  .limit(1)
  .prepare("farfield_current_analysis_text");

/**
 * The stored result as JSON text, only if it was stored under this model version and the show's and set's
 * revisions are still the ones it matched: compared with the current rows in the same statement, and
 * never parsed here, since the answer sends it on as it is. Prepared once: it serves every analysis read.
 */
export async function findCurrentAnalysisText(setId: string, listeningPointId: string, modelVersion: string) {
  const rows = await currentAnalysisText.execute({ setId, listeningPointId, modelVersion });
  return rows[0] ?? null;
}

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
