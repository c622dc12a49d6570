// The roster CSV: label, instrument, section, part, strength, name (optional). Rows are matched to
// the show's performers by label: a new label is created, a known one changed where it differs;
// performers missing from the file stay as they are. Pure.
import { LABEL_PATTERN } from "@/lib/validation/performers";
import { readCsvTable, type LineError } from "./csv-table";

export const ROSTER_COLUMNS = ["label", "instrument", "section", "part", "strength", "name"] as const;
const REQUIRED = ["label", "instrument", "section"] as const;

export interface RosterEntry {
  line: number;
  label: string;
  instrument: string;
  section: string;
  part: string;
  strengthDb: number;
  name: string | null;
}

export interface ExistingPerformer {
  id: string;
  label: string;
  instrument: string;
  section: string;
  part: string;
  strengthDb: number;
  name: string | null;
}

type Field = "instrument" | "section" | "part" | "strengthDb" | "name";
export interface RosterChange {
  performerId: string;
  entry: RosterEntry;
  fields: { field: Field; from: string | number | null; to: string | number | null }[];
}

export interface RosterPlan {
  rows: number;
  creates: RosterEntry[];
  changes: RosterChange[];
  unchanged: number;
  errors: LineError[];
}

const FIELDS: Field[] = ["instrument", "section", "part", "strengthDb", "name"];

function readEntry(line: number, c: Record<string, string>, instruments: Map<string, string>): RosterEntry | string[] {
  const reasons: string[] = [];
  const label = c.label ?? "";
  if (!label) reasons.push("label is empty");
  else if (!LABEL_PATTERN.test(label)) reasons.push(`label "${label}" must be 1–16 letters or digits (e.g. T4)`);
  const instrument = instruments.get((c.instrument ?? "").toLowerCase());
  if (!c.instrument) reasons.push("instrument is empty");
  else if (!instrument) reasons.push(`instrument "${c.instrument}" is not in the program's catalog`);
  const section = c.section ?? "";
  if (!section) reasons.push("section is empty");
  else if (section.length > 60) reasons.push("section is longer than 60 characters");
  const part = c.part ?? "";
  if (part.length > 40) reasons.push("part is longer than 40 characters");
  const strengthText = c.strength ?? "";
  const strengthDb = strengthText === "" ? 0 : Number(strengthText);
  if (!Number.isFinite(strengthDb) || strengthDb < -6 || strengthDb > 6) reasons.push(`strength "${strengthText}" must be a number of dB from -6 (weak) to 6 (strong)`);
  const name = c.name ? c.name : null;
  if (name && name.length > 120) reasons.push("name is longer than 120 characters");
  return reasons.length ? reasons : { line, label, instrument: instrument!, section, part, strengthDb, name };
}

/** `instruments`: the catalog's keys ("alto-sax") and names ("Alto saxophone"); a row may use either. */
export function planRoster(text: string, ctx: { existing: ExistingPerformer[]; instruments: { key: string; name: string }[] }): RosterPlan {
  const table = readCsvTable(text);
  const plan: RosterPlan = { rows: table.records.length, creates: [], changes: [], unchanged: 0, errors: [...table.errors] };
  const missing = REQUIRED.filter((c) => table.columns.length && !table.columns.includes(c));
  if (missing.length) {
    plan.errors.push({ line: 1, reason: `Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}. The header needs ${ROSTER_COLUMNS.join(", ")}.` });
    return plan;
  }
  const instruments = new Map(ctx.instruments.flatMap((i) => [[i.key.toLowerCase(), i.key] as const, [i.name.toLowerCase(), i.key] as const]));
  const byLabel = new Map(ctx.existing.map((p) => [p.label.toLowerCase(), p]));
  const seen = new Map<string, number>();
  for (const { line, cells } of table.records) {
    const entry = readEntry(line, cells, instruments);
    if (Array.isArray(entry)) {
      plan.errors.push({ line, reason: entry.join("; ") });
      continue;
    }
    const key = entry.label.toLowerCase();
    if (seen.has(key)) {
      plan.errors.push({ line, reason: `label ${entry.label} is already on line ${seen.get(key)}` });
      continue;
    }
    seen.set(key, line);
    const current = byLabel.get(key);
    if (!current) {
      plan.creates.push(entry);
      continue;
    }
    const fields = FIELDS.filter((f) => current[f] !== entry[f]).map((f) => ({ field: f, from: current[f], to: entry[f] }));
    if (fields.length) plan.changes.push({ performerId: current.id, entry, fields });
    else plan.unchanged++;
  }
  return plan;
}
