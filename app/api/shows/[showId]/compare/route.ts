import { NextResponse } from "next/server";
import { z } from "zod";
import { findSetInShow } from "@/db/queries/sets";
import { listPerformers, listSets } from "@/db/queries/shows";
import { compareMixes } from "@/lib/analysis/compare";
import { showTargets } from "@/lib/analysis/show-targets";
import { storedAnalysis } from "@/lib/analysis/stored-analysis";
import { requireShow } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

const query = z.object({
  a: z.string().uuid("a must be a set's id."),
  b: z.string().uuid("b must be a set's id.").optional(),
  listeningPointId: z.string().uuid("listeningPointId must be a listening point's id."),
});

/** Two sets' box mixes (b defaults to the set after a) with the differences and the voices that move too much. */
export const GET = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const q = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const setA = await findSetInShow(showId, q.a);
  if (!setA) throw notFound("No such set.");
  let setB = q.b ? await findSetInShow(showId, q.b) : null;
  if (!q.b) {
    const all = await listSets(showId);
    const next = all[all.findIndex((s) => s.id === setA.id) + 1];
    setB = next ? await findSetInShow(showId, next.id) : null;
  }
  if (!setB) throw notFound(q.b ? "No such set." : "This is the last set: there is no next one to compare with.");
  const [a, b, roster] = await Promise.all([storedAnalysis(show, setA, q.listeningPointId), storedAnalysis(show, setB, q.listeningPointId), listPerformers(showId)]);
  const labels = new Map(roster.map((p) => [p.id, { label: p.label, section: p.section }]));
  const side = (set: typeof setA, r: typeof a) => ({ set: { id: set.id, number: set.number, counts: set.counts }, mix: r.result.mix, loudness: r.result.loudness, checks: r.result.checks });
  return NextResponse.json({
    listeningPointId: q.listeningPointId,
    a: side(setA, a),
    b: side(setB, b),
    changes: compareMixes(a.result.mix, b.result.mix, showTargets(show.checkTargets).setChangeDb, labels),
  });
});
