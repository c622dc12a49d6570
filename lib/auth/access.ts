// "May this member do this to this program": every route handler, page and server action asks here.
import "server-only";
import { findMembership } from "@/db/queries/memberships";
import { findSessionShowAccess, findShowAccess } from "@/db/queries/access";
import { forbidden, notFound, unauthorized } from "@/lib/http/errors";
import { can, type Action, type Role } from "./permissions";
import { hashToken } from "./token";
import { getCurrentSession, isSettled, sessionToken } from "./session";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** True for an id the database could hold (anything else names nothing). */
export const isUuid = (id: string) => UUID.test(id);

export async function requireUser() {
  const { user } = await getCurrentSession();
  if (!user) throw unauthorized();
  return user;
}

/** The member's role, or 404 when the program is unknown or not theirs, 403 when the role may not act. */
export async function requireProgram(programId: string, action: Action) {
  const user = await requireUser();
  if (!UUID.test(programId)) throw notFound("No such program.");
  const role: Role | null = await findMembership(user.id, programId);
  if (!role) throw notFound("No such program.");
  if (!can(role, action)) throw forbidden();
  return { user, role, programId };
}

/** Which shows a check accepts: live ones (the default), deleted ones (restoring), or either. */
type Deleted = boolean | "either";

/** A show of another program, or a deleted one, is as unknown as a show that does not exist. */
function showRole<T extends { role: Role | null; show: { deletedAt: Date | null } }>(row: T | null, action: Action, deleted: Deleted = false): T & { role: Role } {
  if (!row?.role) throw notFound("No such show.");
  if (!can(row.role, action)) throw forbidden();
  if (deleted !== "either" && (row.show.deletedAt !== null) !== deleted) throw notFound("No such show.");
  return row as T & { role: Role };
}

/**
 * The signed-in user and the show's access row. A settled session is read with the show in one round
 * trip (most requests); no cookie, an unknown or expired session or one due to slide goes through Lucia,
 * which answers 401, clears or renews it, and the show is read after.
 */
async function userWithShowAccess(showId: string, setId: string | null) {
  const token = await sessionToken();
  if (token && UUID.test(showId)) {
    const row = await findSessionShowAccess(hashToken(token), showId, setId);
    if (row && isSettled(row.session.expiresAt)) return { user: row.user, access: row.access };
  }
  const user = await requireUser();
  if (!UUID.test(showId)) throw notFound("No such show.");
  return { user, access: await findShowAccess(user.id, showId, setId) };
}

export async function requireShow(showId: string, action: Action, { deleted = false }: { deleted?: Deleted } = {}) {
  const { user, access } = await userWithShowAccess(showId, null);
  const { show, role } = showRole(access, action, deleted);
  return { user, role, show };
}

export async function requireSet(showId: string, setId: string, action: Action) {
  // An id that is not a UUID names no set; the show and role are still checked first, as for any set.
  const { user, access } = await userWithShowAccess(showId, UUID.test(setId) ? setId : null);
  const { show, role, set } = showRole(access, action);
  if (!set) throw notFound("No such set.");
  return { user, role, show, set };
}
