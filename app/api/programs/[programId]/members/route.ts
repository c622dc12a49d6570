import { NextResponse } from "next/server";
import { listProgramMembers } from "@/db/queries/members";
import { requireProgram } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

/** The program's members with their roles (every member may read it). */
export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  const { role } = await requireProgram(programId, "read");
  return NextResponse.json({ role, members: await listProgramMembers(programId) });
});
