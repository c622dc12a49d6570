import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { writeCsv } from "@/lib/imports/csv-write";
import { ROSTER_COLUMNS } from "@/lib/imports/roster";
import { byLabel } from "@/lib/sheets/coordinates";
import { fileSlug, loadSheetSource } from "../load";

/** The roster as a CSV the roster import reads back. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { file } = await loadSheetSource(show);
  const rows = [...file.performers].sort(byLabel).map((p) => [p.label, p.instrument, p.section, p.part, p.strengthDb, p.name]);
  return new Response(writeCsv(ROSTER_COLUMNS, rows), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${fileSlug(file.show.name)}-roster.csv"` },
  });
});
