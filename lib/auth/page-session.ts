// The page gate: a signed-in user, or a redirect to the sign-in page that comes back here.
import "server-only";
import { redirect } from "next/navigation";
import { getCurrentSession } from "./session";
import { isDatabaseDown } from "@/lib/http/errors";
import { signInPath } from "@/components/next-path";
import { databaseDownError } from "@/components/page-errors";

/** The session, with a database outage turned into an error the error page can name. */
export async function currentUserOrNull() {
  try {
    return (await getCurrentSession()).user;
  } catch (err) {
    if (isDatabaseDown(err)) throw databaseDownError();
    throw err;
  }
}

export async function requireSignedIn(path: string) {
  const user = await currentUserOrNull();
  if (!user) redirect(signInPath(path));
  return user;
}
