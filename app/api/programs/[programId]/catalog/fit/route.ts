import { NextResponse } from "next/server";
import { requireProgram } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { fitView, programFit } from "@/lib/readings/program-fit";
import { fitScopeSchema } from "../fit-query";

/** Preview of the calibration: every reading predicted before and after the fit, and the change per instrument. Stores nothing. */
export const GET = route<{ programId: string }>(async (req, { programId }) => {
  await requireProgram(programId, "read");
  const { showId } = parseWith(fitScopeSchema, Object.fromEntries(new URL(req.url).searchParams), "The query");
  return NextResponse.json(fitView(await programFit(programId, showId)));
});
