import { NextResponse } from "next/server";
import { createUserWithProgram, findUserByEmail } from "@/db/queries/users";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics";
import { hashPassword } from "@/lib/auth/password";
import { startSession } from "@/lib/auth/session";
import { conflict } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { signUpSchema } from "@/lib/validation/auth";

/** Creates an account and a program with the new user as its director. */
export const POST = route(async (req) => {
  const input = await readJson(req, signUpSchema, 10_000);
  if (await findUserByEmail(input.email)) throw conflict("An account with this e-mail already exists. Sign in instead.");
  const passwordHash = await hashPassword(input.password);
  const { userId, programId } = await createUserWithProgram({
    email: input.email,
    name: input.name,
    passwordHash,
    programName: input.programName,
    instruments: DEFAULT_INSTRUMENTS,
  });
  await startSession(userId);
  return NextResponse.json({ user: { id: userId, email: input.email, name: input.name }, programId }, { status: 201 });
});
