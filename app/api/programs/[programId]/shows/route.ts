import { NextResponse } from "next/server";
import { createShow, listShows } from "@/db/queries/shows";
import { requireProgram } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { createShowSchema } from "@/lib/validation/shows";

export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  await requireProgram(programId, "read");
  return NextResponse.json({ shows: await listShows(programId) });
});

/** Directors and designers start a new, empty show (a press box and set 1). */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  await requireProgram(programId, "manage-show");
  const body = await readJson(req, createShowSchema, 10_000);
  return NextResponse.json({ show: await createShow(programId, body) }, { status: 201 });
});
