import { NextResponse } from "next/server";
import { listProgramMembers } from "@/db/queries/members";
import { loadMusic } from "@/db/queries/music";
import { listListeningPoints, listSets } from "@/db/queries/shows";
import { requireShow } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { rehearsalChoiceSchema } from "@/lib/validation/rehearsal";
import { assembleRehearsalPlan } from "./assemble";

/** What can be chosen: the phrases with their sets, the sets, the listening points, and (for directors) whom to send to. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show, role } = await requireShow(showId, "read");
  const [sets, music, listeningPoints] = await Promise.all([listSets(showId), loadMusic(showId), listListeningPoints(showId)]);
  const numberAt = (order: number) => sets.find((s) => s.order === order)?.number ?? "";
  return NextResponse.json({
    show: { id: show.id, name: show.name },
    phrases: music.phrases.map((p) => ({ id: p.id, name: p.name, firstSet: numberAt(p.firstOrder), lastSet: numberAt(p.lastOrder) })),
    sets: sets.map((s) => ({ id: s.id, number: s.number, counts: s.counts })),
    listeningPoints,
    canSend: can(role, "adopt-plan"),
    members: can(role, "adopt-plan") ? (await listProgramMembers(show.programId)).map((m) => ({ userId: m.userId, name: m.name, email: m.email, role: m.role })) : [],
  });
});

/** The stadium rehearsal plan for the chosen phrases and sets, worst balance first. */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const choice = await readJson(req, rehearsalChoiceSchema, 20_000);
  return NextResponse.json(await assembleRehearsalPlan(show, choice));
});
