import { NextResponse } from "next/server";
import { importShowFile, loadShowFile } from "@/db/queries/show-export";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { duplicateShowSchema } from "@/lib/validation/shows";

/** Directors copy a whole show (roster, sets, music, settings) as a new show of the same program. */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "retire-show");
  const body = await readJson(req, duplicateShowSchema, 2_000);
  const file = await loadShowFile(showId);
  if (!file) throw notFound("No such show.");
  const name = body.name ?? `Copy of ${show.name}`.slice(0, 160);
  const id = await importShowFile(show.programId, file, null, name);
  return NextResponse.json({ show: { id, name } }, { status: 201 });
});
