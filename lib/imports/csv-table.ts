// Reads a CSV file into records keyed by normalised column names, each with the line it starts on
// (the header is line 1; blank lines count, as an editor shows them). Pure, with papaparse.
import Papa from "papaparse";

export interface CsvRecord {
  line: number;
  cells: Record<string, string>;
}

export interface LineError {
  line: number;
  reason: string;
}

export interface CsvTable {
  columns: string[];
  records: CsvRecord[];
  errors: LineError[];
}

/** "Yard line" → "yard_line", "X (m)" → "x_m". */
export const normaliseColumn = (name: string) =>
  name
    .trim()
    .toLowerCase()
    .replace(/[()]/g, " ")
    .trim()
    .replace(/[\s\-]+/g, "_");

/** What the importers say about a header naming one column twice (after normalising: "Yard line" = "yard_line"). */
export const duplicateColumnReason = (column: string) => `The header names the column "${column}" twice; keep one of them and upload the file again.`;

/** Our CSV exports put a ' before cells that a spreadsheet would run as a formula; reading drops it again. */
const unescapeFormula = (cell: string) => (/^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell);

function lineStarts(text: string): number[] {
  const starts = [0];
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) starts.push(i + 1);
  return starts;
}

function lineAt(starts: number[], offset: number): number {
  let lo = 0;
  let hi = starts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (starts[mid]! <= offset) lo = mid;
    else hi = mid - 1;
  }
  return lo + 1;
}

export function readCsvTable(input: string): CsvTable {
  // One newline convention, so a file mixing CRLF and LF (edited on two systems) still splits right.
  const text = input.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
  const starts = lineStarts(text);
  const rows: { offset: number; data: string[] }[] = [];
  const errors: LineError[] = [];
  let previous = 0;
  Papa.parse<string[]>(text, {
    header: false,
    step(result) {
      let offset = previous;
      while (offset < text.length && (text[offset] === "\n" || text[offset] === "\r")) offset++;
      previous = result.meta.cursor;
      // A one-column file has no delimiter to detect; papaparse then uses "," and says so.
      for (const e of result.errors) if (e.code !== "UndetectableDelimiter") errors.push({ line: lineAt(starts, offset), reason: `The CSV cannot be read here: ${e.message}.` });
      rows.push({ offset, data: result.data });
    },
  });
  const nonEmpty = rows.filter((r) => r.data.some((c) => c.trim() !== ""));
  const [head, ...body] = nonEmpty;
  if (!head) return { columns: [], records: [], errors: [{ line: 1, reason: "The file is empty: it needs a header row and at least one row." }] };
  const columns = head.data.map(normaliseColumn);
  // Two columns of one name would let the later silently overwrite the earlier in every row.
  const twice = columns.find((c, i) => c && columns.indexOf(c) !== i);
  if (twice) return { columns: [], records: [], errors: [{ line: lineAt(starts, head.offset), reason: duplicateColumnReason(twice) }] };
  const records = body.map((r) => {
    const cells: Record<string, string> = {};
    columns.forEach((c, i) => {
      if (c) cells[c] = unescapeFormula((r.data[i] ?? "").trim());
    });
    return { line: lineAt(starts, r.offset), cells };
  });
  return { columns, records, errors };
}
