// Signing up the way a person does: the sign-up request, the link from the message, the confirmation.
import type { ApiAnswer, Client } from "./api";
import { linkIn, tokenOf, waitForMail } from "./mail";

export interface SignUpBody {
  name: string;
  email: string;
  password: string;
  programName: string;
}

/** The confirmation's answer (201 { user, programId }, `client` signed in), or the sign-up's own when it was not 202. */
export async function signUp(client: Client, body: SignUpBody): Promise<ApiAnswer> {
  const since = new Date();
  const res = await client.post("/api/auth/sign-up", body);
  if (res.status !== 202) return res;
  const message = await waitForMail(body.email.trim().toLowerCase(), { since, match: (m) => m.subject === "Confirm your new Farfield account" });
  return client.post("/api/auth/sign-up/confirm", { token: tokenOf(linkIn(message, "/sign-up/")) });
}
