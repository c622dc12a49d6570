// "May this member do this to this program": every route handler, page and server action asks here.
import "server-only";
import { findMembership } from "@/db/queries/memberships";
import { findSetInShow } from "@/db/queries/sets";
import { findShow } from "@/db/queries/shows";
import { forbidden, notFound, unauthorized } from "@/lib/http/errors";
import { can, type Action, type Role } from "./permissions";
import { getCurrentSession } from "./session";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

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

export async function requireShow(showId: string, action: Action) {
  const user = await requireUser();
  if (!UUID.test(showId)) throw notFound("No such show.");
  const show = await findShow(showId);
  if (!show) throw notFound("No such show.");
  const role = await findMembership(user.id, show.programId);
  if (!role) throw notFound("No such show.");
  if (!can(role, action)) throw forbidden();
  return { user, role, show };
}

export async function requireSet(showId: string, setId: string, action: Action) {
  const access = await requireShow(showId, action);
  if (!UUID.test(setId)) throw notFound("No such set.");
  const set = await findSetInShow(showId, setId);
  if (!set) throw notFound("No such set.");
  return { ...access, set };
}
