import { NextResponse } from "next/server";
import { z } from "zod";
import { requireShow } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { performerSheets, setSheets, sheetsFor } from "@/lib/sheets/coordinates";
import { loadSheetSource } from "./load";

const query = z.object({
  by: z.enum(["performers", "sets"], { message: "by must be performers or sets." }).optional(),
  label: z.string().min(1, "label must name a performer.").max(64, "label is at most 64 characters.").optional(),
  first: z.coerce.number({ message: "first must be a whole number." }).int("first must be a whole number.").min(1, "first must be at least 1.").max(10_000, "first must be at most 10000.").optional(),
});

/**
 * Coordinate sheets as data: per performer every set in the trade's words; per set every dot.
 * `by` answers only what that view shows (by=performers: the sets as bare dots for the pictures;
 * by=sets: no performers), `first` only its first sheets and `label` one performer's, so a page
 * opens without the whole show.
 */
export const GET = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { by, first, label } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  const { file, programName } = await loadSheetSource(show);
  const head = { programName, show: { id: show.id, name: file.show.name, fieldRules: file.show.fieldRules } };
  if (!by && first === undefined && label === undefined) return NextResponse.json({ ...head, performers: performerSheets(file), sets: setSheets(file) });
  return NextResponse.json({ ...head, ...sheetsFor(file, by, { first, label }) });
});
