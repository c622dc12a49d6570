import { NextResponse } from "next/server";
import { z } from "zod";
import { requireSet } from "@/lib/auth/access";
import { listenAnswer } from "@/lib/analysis/listen-answer";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";

const query = z.object({ listeningPointId: z.string().uuid("listeningPointId must be a listening point's id.") });

/** What the Listen control plays for the set at a listening point: each section's voice as written, the plan's change, the arrival. */
export const GET = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { show, set } = await requireSet(showId, setId, "read");
  const { listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  return NextResponse.json(await listenAnswer(show, set, listeningPointId));
});
