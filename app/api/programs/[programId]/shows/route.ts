import { NextResponse } from "next/server";
import { listShows } from "@/db/queries/shows";
import { requireProgram } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  await requireProgram(programId, "read");
  return NextResponse.json({ shows: await listShows(programId) });
});
