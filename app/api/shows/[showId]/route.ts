import { NextResponse } from "next/server";
import { listListeningPoints, listPerformers, listSets } from "@/db/queries/shows";
import { requireShow } from "@/lib/auth/access";
import { showConditions } from "@/lib/analysis/show-conditions";
import { route } from "@/lib/http/handler";

export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show, role } = await requireShow(showId, "read");
  const [listeningPoints, performers, sets] = await Promise.all([listListeningPoints(showId), listPerformers(showId), listSets(showId)]);
  return NextResponse.json({
    show: {
      id: show.id,
      programId: show.programId,
      name: show.name,
      fieldRules: show.fieldRules,
      conditions: showConditions(show),
    },
    role,
    listeningPoints,
    performers,
    sets,
  });
});
