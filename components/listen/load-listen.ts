// Reads what Listen plays: each set's parts, and the score's notes when the show has a score.
import { apiErrorFrom, fetcher } from "@/components/fetcher";
import { scoreNotesSchema, type ScoreNotes } from "@/lib/listen/score-notes";
import type { ListenAnswer } from "@/lib/listen/types";
import { listenKeys } from "./listen-keys";

export interface SetRef {
  id: string;
  version: number | null;
}

/** The parts of the from-set (null for the opening set) and the to-set at a listening point. */
export async function loadParts(showId: string, from: SetRef | null, to: SetRef, listeningPointId: string): Promise<{ from: ListenAnswer | null; to: ListenAnswer }> {
  const [a, b] = await Promise.all([
    from ? fetcher<ListenAnswer>(listenKeys.parts(showId, from.id, listeningPointId, from.version)) : Promise.resolve(null),
    fetcher<ListenAnswer>(listenKeys.parts(showId, to.id, listeningPointId, to.version)),
  ]);
  return { from: a, to: b };
}

/** The score's notes; null when the show has none (or the server does not offer scores: 404). */
export async function loadScore(showId: string): Promise<NonNullable<ScoreNotes["score"]> | null> {
  const res = await fetch(listenKeys.scoreNotes(showId), { headers: { accept: "application/json" }, credentials: "same-origin" });
  if (res.status === 404) return null;
  if (!res.ok) throw await apiErrorFrom(res);
  const parsed = scoreNotesSchema.safeParse(await res.json());
  if (!parsed.success) throw new Error("The score's notes came in a form this page cannot read.");
  return parsed.data.score;
}
