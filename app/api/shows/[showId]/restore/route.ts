import { NextResponse } from "next/server";
import { purgeDeleted, restoreDeleted } from "@/db/queries/show-lifecycle";
import { requireShow } from "@/lib/auth/access";
import { conflict, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { SHOW_UNDO_DAYS } from "@/lib/limits";

/** Directors undo the deletion of a show within SHOW_UNDO_DAYS days; a show that is not deleted is unknown here. */
export const POST = route<{ showId: string }>(async (_req, { showId }) => {
  const { show: deleted } = await requireShow(showId, "retire-show", { deleted: "either" });
  if (!deleted.deletedAt) throw conflict(`"${deleted.name}" is not deleted.`);
  await purgeDeleted(deleted.programId);
  const show = await restoreDeleted(showId);
  if (!show) throw notFound(`"${deleted.name}" was deleted more than ${SHOW_UNDO_DAYS} days ago and is gone for good.`);
  return NextResponse.json({ show });
});
