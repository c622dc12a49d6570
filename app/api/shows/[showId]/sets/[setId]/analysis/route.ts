import { NextResponse } from "next/server";
import { z } from "zod";
import { requireSet } from "@/lib/auth/access";
import { storedAnalysis } from "@/lib/analysis/stored-analysis";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";

const query = z.object({ listeningPointId: z.string().uuid("listeningPointId must be a listening point's id.") });

export const GET = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { show, set } = await requireSet(showId, setId, "read");
  const { listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const { result, computedAt, reused } = await storedAnalysis(show, set, listeningPointId);
  return NextResponse.json({
    listeningPointId,
    modelVersion: MODEL_VERSION,
    computedAt: computedAt.toISOString(),
    reused,
    mix: result.mix,
    checks: result.checks,
    plan: result.plan,
    planUnmet: result.planUnmet,
  });
});
