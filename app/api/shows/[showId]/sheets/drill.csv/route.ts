import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { writeCsv } from "@/lib/imports/csv-write";
import { setSheets } from "@/lib/sheets/coordinates";
import { fileSlug, loadSheetSource } from "../load";

/** The drill as a CSV the drill import reads back: positions in the trade's words and in metres. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { file } = await loadSheetSource(show);
  const rows = setSheets(file).flatMap((s) =>
    s.dots.map((d) => [s.number, s.counts, d.label, `${d.sideToSide}; ${d.frontToBack}`, d.facing, Math.round(d.x * 1e4) / 1e4, Math.round(d.y * 1e4) / 1e4]),
  );
  const csv = writeCsv(["set", "counts", "label", "position", "facing", "x_m", "y_m"], rows);
  return new Response(csv, {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${fileSlug(file.show.name)}-drill.csv"` },
  });
});
