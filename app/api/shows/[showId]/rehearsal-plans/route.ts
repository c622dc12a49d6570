import { NextResponse } from "next/server";
import { keepRehearsalPlan, listRehearsalPlans } from "@/db/queries/rehearsal-plans";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { keepRehearsalPlanSchema } from "@/lib/validation/rehearsal";
import { assembleRehearsalPlan } from "../rehearsal-plan/assemble";

/** The show's kept rehearsal plans, newest first, with how many items are done. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  return NextResponse.json({ plans: await listRehearsalPlans(showId) });
});

/** Keeps a plan as built now (the director plans the stadium rehearsal): 201 with its id. */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show, user } = await requireShow(showId, "adopt-plan");
  const { name, choice } = await readJson(req, keepRehearsalPlanSchema, 20_000);
  const built = await assembleRehearsalPlan(show, choice);
  const kept = await keepRehearsalPlan({
    showId: show.id,
    name,
    budgetMinutes: built.budgetMinutes,
    choice,
    plan: { listenFrom: { id: built.listenFrom.id, name: built.listenFrom.name, words: built.listenFrom.words }, items: built.items },
    createdBy: user.id,
  });
  return NextResponse.json({ plan: { id: kept.id, name, budgetMinutes: built.budgetMinutes, createdAt: kept.createdAt } }, { status: 201 });
});
