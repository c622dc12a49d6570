// The drill CSV: one row per performer per set — set, counts, label, a position and a facing.
// The position is in the trade's words, as separate columns (side, yard_line, steps_side, in_out,
// reference, steps_fb, front_back) or as one `position` phrase, or in metres (x_m, y_m).
// Sets are matched by number (new numbers are added after the last set), performers by label. Pure.
import { positionFromWords } from "@/lib/field/words";
import type { FieldRules } from "@/lib/field/geometry";
import { FIELD_MARGIN_M, HALF_LENGTH_M, WIDTH_M } from "@/lib/validation/positions";
import { readCsvTable, type LineError } from "./csv-table";
import { parseFacing } from "./facing";

export const DRILL_WORD_COLUMNS = ["set", "counts", "label", "side", "yard_line", "steps_side", "in_out", "reference", "steps_fb", "front_back", "facing"] as const;
export const DRILL_METRE_COLUMNS = ["set", "counts", "label", "x_m", "y_m", "facing"] as const;

export interface DrillContext {
  rules: FieldRules;
  performers: { id: string; label: string }[];
  sets: { id: string; number: string; counts: number; positions: Map<string, { x: number; y: number; facingDeg: number }> }[];
}

export interface DrillDot {
  line: number;
  set: string;
  label: string;
  performerId: string;
  x: number;
  y: number;
  facingDeg: number;
}

export interface DrillSetPlan {
  number: string;
  counts: number;
  setId: string | null;
  /** The set's counts now, when the file changes them. */
  countsBefore: number | null;
  creates: number;
  changes: number;
  unchanged: number;
}

export interface DrillPlan {
  rows: number;
  sets: DrillSetPlan[];
  dots: DrillDot[];
  errors: LineError[];
}

const SET_NUMBER = /^\d{1,3}[A-Za-z]?$/;
const SAME_M = 0.001;
const SAME_DEG = 0.01;

const numberCell = (s: string) => (s.trim() === "" ? 0 : Number(s.trim()));

/** The separate word columns as one phrase for positionFromWords, or a reason. */
function phraseOf(c: Record<string, string>): string {
  const reasons: string[] = [];
  const side = c.side ?? "";
  if (side && !/^(side\s*)?[12]$/i.test(side)) reasons.push(`side "${side}" must be 1 or 2`);
  const yard = (c.yard_line ?? "").toLowerCase();
  if (!yard) reasons.push("yard_line is empty");
  const stepsSide = numberCell(c.steps_side ?? "");
  const inOut = (c.in_out ?? "").toLowerCase();
  if (!Number.isFinite(stepsSide) || stepsSide < 0) reasons.push(`steps_side "${c.steps_side}" must be a number of steps, 0 or more`);
  else if (stepsSide > 0 && !/^(inside|outside|in|out)$/.test(inOut)) reasons.push(`in_out "${c.in_out ?? ""}" must be inside or outside`);
  const reference = (c.reference ?? "").toLowerCase().replace(/\s+/g, " ");
  if (!/^(front sideline|front hash|back hash|back sideline)$/.test(reference)) {
    reasons.push(`reference "${c.reference ?? ""}" must be front sideline, front hash, back hash or back sideline`);
  }
  const stepsFb = numberCell(c.steps_fb ?? "");
  const frontBack = (c.front_back ?? "").toLowerCase().replace(/\s+/g, " ");
  if (!Number.isFinite(stepsFb) || stepsFb < 0) reasons.push(`steps_fb "${c.steps_fb}" must be a number of steps, 0 or more`);
  else if (stepsFb > 0 && !/^(in front|in front of|behind)$/.test(frontBack)) reasons.push(`front_back "${c.front_back ?? ""}" must be in front or behind`);
  if (reasons.length) throw new Error(reasons.join("; "));
  const yardWords = /^(0|goal|goal line|g)$/.test(yard) ? "goal line" : `${yard} yard line`;
  const across = stepsSide > 0 ? `${stepsSide} steps ${inOut.startsWith("in") ? "inside" : "outside"} the ${yardWords}` : `on the ${yardWords}`;
  const deep = stepsFb > 0 ? `${stepsFb} steps ${frontBack.startsWith("in") ? "in front of" : "behind"} the ${reference}` : `on the ${reference}`;
  return `${side ? `side ${side.replace(/\D/g, "")}: ` : ""}${across}; ${deep}`;
}

function positionOf(c: Record<string, string>, rules: FieldRules): { x: number; y: number } | string {
  let x: number;
  let y: number;
  if ((c.x_m ?? "") !== "" || (c.y_m ?? "") !== "") {
    x = Number(c.x_m);
    y = Number(c.y_m);
    if (!Number.isFinite(x) || !Number.isFinite(y) || c.x_m === "" || c.y_m === "") return "x_m and y_m must both be numbers of metres";
  } else {
    let phrase: string;
    try {
      phrase = c.position ? c.position : phraseOf(c);
    } catch (err) {
      return (err as Error).message;
    }
    const read = positionFromWords(phrase, rules);
    if (!read.ok) return read.error;
    ({ x, y } = read);
  }
  // NaN passes every comparison below as false: refuse it (and ±Infinity) first.
  if (!Number.isFinite(x) || !Number.isFinite(y)) return "the position is not a finite number of metres";
  if (Math.abs(x) > HALF_LENGTH_M + FIELD_MARGIN_M) return "the position is more than 10 m beyond an end line";
  if (y < -FIELD_MARGIN_M || y > WIDTH_M + FIELD_MARGIN_M) return "the position is more than 10 m beyond a sideline";
  return { x, y };
}

export function planDrill(text: string, ctx: DrillContext): DrillPlan {
  const table = readCsvTable(text);
  const plan: DrillPlan = { rows: table.records.length, sets: [], dots: [], errors: [...table.errors] };
  if (!table.columns.length) return plan;
  const missing = ["set", "counts", "label"].filter((c) => !table.columns.includes(c));
  const hasPosition = ["position", "x_m", "yard_line"].some((c) => table.columns.includes(c));
  if (missing.length || !hasPosition) {
    const need = missing.length ? `Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}. ` : "";
    plan.errors.push({ line: 1, reason: `${need}${hasPosition ? "" : "A position needs yard_line and reference columns, a position column, or x_m and y_m. "}See the drill CSV format in the README.`.trim() });
    return plan;
  }
  const performers = new Map(ctx.performers.map((p) => [p.label.toLowerCase(), p]));
  const existingSets = new Map(ctx.sets.map((s) => [s.number.toLowerCase(), s]));
  const sets = new Map<string, DrillSetPlan & { line: number; positions?: DrillContext["sets"][number]["positions"] }>();
  const seen = new Map<string, number>();

  for (const { line, cells } of table.records) {
    const reasons: string[] = [];
    const number = cells.set ?? "";
    if (!SET_NUMBER.test(number)) reasons.push(`set "${number}" must be a set number such as 12 or 12A`);
    const counts = Number(cells.counts ?? "");
    if (!Number.isInteger(counts) || counts < 0 || counts > 999 || (cells.counts ?? "") === "") reasons.push(`counts "${cells.counts ?? ""}" must be a whole number from 0 to 999`);
    const performer = performers.get((cells.label ?? "").toLowerCase());
    if (!performer) reasons.push(cells.label ? `no performer labelled ${cells.label} on the roster (import the roster first)` : "label is empty");
    const position = positionOf(cells, ctx.rules);
    if (typeof position === "string") reasons.push(position);
    const facing = parseFacing(cells.facing ?? "");
    if (typeof facing === "string") reasons.push(facing);
    const key = `${number.toLowerCase()}|${(cells.label ?? "").toLowerCase()}`;
    if (!reasons.length && seen.has(key)) reasons.push(`${cells.label} already has a position in set ${number} on line ${seen.get(key)}`);
    let set = sets.get(number.toLowerCase());
    if (!reasons.length && set && set.counts !== counts) reasons.push(`set ${number} has ${set.counts} counts on line ${set.line}, not ${counts}`);
    if (reasons.length) {
      plan.errors.push({ line, reason: reasons.join("; ") });
      continue;
    }
    seen.set(key, line);
    if (!set) {
      const existing = existingSets.get(number.toLowerCase());
      set = {
        number: existing?.number ?? number,
        counts,
        setId: existing?.id ?? null,
        countsBefore: existing && existing.counts !== counts ? existing.counts : null,
        creates: 0,
        changes: 0,
        unchanged: 0,
        line,
        positions: existing?.positions,
      };
      sets.set(number.toLowerCase(), set);
    }
    const { x, y } = position as { x: number; y: number };
    const before = set.positions?.get(performer!.id);
    if (!before) set.creates++;
    else if (Math.abs(before.x - x) < SAME_M && Math.abs(before.y - y) < SAME_M && Math.abs(before.facingDeg - (facing as number)) < SAME_DEG) set.unchanged++;
    else set.changes++;
    plan.dots.push({ line, set: set.number, label: performer!.label, performerId: performer!.id, x, y, facingDeg: facing as number });
  }
  plan.sets = [...sets.values()].map(({ line: _line, positions: _p, ...s }) => s);
  return plan;
}
