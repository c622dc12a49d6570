import { after, NextResponse } from "next/server";
import { countRecentResets, createReset } from "@/db/queries/resets";
import { findUserByEmail } from "@/db/queries/users";
import { issueLinkToken, RESET_LIFETIME_MS } from "@/lib/auth/one-time-links";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { sendReset } from "@/lib/mail/send-reset";
import { resetRequestSchema } from "@/lib/validation/team";

const MAX_PER_WINDOW = 3;
const WINDOW_MS = 15 * 60 * 1000;

/**
 * Asks for a reset link. The answer is the same whether or not the address has an account, and the
 * message goes out after the answer, so neither the words nor the timing tell.
 */
export const POST = route(async (req) => {
  const { email } = await readJson(req, resetRequestSchema, 2_000);
  after(async () => {
    const user = await findUserByEmail(email);
    if (!user) return;
    if ((await countRecentResets(user.id, new Date(Date.now() - WINDOW_MS))) >= MAX_PER_WINDOW) return;
    const { token, tokenHash, expiresAt } = issueLinkToken(RESET_LIFETIME_MS);
    await createReset(user.id, tokenHash, expiresAt);
    await sendReset({ email: user.email, name: user.name, token, expiresAt });
  });
  return NextResponse.json({ ok: true, message: "If an account uses this address, a link to choose a new password is on its way." }, { status: 202 });
});
