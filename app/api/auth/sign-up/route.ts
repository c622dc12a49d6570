import { after, NextResponse } from "next/server";
import { createPendingSignUp } from "@/db/queries/sign-ups";
import { findUserByEmail } from "@/db/queries/users";
import { issueLinkToken, SIGN_UP_LIFETIME_MS } from "@/lib/auth/one-time-links";
import { hashPassword } from "@/lib/auth/password";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { reserveSignUpMail } from "@/lib/mail/limits";
import { sendSignUpConfirm, sendSignUpExisting } from "@/lib/mail/send-sign-up";
import { signUpSchema } from "@/lib/validation/auth";

/**
 * Starts a sign-up. The answer is the same whether or not the address has an account: a new address
 * gets a link that creates the account and its program (POST /api/auth/sign-up/confirm), an address
 * with an account gets a notice that someone tried. The lookup and the messages run after the answer,
 * so neither the words nor the timing tell; a few messages an hour at most reach one address.
 */
export const POST = route(async (req) => {
  const input = await readJson(req, signUpSchema, 10_000);
  const sending = await reserveSignUpMail(input.email);
  if (sending) {
    after(async () => {
      const account = await findUserByEmail(input.email);
      if (account) {
        await sendSignUpExisting({ email: account.email, name: account.name });
        return;
      }
      const { token, tokenHash, expiresAt } = issueLinkToken(SIGN_UP_LIFETIME_MS);
      await createPendingSignUp({ email: input.email, name: input.name, programName: input.programName, passwordHash: await hashPassword(input.password), tokenHash, expiresAt });
      await sendSignUpConfirm({ email: input.email, token, name: input.name, programName: input.programName, expiresAt });
    });
  }
  return NextResponse.json(
    { ok: true, email: input.email, message: `Check your e-mail: a message to ${input.email} tells you how to continue. The link in it works for 24 hours.` },
    { status: 202 },
  );
});
