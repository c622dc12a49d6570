// The body of GET …/analysis. Reads far outnumber changes, and a 300-performer answer is about 64 KB,
// so the encoded answer is also kept in memory beside the revisions it matched. PostgreSQL stays the
// source of truth: a kept answer is served only while the revisions the access check just read are the
// same, so every process answers alike and a restart loses nothing but the copy.
import "server-only";
import { LRUCache } from "lru-cache";
import type { Show } from "@/db/schema";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { jsonWithStoredObject } from "@/lib/http/stored-json";
import { storedAnalysis, storedAnalysisRow } from "./stored-analysis";

type Kept = { showRevision: number; setRevision: number; body: Uint8Array<ArrayBuffer> };

const kept = new LRUCache<string, Kept>({ maxSize: 32 * 1024 * 1024, sizeCalculation: (k) => k.body.byteLength });
const encoder = new TextEncoder();

/** `show` and `set` as the access check read them for this request: their revisions decide what is current. */
export async function analysisAnswer(show: Show, set: { id: string; order: number; inputsRevision: number }, listeningPointId: string): Promise<Uint8Array<ArrayBuffer>> {
  const key = `${set.id}/${listeningPointId}`;
  const hit = kept.get(key);
  if (hit && hit.showRevision === show.inputsRevision && hit.setRevision === set.inputsRevision) return hit.body;

  const head = { listeningPointId, modelVersion: MODEL_VERSION };
  const row = await storedAnalysisRow(set.id, listeningPointId);
  if (row?.currentText) {
    const fields = { ...head, computedAt: row.computedAt.toISOString(), reused: true };
    const body = encoder.encode(jsonWithStoredObject(fields, row.currentText));
    kept.set(key, { showRevision: row.showRevision, setRevision: row.setRevision, body });
    return body;
  }
  const { result, computedAt, reused } = await storedAnalysis(show, set, listeningPointId, row);
  return encoder.encode(JSON.stringify({ ...head, computedAt: computedAt.toISOString(), reused, ...result }));
}
