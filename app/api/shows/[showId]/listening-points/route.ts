import { NextResponse } from "next/server";
import { addListeningPoint } from "@/db/queries/listening-points";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { unprocessable } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { SHOW_LIMITS, showLimitProblem } from "@/lib/limits";
import { listeningPointSchema } from "@/lib/validation/listening-points";

/** Directors and designers add a listening point (a judge on the field, a seat in the stands). */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "manage-show");
  const body = await readJson(req, listeningPointSchema, 20_000);
  const listeningPoint = await addListeningPoint(showId, body, SHOW_LIMITS.listeningPoints);
  if (!listeningPoint) throw unprocessable(showLimitProblem("listeningPoints", SHOW_LIMITS.listeningPoints + 1)!);
  return NextResponse.json({ listeningPoint }, { status: 201 });
});
