import { NextResponse } from "next/server";
import { findRehearsalPlan } from "@/db/queries/rehearsal-plans";
import { isUuid, requireShow } from "@/lib/auth/access";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

/** One kept plan as it was built, with the items marked done (by whom, when). */
export const GET = route<{ showId: string; planId: string }>(async (_req, { showId, planId }) => {
  const { show } = await requireShow(showId, "read");
  const kept = isUuid(planId) ? await findRehearsalPlan(show.id, planId) : null;
  if (!kept) throw notFound("No such rehearsal plan in this show.");
  return NextResponse.json({
    plan: { id: kept.id, name: kept.name, budgetMinutes: kept.budgetMinutes, choice: kept.choice, createdAt: kept.createdAt, listenFrom: kept.plan.listenFrom, items: kept.plan.items },
    done: kept.done,
  });
});
