// Lucia v3 over the Drizzle adapter: sessions are rows of `sessions`, with sliding expiry.
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { eq, sql } from "drizzle-orm";
import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from "lucia";
import { db } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { cookieSecure } from "@/lib/env";

const sessionAndUser = db
  .select({ user: users, session: sessions })
  .from(sessions)
  .innerJoin(users, eq(sessions.userId, users.id))
  .where(eq(sessions.id, sql.placeholder("id")))
  .prepare("farfield_session_and_user");

/** The package's adapter, with the lookup that every request makes prepared once instead of built each time. */
class SessionAdapter extends DrizzlePostgreSQLAdapter {
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const [row] = await sessionAndUser.execute({ id: sessionId });
    if (!row) return [null, null];
    const { id, userId, expiresAt, ...sessionAttributes } = row.session;
    const { id: uid, ...userAttributes } = row.user;
    return [
      { id, userId, expiresAt, attributes: sessionAttributes },
      { id: uid, attributes: userAttributes },
    ];
  }
}

export const SESSION_COOKIE = "farfield_session";
/** How long a session lives unused; Lucia renews it once it is past half of that. */
export const SESSION_LIFETIME = new TimeSpan(30, "d");

export const lucia = new Lucia(new SessionAdapter(db, sessions, users), {
  sessionExpiresIn: SESSION_LIFETIME,
  sessionCookie: {
    name: SESSION_COOKIE,
    // The cookie lives as long as the session (30 days, renewed as it slides), not Lucia's 400 days.
    expires: true,
    attributes: { secure: cookieSecure, sameSite: "lax" },
  },
  // Only these columns ever leave the server.
  getUserAttributes: (row) => ({ email: row.email, name: row.name }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
