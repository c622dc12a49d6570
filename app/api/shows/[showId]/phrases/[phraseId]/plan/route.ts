import { NextResponse } from "next/server";
import { z } from "zod";
import { findPhrase } from "@/db/queries/music-edit";
import { adoptPlan, clearPlan } from "@/db/queries/plan-adoption";
import { runPhrasePlan } from "@/lib/analysis/run-phrase-plan";
import { loadShowBalance } from "@/lib/analysis/show-context";
import { requireShow } from "@/lib/auth/access";
import { parseWith, readJson } from "@/lib/http/body";
import { badRequest, notFound } from "@/lib/http/errors";
import { idSchema, route } from "@/lib/http/handler";
import { adoptPlanSchema } from "@/lib/validation/music";

type Params = { showId: string; phraseId: string };
const query = z.object({ listeningPointId: z.string().uuid("listeningPointId must be a listening point's id.") });

async function proposal(show: Parameters<typeof loadShowBalance>[0], phraseId: string, listeningPointId: string) {
  if (!idSchema.safeParse(phraseId).success) throw notFound("No such phrase.");
  return runPhrasePlan(await loadShowBalance(show), phraseId, listeningPointId);
}

/** The proposed plan for the phrase, with each set's mix and checks before and after. */
export const GET = route<Params>(async (req, { showId, phraseId }) => {
  const { show } = await requireShow(showId, "read");
  const { listeningPointId } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  return NextResponse.json(await proposal(show, phraseId, listeningPointId));
});

/** Adopts played dynamics for the phrase (directors): stored beside the written ones, which stay. */
export const POST = route<Params>(async (req, { showId, phraseId }) => {
  const { show } = await requireShow(showId, "adopt-plan");
  const body = await readJson(req, adoptPlanSchema);
  const plan = await proposal(show, phraseId, body.listeningPointId);
  const entries = body.entries.map((e, i) => {
    const unit = plan.entries.find((u) => u.section === e.section);
    if (!unit) throw badRequest("A section of the plan does not play in this phrase.", { [`entries.${i}.section`]: [`${e.section} does not play here.`] });
    return { section: e.section, playedDynamic: e.playedDynamic, performerIds: unit.performerIds };
  });
  await adoptPlan(phraseId, entries);
  return NextResponse.json({ adopted: entries.map(({ section, playedDynamic }) => ({ section, playedDynamic })) });
});

/** Back to the written dynamics for the phrase (directors). */
export const DELETE = route<Params>(async (_req, { showId, phraseId }) => {
  await requireShow(showId, "adopt-plan");
  if (!idSchema.safeParse(phraseId).success || !(await findPhrase(showId, phraseId))) throw notFound("No such phrase.");
  await clearPlan(phraseId);
  return new NextResponse(null, { status: 204 });
});
