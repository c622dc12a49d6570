import { NextResponse } from "next/server";
import { isResetTokenOpen, useResetToken } from "@/db/queries/resets";
import { linkTokenHash } from "@/lib/auth/one-time-links";
import { hashPassword } from "@/lib/auth/password";
import { endAllSessions } from "@/lib/auth/session";
import { HttpError } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { resetConfirmSchema } from "@/lib/validation/team";

const closed = () => new HttpError(410, "This reset link has expired or was already used. Ask for a new one.");

/** Whether a reset link still works (the page asks before showing the form). */
export const GET = route(async (req) => {
  const hash = linkTokenHash(new URL(req.url).searchParams.get("token") ?? "");
  if (!hash || !(await isResetTokenOpen(hash))) throw closed();
  return NextResponse.json({ ok: true });
});

/** Sets the new password with a reset token, once; every session of that user ends. */
export const POST = route(async (req) => {
  const { token, password } = await readJson(req, resetConfirmSchema, 2_000);
  const hash = linkTokenHash(token);
  if (!hash) throw closed();
  const used = await useResetToken(hash, await hashPassword(password));
  if (!used) throw closed();
  await endAllSessions(used.userId);
  return NextResponse.json({ ok: true, message: "Your password is changed. Sign in with it." });
});
