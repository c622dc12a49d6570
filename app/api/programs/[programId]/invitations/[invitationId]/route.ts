import { NextResponse } from "next/server";
import { revokeInvitation } from "@/db/queries/invitations";
import { requireProgram } from "@/lib/auth/access";
import { notFound } from "@/lib/http/errors";
import { idSchema, route } from "@/lib/http/handler";

/** Revokes an open invitation: its link stops working at once. */
export const DELETE = route<{ programId: string; invitationId: string }>(async (_req, { programId, invitationId }) => {
  await requireProgram(programId, "manage-members");
  if (!idSchema.safeParse(invitationId).success || !(await revokeInvitation(programId, invitationId))) {
    throw notFound("No open invitation with this id.");
  }
  return new NextResponse(null, { status: 204 });
});
