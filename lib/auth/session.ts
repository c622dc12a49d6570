// "Who is this": the one session check used by every page, server action and route handler.
import "server-only";
import { cookies } from "next/headers";
import { cache } from "react";
import type { Session, User } from "lucia";
import { lucia, SESSION_COOKIE, SESSION_LIFETIME } from "./lucia";
import { hashToken, newToken } from "./token";

export type CurrentSession = { user: User; session: Session } | { user: null; session: null };

async function setCookie(token: string) {
  const cookie = lucia.createSessionCookie(token);
  try {
    (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
  } catch {
    // Server Components cannot set cookies; the next route handler or action will.
  }
}

/** The session cookie's token, if any. */
export async function sessionToken(): Promise<string | null> {
  return (await cookies()).get(SESSION_COOKIE)?.value ?? null;
}

/**
 * Whether a stored session is one Lucia would accept as it stands, with nothing to write: not expired and
 * not yet in the second half of its life, where Lucia slides it forward. Only such a session may be taken
 * from a read that joined it to other rows; any other goes through Lucia.
 */
export function isSettled(expiresAt: Date, now = Date.now()): boolean {
  return expiresAt.getTime() - now > SESSION_LIFETIME.milliseconds() / 2;
}

export const getCurrentSession = cache(async (): Promise<CurrentSession> => {
  const token = await sessionToken();
  if (!token) return { user: null, session: null };
  const { user, session } = await lucia.validateSession(hashToken(token));
  if (session?.fresh) await setCookie(token); // sliding expiry
  if (!session) {
    try {
      const blank = lucia.createBlankSessionCookie();
      (await cookies()).set(blank.name, blank.value, blank.attributes);
    } catch {}
    return { user: null, session: null };
  }
  return { user: user!, session };
});

/** Starts a new session (rotating any old one away) and sets its cookie. */
export async function startSession(userId: string): Promise<void> {
  const old = (await cookies()).get(SESSION_COOKIE)?.value;
  if (old) await lucia.invalidateSession(hashToken(old));
  const token = newToken();
  await lucia.createSession(userId, {}, { sessionId: hashToken(token) });
  await setCookie(token);
}

export async function endSession(): Promise<void> {
  const token = (await cookies()).get(SESSION_COOKIE)?.value;
  if (token) await lucia.invalidateSession(hashToken(token));
  const blank = lucia.createBlankSessionCookie();
  (await cookies()).set(blank.name, blank.value, blank.attributes);
}

/** Ends every session of a user (password change). */
export async function endAllSessions(userId: string): Promise<void> {
  await lucia.invalidateUserSessions(userId);
}
