// What the access checks in lib/auth need in one round trip: the show, the member's role in its program
// and, when asked, the set, so that every request pays one query for its checks rather than three.
// Prepared once: these run on every request.
import { and, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { memberships, sets, shows } from "../schema";
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

