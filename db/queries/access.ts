// What the access checks in lib/auth need in one round trip: the signed-in person's session, the show,
// their role in its program and, when asked, the set, so that a request pays one query for who it is
// and what it may touch rather than two or four. Prepared once: these run on every request.
import { and, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { memberships, sessions, sets, shows, users } from "../schema";
import { setColumns } from "./sets";

const showAccess = db
  .select({ show: shows, role: memberships.role, set: setColumns })
  .from(shows)
  .leftJoin(memberships, and(eq(memberships.programId, shows.programId), eq(memberships.userId, sql.placeholder("userId"))))
  .leftJoin(sets, and(eq(sets.id, sql.placeholder("setId")), eq(sets.showId, shows.id)))
  .where(eq(shows.id, sql.placeholder("showId")))
  .limit(1)
  .prepare("farfield_show_access");

/**
 * The show with the user's role in its program (null when not a member) and the set when `setId` names a
 * set of the show (else null); null when there is no such show.
 */
export async function findShowAccess(userId: string, showId: string, setId: string | null = null) {
  const rows = await showAccess.execute({ userId, showId, setId });
  return rows[0] ?? null;
}

const sessionShowAccess = db
  .select({ session: sessions, user: { id: users.id, email: users.email, name: users.name }, show: shows, role: memberships.role, set: setColumns })
  .from(sessions)
  .innerJoin(users, eq(users.id, sessions.userId))
  .leftJoin(shows, eq(shows.id, sql.placeholder("showId")))
  .leftJoin(memberships, and(eq(memberships.programId, shows.programId), eq(memberships.userId, users.id)))
  .leftJoin(sets, and(eq(sets.id, sql.placeholder("setId")), eq(sets.showId, shows.id)))
  .where(eq(sessions.id, sql.placeholder("sessionId")))
  .limit(1)
  .prepare("farfield_session_show_access");

/**
 * `findShowAccess` and the session's own row with its user, read together: null when there is no such
 * session; `access` null when there is no such show. Whether the session is still good is for lib/auth.
 */
export async function findSessionShowAccess(sessionId: string, showId: string, setId: string | null = null) {
  const [row] = await sessionShowAccess.execute({ sessionId, showId, setId });
  if (!row) return null;
  const { session, user, show, role, set } = row;
  return { session, user, access: show ? { show, role, set } : null };
}
