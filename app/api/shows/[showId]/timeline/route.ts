import { NextResponse } from "next/server";
import { z } from "zod";
import { loadShowBalance } from "@/lib/analysis/show-context";
import { storedShowSweeps } from "@/lib/analysis/sweep-store";
import { showTimeline } from "@/lib/analysis/timeline";
import { requireShow } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

const query = z.object({ listeningPointId: z.string().uuid("listeningPointId must be a listening point's id.") });

/** Each voice's level at the listening point across the whole show, count by count, with the failing checks. */
export const GET = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const sb = await loadShowBalance(show);
  if (!sb.listeningPoints.some((l) => l.id === listeningPointId)) throw notFound("No such listening point in this show.");
  const { sweeps, recomputed, reused } = await storedShowSweeps(sb);
  return NextResponse.json({ ...showTimeline(sweeps, listeningPointId), recomputed, reused });
});
