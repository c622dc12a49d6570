import { NextResponse } from "next/server";
import { findUserByEmail } from "@/db/queries/users";
import { verifyPassword } from "@/lib/auth/password";
import { beginSignIn } from "@/lib/auth/rate-limit";
import { startSession } from "@/lib/auth/session";
import { HttpError } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { signInSchema } from "@/lib/validation/auth";

// A real hash to verify against when the e-mail is unknown, so both answers take as long.
const DUMMY_HASH = "$argon2id$v=19$m=19456,t=2,p=1$4HPm1ZcfFF0/qUhktyQaZA$Hj1R9ZEBsYaCh6OFzI386J8VnXq2rseaP8ppxqHJ+V0";

export const POST = route(async (req) => {
  const { email, password } = await readJson(req, signInSchema, 10_000);
  const attempt = await beginSignIn(email, req); // counted as a failure before the password is checked
  const user = await findUserByEmail(email);
  const ok = await verifyPassword(user?.passwordHash ?? DUMMY_HASH, password);
  if (!user || !ok) throw new HttpError(401, "Wrong e-mail or password.");
  await startSession(user.id);
  await attempt.succeeded();
  return NextResponse.json({ user: { id: user.id, email: user.email, name: user.name } });
});
