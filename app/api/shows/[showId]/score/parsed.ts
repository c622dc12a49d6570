// A kept score file read once per process: an upload never changes, so its parse is reused by id. Reading
// the demo's arrangement takes a few hundred milliseconds; the cache sits on globalThis so every route
// bundle of the process (score, notes, the page's preload) shares it.
import "server-only";
import { LRUCache } from "lru-cache";
import { parseScore } from "@/lib/score/parse-score";
import type { Score } from "@/lib/score/types";

const holder = globalThis as typeof globalThis & { farfieldScores?: LRUCache<string, Score> };
const cache = (holder.farfieldScores ??= new LRUCache<string, Score>({ max: 16 }));

/** The score of upload `uploadId` (its bytes `content`), parsed at most once while it stays in the cache. */
export function parsedScore(uploadId: string, content: Uint8Array): Score {
  const hit = cache.get(uploadId);
  if (hit) return hit;
  const score = parseScore(content);
  cache.set(uploadId, score);
  return score;
}

/** Keeps a score just parsed from its upload, so the next preview of it reads no file. */
export function rememberScore(uploadId: string, score: Score) {
  cache.set(uploadId, score);
}
