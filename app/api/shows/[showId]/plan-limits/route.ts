import { NextResponse } from "next/server";
import { listPhraseLimits, savePhraseLimits, saveShowLimits } from "@/db/queries/plan-limits";
import { DEFAULT_LIMITS, LIMIT_STEPS_RANGE } from "@/lib/acoustics/plan-limits";
import { limitsFor, storedLimits } from "@/lib/analysis/plan-limits";
import { requireShow } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { readJson } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { savePlanLimitsSchema } from "@/lib/validation/plan-limits";

/** The balance plan's musical limits: the defaults, the show's, and each phrase's in force. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show, role } = await requireShow(showId, "read");
  const rows = await listPhraseLimits(showId);
  return NextResponse.json({
    defaults: DEFAULT_LIMITS,
    stepsRange: LIMIT_STEPS_RANGE,
    show: { custom: storedLimits(show.planLimits), limits: limitsFor(show.planLimits, null) },
    phrases: rows.map((p) => ({ id: p.id, name: p.name, custom: storedLimits(p.limits), limits: limitsFor(show.planLimits, p.limits) })),
    canEdit: can(role, "adopt-plan"),
  });
});

/** Directors set the limits of the show or of one phrase (every stored analysis recomputes: its hash includes them). */
export const PUT = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "adopt-plan");
  const body = await readJson(req, savePlanLimitsSchema, 10_000);
  const stored = body.limits && Object.keys(body.limits).length ? body.limits : null;
  if (body.phraseId) {
    if (!(await savePhraseLimits(showId, body.phraseId, stored))) throw notFound("No such phrase.");
    return NextResponse.json({ phraseId: body.phraseId, custom: storedLimits(stored) });
  }
  await saveShowLimits(showId, stored);
  return NextResponse.json({ custom: storedLimits(stored), limits: limitsFor(stored, null) });
});
