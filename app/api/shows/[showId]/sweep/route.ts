import { NextResponse } from "next/server";
import { z } from "zod";
import { loadShowBalance } from "@/lib/analysis/show-context";
import { storedShowSweeps } from "@/lib/analysis/sweep-store";
import { transitionOf } from "@/lib/analysis/timeline";
import { requireShow } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

const query = z.object({
  setId: z.string().uuid("setId must be a set's id."),
  listeningPointId: z.string().uuid("listeningPointId must be a listening point's id."),
});

/** The transition sweep into a set: the box mix at every count from the previous set, with the failing checks. */
export const GET = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { setId, listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const sb = await loadShowBalance(show);
  if (!sb.listeningPoints.some((l) => l.id === listeningPointId)) throw notFound("No such listening point in this show.");
  const { sweeps } = await storedShowSweeps(sb);
  const t = transitionOf(sweeps, setId, listeningPointId);
  if (!t) throw notFound("No such set.");
  return NextResponse.json(t);
});
