import { NextResponse } from "next/server";
import { findInvitationByTokenHash } from "@/db/queries/invitations";
import { CLOSED_INVITATION_WORDS, linkState, linkTokenHash } from "@/lib/auth/one-time-links";
import { getCurrentSession } from "@/lib/auth/session";
import { HttpError, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

/**
 * What the invitation page shows: the program, the role, who is signed in. Whether the address has an
 * account is not said here (the page asks; the accept answer tells the link's holder alone).
 */
export const GET = route<{ token: string }>(async (_req, { token }) => {
  const hash = linkTokenHash(token);
  const invitation = hash ? await findInvitationByTokenHash(hash) : null;
  if (!invitation) throw notFound("This invitation link is not valid. Check that the whole address was copied.");
  const state = linkState(invitation);
  if (state !== "open") throw new HttpError(410, CLOSED_INVITATION_WORDS[state], { state });
  const { user } = await getCurrentSession();
  return NextResponse.json({
    invitation: {
      email: invitation.email,
      role: invitation.role,
      programName: invitation.programName,
      invitedBy: invitation.invitedByName,
      expiresAt: invitation.expiresAt,
    },
    signedInAs: user?.email ?? null,
  });
});
