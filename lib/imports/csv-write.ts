// Writes CSV for download. Text cells that a spreadsheet would run as a formula (=, +, -, @, tab,
// carriage return at the start) get a leading ' (OWASP "CSV Injection"); numbers stay numbers.
import Papa from "papaparse";

export type CsvCell = string | number | null;

export function writeCsv(columns: readonly string[], rows: readonly CsvCell[][]): string {
  return Papa.unparse(
    { fields: [...columns], data: rows.map((r) => r.map((c) => (c === null ? "" : c))) },
    { escapeFormulae: true, newline: "\r\n" },
  ) + "\r\n";
}
