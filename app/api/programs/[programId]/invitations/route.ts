import { NextResponse } from "next/server";
import { createInvitation, isMemberByEmail, listOpenInvitations } from "@/db/queries/invitations";
import { findProgram } from "@/db/queries/programs";
import { requireProgram } from "@/lib/auth/access";
import { INVITATION_LIFETIME_MS, issueLinkToken } from "@/lib/auth/one-time-links";
import { conflict, notFound } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { reserveInvitationMail } from "@/lib/mail/limits";
import { sendInvitation } from "@/lib/mail/send-invitation";
import { inviteSchema } from "@/lib/validation/team";

type Params = { programId: string };

/** Open invitations (directors only: they carry e-mail addresses of people not yet in the program). */
export const GET = route<Params>(async (_req, { programId }) => {
  await requireProgram(programId, "manage-members");
  return NextResponse.json({ invitations: await listOpenInvitations(programId) });
});

/** Invites an address with a role and e-mails the link; an earlier open invitation for it is revoked. 429 past the day's invitations of the program or the sender. */
export const POST = route<Params>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "manage-members");
  const input = await readJson(req, inviteSchema, 4_000);
  const program = await findProgram(programId);
  if (!program) throw notFound("No such program.");
  if (await isMemberByEmail(programId, input.email)) throw conflict(`${input.email} is already a member of this program.`);
  await reserveInvitationMail(programId, user.id, input.email);
  const { token, tokenHash, expiresAt } = issueLinkToken(INVITATION_LIFETIME_MS);
  const invitation = await createInvitation({ programId, email: input.email, role: input.role, tokenHash, expiresAt, invitedBy: user.id });
  const mailed = await sendInvitation({ email: input.email, token, programName: program.name, role: input.role, inviterName: user.name, expiresAt });
  return NextResponse.json({ invitation, mailed }, { status: 201 });
});
