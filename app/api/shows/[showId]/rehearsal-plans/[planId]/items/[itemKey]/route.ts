import { NextResponse } from "next/server";
import { findRehearsalPlan, markRehearsalItem } from "@/db/queries/rehearsal-plans";
import { isUuid, requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { markRehearsalItemSchema } from "@/lib/validation/rehearsal";

/** Marks one item of a kept plan done or not, during the rehearsal: every member may (staff run the sections). */
export const PUT = route<{ showId: string; planId: string; itemKey: string }>(async (req, { showId, planId, itemKey }) => {
  const { show, user } = await requireShow(showId, "comment");
  const { done } = await readJson(req, markRehearsalItemSchema);
  const kept = isUuid(planId) ? await findRehearsalPlan(show.id, planId) : null;
  if (!kept || !kept.plan.items.some((it) => it.key === itemKey)) throw notFound("No such item in this rehearsal plan.");
  await markRehearsalItem(kept.id, itemKey, done, user.id);
  return NextResponse.json({ itemKey, done });
});
