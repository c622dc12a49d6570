import { NextResponse } from "next/server";
import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { performerSheets, setSheets } from "@/lib/sheets/coordinates";
import { loadSheetSource } from "./load";

/** Coordinate sheets as data: per performer every set in the trade's words; per set every dot. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { file, programName } = await loadSheetSource(show);
  return NextResponse.json({
    programName,
    show: { id: show.id, name: file.show.name, fieldRules: file.show.fieldRules },
    performers: performerSheets(file),
    sets: setSheets(file),
  });
});
