import { NextResponse } from "next/server";
import { requireProgram } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { listShowsPlaying } from "@/db/queries/shows";
import { changedInstruments, fitView, programFit } from "@/lib/readings/program-fit";
import { fitScopeSchema } from "../fit-query";

/**
 * Preview of the calibration: every reading predicted before and after the fit, the change per
 * instrument, and the program's shows whose box mixes adopting it would change. Stores nothing.
 */
export const GET = route<{ programId: string }>(async (req, { programId }) => {
  await requireProgram(programId, "read");
  const { showId } = parseWith(fitScopeSchema, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const pf = await programFit(programId, showId);
  return NextResponse.json({ ...fitView(pf), affectedShows: await listShowsPlaying(programId, changedInstruments(pf)) });
});
