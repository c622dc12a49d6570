import { NextResponse } from "next/server";
import { findProgram, listMembers } from "@/db/queries/programs";
import { requireProgram } from "@/lib/auth/access";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

/** The program with its members and the caller's role. */
export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  const { role } = await requireProgram(programId, "read");
  const program = await findProgram(programId);
  if (!program) throw notFound("No such program.");
  return NextResponse.json({ program, role, members: await listMembers(programId) });
});
