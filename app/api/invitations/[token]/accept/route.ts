import { NextResponse } from "next/server";
import { acceptInvitation, findInvitationByTokenHash } from "@/db/queries/invitations";
import { findUserByEmail } from "@/db/queries/users";
import { CLOSED_INVITATION_WORDS, linkState, linkTokenHash } from "@/lib/auth/one-time-links";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { beginSignIn } from "@/lib/auth/rate-limit";
import { getCurrentSession, startSession } from "@/lib/auth/session";
import { badRequest, HttpError, notFound } from "@/lib/http/errors";
import { parseWith, readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { acceptInvitationSchema, newAccountPassword } from "@/lib/validation/team";

const gone = (state: Exclude<ReturnType<typeof linkState>, "open">) => new HttpError(410, CLOSED_INVITATION_WORDS[state], { state });

/**
 * Uses the invitation once. A new person sends { name, password } and gets an account; someone
 * who has an account for the invited address is signed in as it, or sends its password.
 */
export const POST = route<{ token: string }>(async (req, { token }) => {
  const hash = linkTokenHash(token);
  const invitation = hash ? await findInvitationByTokenHash(hash) : null;
  if (!hash || !invitation) throw notFound("This invitation link is not valid. Check that the whole address was copied.");
  const state = linkState(invitation);
  if (state !== "open") throw gone(state);
  const body = await readJson(req, acceptInvitationSchema, 4_000);
  const [{ user }, account] = await Promise.all([getCurrentSession(), findUserByEmail(invitation.email)]);

  let who: Parameters<typeof acceptInvitation>[1];
  if (account) {
    if (user?.id !== account.id) {
      // The page does not know whether the address has an account; a "new account" form lands here too.
      if (!body.password || body.name) throw new HttpError(401, `${invitation.email} has a Farfield account already: enter its password to join.`);
      const attempt = await beginSignIn(invitation.email, req);
      if (!(await verifyPassword(account.passwordHash, body.password))) throw new HttpError(401, "Wrong password for this account.");
      await attempt.succeeded();
    }
    who = { userId: account.id };
  } else {
    if (!body.name) throw badRequest(`${invitation.email} has no Farfield account yet: enter your name and choose a password.`, { name: ["Enter your name."] });
    const password = parseWith(newAccountPassword, body.password ?? "", "The password");
    who = { newUser: { email: invitation.email, name: body.name, passwordHash: await hashPassword(password) } };
  }

  const result = await acceptInvitation(hash, who);
  if (!result.ok) {
    const again = await findInvitationByTokenHash(hash);
    const now = again ? linkState(again) : "used";
    throw gone(now === "open" ? "used" : now);
  }
  if (user?.id !== result.userId) await startSession(result.userId!);
  return NextResponse.json(
    { programId: result.programId, role: result.role, alreadyMember: result.alreadyMember, user: { id: result.userId, email: invitation.email } },
    { status: account ? 200 : 201 },
  );
});
