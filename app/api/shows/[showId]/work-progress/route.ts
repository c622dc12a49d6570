import { NextResponse } from "next/server";
import { planWork, progressOf, sweepWork } from "@/lib/analysis/work-progress";
import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

/** How far the show's long work has got: the transition sweeps behind the timeline, the phrases' plans behind a rehearsal plan (each null when none runs). */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  return NextResponse.json({ sweeps: progressOf(sweepWork(showId)), plans: progressOf(planWork(showId)) });
});
