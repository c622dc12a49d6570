import { NextResponse } from "next/server";
import { saveCheckTargets } from "@/db/queries/shows";
import { DEFAULT_TARGETS, TARGET_RANGES } from "@/lib/acoustics/targets";
import { showTargets } from "@/lib/analysis/show-targets";
import { requireShow } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { saveTargetsSchema } from "@/lib/validation/targets";

/** The show's balance thresholds in force, the documented defaults and the allowed ranges. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show, role } = await requireShow(showId, "read");
  return NextResponse.json({
    targets: showTargets(show.checkTargets),
    custom: show.checkTargets ?? null,
    defaults: DEFAULT_TARGETS,
    ranges: TARGET_RANGES,
    canEdit: can(role, "adopt-plan"),
  });
});

/** Directors set the thresholds (every stored analysis recomputes, its hash includes them) or reset them. */
export const PUT = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "adopt-plan");
  const body = await readJson(req, saveTargetsSchema, 10_000);
  const stored = "reset" in body ? null : body.targets;
  await saveCheckTargets(showId, stored);
  return NextResponse.json({ targets: showTargets(stored), custom: stored });
});
