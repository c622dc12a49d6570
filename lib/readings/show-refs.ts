// What a reading may refer to in a show (sets, listening points, sections), and the check of a reading against it.
import "server-only";
import { listListeningPoints, listPerformers, listSets } from "@/db/queries/shows";
import type { ReadingBody } from "@/lib/validation/readings";
import type { CsvContext } from "./csv";

export async function showRefs(showId: string): Promise<CsvContext> {
  const [sets, points, roster] = await Promise.all([listSets(showId), listListeningPoints(showId), listPerformers(showId)]);
  return {
    sets: sets.map((s) => ({ id: s.id, number: s.number })),
    listeningPoints: points.map((p) => ({ id: p.id, name: p.name })),
    sections: [...new Set(roster.map((p) => p.section))],
  };
}

/** Field issues (as the API's `issues`) for references the show does not have; empty when all are known. */
export function referenceIssues(body: ReadingBody, refs: CsvContext): Record<string, string[]> {
  const issues: Record<string, string[]> = {};
  if (!refs.sets.some((s) => s.id === body.setId)) issues.setId = ["Not a set of this show."];
  if (!refs.listeningPoints.some((p) => p.id === body.listeningPointId)) issues.listeningPointId = ["Not a listening point of this show."];
  body.sections.forEach((s, i) => {
    if (!refs.sections.includes(s.section)) issues[`sections.${i}.section`] = [`No section "${s.section}" in this show's roster.`];
  });
  return issues;
}
