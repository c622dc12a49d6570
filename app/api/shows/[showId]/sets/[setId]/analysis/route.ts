import { z } from "zod";
import { requireSet } from "@/lib/auth/access";
import { analysisAnswer } from "@/lib/analysis/analysis-answer";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";

const query = z.object({ listeningPointId: z.string().uuid("listeningPointId must be a listening point's id.") });

export const GET = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { show, set } = await requireSet(showId, setId, "read");
  const { listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const body = await analysisAnswer(show, set, listeningPointId);
  return new Response(body, { headers: { "content-type": "application/json" } });
});
