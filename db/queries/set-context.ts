import { and, eq } from "drizzle-orm";
import { db } from "../client";
import { analyses } from "../schema";
import { currentCatalog } from "./catalog";
import { loadMusic } from "./music";
import { listPositions } from "./sets";
import { listListeningPoints, listPerformers } from "./shows";

/** Everything the engine needs about one set, read from the database. */
export async function loadSetContext(show: { id: string; programId: string }, set: { id: string; order: number }) {
  const [roster, positions, music, listeningPoints, catalog] = await Promise.all([
    listPerformers(show.id),
    listPositions(set.id),
    loadMusic(show.id),
    listListeningPoints(show.id),
    currentCatalog(show.programId),
  ]);
  return { roster, positions, music, listeningPoints, catalog };
}

export async function findStoredAnalysis(setId: string, listeningPointId: string) {
  const rows = await db
    .select()
    .from(analyses)
    .where(and(eq(analyses.setId, setId), eq(analyses.listeningPointId, listeningPointId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function storeAnalysis(row: { setId: string; listeningPointId: string; inputsHash: string; modelVersion: string; result: unknown }) {
  const computedAt = new Date();
  await db
    .insert(analyses)
    .values({ ...row, computedAt })
    .onConflictDoUpdate({
      target: [analyses.setId, analyses.listeningPointId],
      set: { inputsHash: row.inputsHash, modelVersion: row.modelVersion, result: row.result, computedAt },
    });
  return computedAt;
}
