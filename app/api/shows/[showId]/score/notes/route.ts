import { NextResponse } from "next/server";
import { findShowScore } from "@/db/queries/scores";
import { listSets } from "@/db/queries/shows";
import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { segmentsOf } from "@/lib/score/anchors";
import { notesOnShowLine } from "@/lib/score/notes-answer";
import { parsedScore } from "../parsed";

/**
 * The confirmed score's notes per section and its tempo, on the show's count line (the first set at
 * count 0, each later set its counts after the one before), for the Listen control; `{ score: null }`
 * when the show has no confirmed score.
 */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  const [stored, sets] = await Promise.all([findShowScore(showId), listSets(showId)]);
  if (!stored) return NextResponse.json({ score: null });
  const score = parsedScore(stored.uploadId, stored.content);
  // Anchors were checked at confirm; a set deleted since drops out, and with no anchor left there is nothing to place.
  const anchors = stored.anchors.filter((a) => sets.some((s) => s.id === a.setId));
  if (!anchors.length) return NextResponse.json({ score: null });
  return NextResponse.json({ score: notesOnShowLine(score, stored.partMap, segmentsOf(score, anchors, sets)) });
});
