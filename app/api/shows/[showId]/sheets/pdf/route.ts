import { requireShow } from "@/lib/auth/access";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { performerSheets, setSheets } from "@/lib/sheets/coordinates";
import { renderSheetsPdf } from "@/lib/sheets/pdf";
import { fileSlug, loadSheetSource } from "../load";

/**
 * The sheets as a PDF. `?by=performers` or `?by=sets` (default both); `&label=T4` one performer,
 * `&set=12A` one set.
 */
export const GET = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "read");
  const { file, programName } = await loadSheetSource(show);
  const q = new URL(req.url).searchParams;
  const by = q.get("by");
  const label = q.get("label");
  const setNumber = q.get("set");
  let performers = by === "sets" ? [] : performerSheets(file);
  const allSets = setSheets(file);
  let sets = by === "performers" ? [] : allSets;
  if (label) performers = performers.filter((p) => p.label.toLowerCase() === label.toLowerCase());
  if (setNumber) sets = sets.filter((s) => s.number.toLowerCase() === setNumber.toLowerCase());
  if ((label && !performers.length && !setNumber) || (setNumber && !sets.length && !label)) throw notFound("No such performer or set in this show.");
  const pdf = await renderSheetsPdf({ programName, showName: file.show.name, rules: file.show.fieldRules, performers, sets, allSets });
  const name = `${fileSlug(file.show.name)}-coordinates${label ? `-${fileSlug(label)}` : ""}${setNumber ? `-set-${fileSlug(setNumber)}` : ""}.pdf`;
  return new Response(new Uint8Array(pdf), { headers: { "content-type": "application/pdf", "content-disposition": `inline; filename="${name}"` } });
});
