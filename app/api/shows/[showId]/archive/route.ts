import { NextResponse } from "next/server";
import { setArchived } from "@/db/queries/show-lifecycle";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { archiveShowSchema } from "@/lib/validation/shows";

/** Directors set a show aside (`{ archived: true }`) or bring it back (`false`); an archived show stays readable. */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "retire-show");
  const body = await readJson(req, archiveShowSchema, 1_000);
  return NextResponse.json({ show: await setArchived(showId, body.archived) });
});
