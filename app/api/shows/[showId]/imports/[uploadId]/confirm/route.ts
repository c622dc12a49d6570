import { NextResponse } from "next/server";
import { AlreadyConfirmed, applyDrillPlan, applyRosterPlan } from "@/db/queries/uploads";
import { requireShow } from "@/lib/auth/access";
import { badRequest, conflict } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { planIsWritable, planUpload } from "../../plan";
import { loadUpload } from "../load";

/**
 * Writes the upload: planned again against the show as it is now, then everything in one
 * transaction, or nothing when any row is bad (400) or the file was already confirmed (409).
 */
export const POST = route<{ showId: string; uploadId: string }>(async (_req, { showId, uploadId }) => {
  const { show } = await requireShow(showId, "edit-drill");
  const upload = await loadUpload(showId, uploadId);
  if (upload.confirmedAt) throw conflict("This file was already imported.");
  const planned = await planUpload(show, upload.kind, upload.content);
  if (!planIsWritable(planned)) {
    const errors = planned.plan.errors;
    throw badRequest(errors.length ? `${errors.length} row${errors.length > 1 ? "s are" : " is"} not valid; nothing was written.` : "The file holds no rows.", {
      ...Object.fromEntries(errors.map((e) => [`line ${e.line}`, [e.reason]])),
    });
  }
  try {
    const summary =
      planned.kind === "roster-csv" ? await applyRosterPlan(showId, uploadId, planned.plan) : await applyDrillPlan(showId, uploadId, planned.plan);
    return NextResponse.json({ summary });
  } catch (err) {
    if (err instanceof AlreadyConfirmed) throw conflict("This file was already imported.");
    throw err;
  }
});
