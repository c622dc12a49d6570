import { NextResponse } from "next/server";
import { listProgramMembers } from "@/db/queries/members";
import { requireShow } from "@/lib/auth/access";
import { env } from "@/lib/env";
import { badRequest } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { rehearsalMessage } from "@/lib/mail/rehearsal-message";
import { trySendMail } from "@/lib/mail/transport";
import { rehearsalSendSchema } from "@/lib/validation/rehearsal";
import { assembleRehearsalPlan } from "../assemble";

/** E-mails the plan to the chosen members of the program (the director plans the stadium rehearsal). */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show, user } = await requireShow(showId, "adopt-plan");
  const { choice, userIds } = await readJson(req, rehearsalSendSchema, 20_000);
  const members = await listProgramMembers(show.programId);
  const chosen = members.filter((m) => userIds.includes(m.userId));
  if (chosen.length !== new Set(userIds).size) throw badRequest("Some chosen people are not members of this program.", { userIds: ["Choose members of this program."] });
  const plan = await assembleRehearsalPlan(show, choice);
  const query = new URLSearchParams([...choice.phraseIds.map((id) => ["phrase", id]), ...choice.setIds.map((id) => ["set", id]), ["point", plan.listenFrom.id]]);
  const message = rehearsalMessage({
    baseUrl: env.APP_BASE_URL,
    path: `/shows/${show.id}/rehearsal?${query}`,
    programName: plan.programName,
    showName: show.name,
    senderName: user.name,
    listenFrom: plan.listenFrom,
    items: plan.items,
  });
  const results = await Promise.all(chosen.map(async (m) => ({ email: m.email, sent: await trySendMail(m.email, message) })));
  return NextResponse.json({ sent: results.filter((r) => r.sent).map((r) => r.email), failed: results.filter((r) => !r.sent).map((r) => r.email) });
});
