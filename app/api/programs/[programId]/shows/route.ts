import { NextResponse } from "next/server";
import { listDeleted, purgeDeleted } from "@/db/queries/show-lifecycle";
import { createShow, listShows } from "@/db/queries/shows";
import { requireProgram } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { createShowSchema } from "@/lib/validation/shows";

/** The program's shows (archived ones marked), and those deleted that can still be restored. */
export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  await requireProgram(programId, "read");
  await purgeDeleted(programId);
  const [shows, deletedShows] = await Promise.all([listShows(programId), listDeleted(programId)]);
  return NextResponse.json({ shows, deletedShows });
});

/** Directors and designers start a new, empty show (a press box and set 1). */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  await requireProgram(programId, "manage-show");
  const body = await readJson(req, createShowSchema, 10_000);
  return NextResponse.json({ show: await createShow(programId, body) }, { status: 201 });
});
