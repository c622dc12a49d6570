import { NextResponse } from "next/server";
import { changeMembership, type MemberChange } from "@/db/queries/members";
import { requireProgram } from "@/lib/auth/access";
import { conflict, forbidden, notFound } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { roleChangeSchema } from "@/lib/validation/team";

type Params = { programId: string; userId: string };

function answer(result: MemberChange, body: Record<string, unknown>) {
  if (result.ok) return NextResponse.json(body);
  if (result.reason === "not-member") throw notFound("No such member.");
  if (result.reason === "actor-not-director") throw forbidden();
  throw conflict("A program needs at least one director: make someone else a director first.");
}

/** A director changes a member's role; the last director cannot be demoted (409). */
export const PATCH = route<Params>(async (req, { programId, userId }) => {
  const { user } = await requireProgram(programId, "manage-members");
  const { role } = await readJson(req, roleChangeSchema, 2_000);
  return answer(await changeMembership(programId, userId, role, user.id), { userId, role });
});

/** A director removes a member; the last director cannot be removed (409). */
export const DELETE = route<Params>(async (_req, { programId, userId }) => {
  const { user } = await requireProgram(programId, "manage-members");
  const result = await changeMembership(programId, userId, null, user.id);
  if (result.ok) return new NextResponse(null, { status: 204 });
  return answer(result, {});
});
