import { NextResponse } from "next/server";
import { listOpenInvitations, renewInvitation } from "@/db/queries/invitations";
import { findProgram } from "@/db/queries/programs";
import { requireProgram } from "@/lib/auth/access";
import { INVITATION_LIFETIME_MS, issueLinkToken } from "@/lib/auth/one-time-links";
import { notFound } from "@/lib/http/errors";
import { idSchema, route } from "@/lib/http/handler";
import { reserveInvitationMail } from "@/lib/mail/limits";
import { sendInvitation } from "@/lib/mail/send-invitation";

/** Sends an open invitation again with a new link and seven fresh days; the old link stops working. Counts against the same limits as a new invitation. */
export const POST = route<{ programId: string; invitationId: string }>(async (_req, { programId, invitationId }) => {
  const { user } = await requireProgram(programId, "manage-members");
  if (!idSchema.safeParse(invitationId).success) throw notFound("No open invitation with this id.");
  const open = (await listOpenInvitations(programId)).find((i) => i.id === invitationId);
  if (!open) throw notFound("No open invitation with this id.");
  await reserveInvitationMail(programId, user.id, open.email);
  const { token, tokenHash, expiresAt } = issueLinkToken(INVITATION_LIFETIME_MS);
  const invitation = await renewInvitation(programId, invitationId, tokenHash, expiresAt);
  if (!invitation) throw notFound("No open invitation with this id.");
  const program = await findProgram(programId);
  const mailed = await sendInvitation({ email: invitation.email, token, programName: program?.name ?? "", role: invitation.role, inviterName: user.name, expiresAt });
  return NextResponse.json({ invitation, mailed });
});
