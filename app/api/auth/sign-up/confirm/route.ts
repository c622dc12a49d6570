import { NextResponse } from "next/server";
import { confirmSignUp, findOpenSignUp } from "@/db/queries/sign-ups";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { linkTokenHash } from "@/lib/auth/one-time-links";
import { startSession } from "@/lib/auth/session";
import { conflict, HttpError } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { signUpConfirmSchema } from "@/lib/validation/auth";

const closed = () => new HttpError(410, "This link has expired or was already used. Sign up again, or sign in if you have an account.");

/** What the confirmation page shows: the address, the name and the program the link will create. */
export const GET = route(async (req) => {
  const hash = linkTokenHash(new URL(req.url).searchParams.get("token") ?? "");
  const pending = hash ? await findOpenSignUp(hash) : null;
  if (!pending) throw closed();
  return NextResponse.json({ signUp: pending });
});

/** Uses the link once: creates the account and its program with the new user as director, and signs them in. */
export const POST = route(async (req) => {
  const { token } = await readJson(req, signUpConfirmSchema, 2_000);
  const hash = linkTokenHash(token);
  if (!hash) throw closed();
  const result = await confirmSignUp(hash, DEFAULT_INSTRUMENTS);
  if (!result.ok) {
    // Only the holder of the mailed link gets here, so naming the existing account reveals nothing.
    if (result.reason === "account-exists") throw conflict("This address has an account by now. Sign in instead.");
    throw closed();
  }
  await startSession(result.userId);
  return NextResponse.json({ user: { id: result.userId, email: result.email, name: result.name }, programId: result.programId }, { status: 201 });
});
