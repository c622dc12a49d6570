// Box readings from a CSV file: one reading a row, sets by number and listening points by name.
// Pure: the upload route previews the rows, then stores them all in one transaction on confirm.
import Papa from "papaparse";
import { duplicateColumnReason } from "@/lib/imports/csv-table";
import { readingSchema, type ReadingBody } from "@/lib/validation/readings";

export interface CsvContext {
  sets: { id: string; number: string }[];
  listeningPoints: { id: string; name: string }[];
  sections: string[];
}

export type CsvRow = { line: number; reading: ReadingBody; errors: [] } | { line: number; reading: null; errors: string[] };

const numberOrText = (v: string | undefined) => (v === undefined || v.trim() === "" ? undefined : Number.isNaN(Number(v)) ? v : Number(v));

/** "Trumpets: f; Mellophones: mf" → [{ section, dynamic }]. */
function parseSections(cell: string | undefined): unknown {
  if (!cell) return [];
  return cell
    .split(";")
    .map((s) => s.trim())
    .filter(Boolean)
    .map((part) => {
      const i = part.lastIndexOf(":");
      return i < 0 ? { section: part, dynamic: "" } : { section: part.slice(0, i).trim(), dynamic: part.slice(i + 1).trim().toLowerCase() };
    });
}

/** Parses and checks every row; line numbers count the header as line 1. */
export function parseReadingsCsv(text: string, ctx: CsvContext): { rows: CsvRow[]; headerErrors: string[] } {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: "greedy", transformHeader: (h) => h.trim() });
  const fields = parsed.meta.fields ?? [];
  // papaparse renames a repeated header ("note" → "note_1"): refuse it rather than read one of the two.
  const twice = Object.values(parsed.meta.renamedHeaders ?? {})[0];
  if (twice) return { rows: [], headerErrors: [duplicateColumnReason(twice)] };
  const missing = ["set", "point", "takenAt", "temperatureC", "humidityPct", "sections", "measuredDb"].filter((c) => !fields.includes(c));
  if (missing.length) return { rows: [], headerErrors: [`Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}.`] };
  const setByNumber = new Map(ctx.sets.map((s) => [s.number.toLowerCase(), s.id]));
  const pointByName = new Map(ctx.listeningPoints.map((p) => [p.name.toLowerCase(), p.id]));
  const sections = new Set(ctx.sections);
  const rows = parsed.data.map((raw, i): CsvRow => {
    const line = i + 2;
    const errors: string[] = [];
    const setId = setByNumber.get((raw.set ?? "").trim().toLowerCase());
    if (!setId) errors.push(`No set "${raw.set ?? ""}" in this show.`);
    const listeningPointId = pointByName.get((raw.point ?? "").trim().toLowerCase());
    if (!listeningPointId) errors.push(`No listening point "${raw.point ?? ""}" in this show.`);
    const candidate = {
      setId: setId ?? "00000000-0000-0000-0000-000000000000",
      listeningPointId: listeningPointId ?? "00000000-0000-0000-0000-000000000000",
      takenAt: (raw.takenAt ?? "").trim(),
      temperatureC: numberOrText(raw.temperatureC),
      relativeHumidityPct: numberOrText(raw.humidityPct),
      sections: parseSections(raw.sections),
      measuredDb: numberOrText(raw.measuredDb),
      weighting: raw.weighting?.trim() ? raw.weighting.trim().toUpperCase() : undefined,
      response: raw.response?.trim() ? raw.response.trim().toLowerCase() : undefined,
      meterHeightM: numberOrText(raw.meterHeightM) ?? null,
      note: raw.note?.trim() ?? "",
    };
    const result = readingSchema.safeParse(candidate);
    if (!result.success) for (const issue of result.error.issues) errors.push(`${issue.path.join(".") || "row"}: ${issue.message}`);
    else for (const s of result.data.sections) if (!sections.has(s.section)) errors.push(`No section "${s.section}" in this show's roster.`);
    return errors.length || !result.success ? { line, reading: null, errors } : { line, reading: result.data, errors: [] };
  });
  return { rows, headerErrors: parsed.errors.filter((e) => e.type !== "FieldMismatch").map((e) => `Line ${(e.row ?? 0) + 2}: ${e.message}`) };
}
