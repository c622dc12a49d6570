// Positions in the trade's words, and back: "side 1: 2 steps outside the 35 yard line; 4 steps in
// front of the front hash". Side to side from the nearest yard line (inside = toward the 50),
// front to back from the nearest of the front sideline, front hash, back hash and back sideline.
// Pure; the editor, coordinate sheets and CSV import share it.
import { FIELD_WIDTH_M, hashesY, STEP_M, STEPS_PER_FIVE_YARDS, type FieldRules, type Side } from "./geometry";

export interface DescribeOptions {
  /** Offsets are rounded to this many steps (default a quarter step, about 14 cm). */
  precisionSteps?: number;
}

export interface Description {
  side: Side | null;
  /** "on the 50 yard line", "2 steps outside the 35 yard line". */
  sideToSide: string;
  /** "4 steps in front of the front hash". */
  frontToBack: string;
  /** Both, as one line: "side 1: 2 steps outside the 35 yard line; 4 steps in front of the front hash". */
  text: string;
}

type FrontBackLine = "front sideline" | "front hash" | "back hash" | "back sideline";

const round = (v: number, step: number) => Math.round(v / step) * step;

/** "1 step", "2 steps", "2.25 steps" (at most two decimals). */
export function formatSteps(n: number): string {
  const s = String(Math.round(n * 100) / 100);
  return `${s} ${s === "1" ? "step" : "steps"}`;
}

function lineName(yard: number): string {
  return yard === 0 ? "goal line" : `${yard} yard line`;
}

function frontBackLines(rules: FieldRules): { name: FrontBackLine; y: number }[] {
  const h = hashesY(rules);
  return [
    { name: "front sideline", y: 0 },
    { name: "front hash", y: h.front },
    { name: "back hash", y: h.back },
    { name: "back sideline", y: FIELD_WIDTH_M },
  ];
}

/** A point of the field in the trade's words. */
export function describePosition(x: number, y: number, rules: FieldRules, options: DescribeOptions = {}): Description {
  if (!Number.isFinite(x) || !Number.isFinite(y)) throw new RangeError("a position must be finite numbers");
  const prec = options.precisionSteps ?? 0.25;
  if (!(prec > 0)) throw new RangeError("precisionSteps must be above 0");

  // Side to side: steps from the 50, then the nearest yard line (every 8 steps), goal line at most.
  const fromFifty = round(Math.abs(x) / STEP_M, prec);
  const k = Math.min(10, Math.round(fromFifty / STEPS_PER_FIVE_YARDS));
  const offset = fromFifty - k * STEPS_PER_FIVE_YARDS;
  const yard = 50 - 5 * k;
  const side: Side | null = fromFifty === 0 ? null : x < 0 ? 1 : 2;
  const sideToSide =
    Math.abs(offset) < 1e-9
      ? `on the ${lineName(yard)}`
      : `${formatSteps(Math.abs(offset))} ${offset > 0 ? "outside" : "inside"} the ${lineName(yard)}`;

  // Front to back: the nearest reference line, offsets in steps.
  let best = frontBackLines(rules)[0];
  for (const line of frontBackLines(rules)) if (Math.abs(y - line.y) < Math.abs(y - best.y)) best = line;
  const dy = round((y - best.y) / STEP_M, prec);
  const frontToBack =
    Math.abs(dy) < 1e-9 ? `on the ${best.name}` : `${formatSteps(Math.abs(dy))} ${dy > 0 ? "behind" : "in front of"} the ${best.name}`;

  const text = `${side ? `side ${side}: ` : ""}${sideToSide}; ${frontToBack}`;
  return { side, sideToSide, frontToBack, text };
}

export type WordsResult = { ok: true; x: number; y: number } | { ok: false; error: string };

const NUMBER = String.raw`(\d+(?:\.\d+)?(?:\s+\d+\/\d+)?|\d+\/\d+)`;

/** "2", "2.5", "2 1/2", "1/2" → number of steps; a reason for what is no number ("0/0", "1/0"). */
function parseSteps(s: string): number | string {
  const n = s
    .trim()
    .split(/\s+/)
    .reduce((sum, part) => {
      const [a, b] = part.split("/");
      return sum + (b === undefined ? Number(a) : Number(a) / Number(b));
    }, 0);
  return Number.isFinite(n) ? n : `"${s.trim()}" is not a number of steps`;
}

const SIDE_PREFIX = /^\s*(?:side|s)\s*([12])\s*[:,\-–]?\s*/;
const YARD_REF = String.raw`(?:the\s+)?(?:(goal(?:\s*line)?|g)|(\d+(?:\.\d+)?)\s*(?:yard\s*line|yd\.?\s*(?:ln|line)?|yl)?)`;
const HORIZ_ON = new RegExp(String.raw`^on\s+${YARD_REF}$`);
const HORIZ_OFF = new RegExp(String.raw`^${NUMBER}\s*(?:steps?|stp?s?)?\s+(inside|outside|in|out)(?:\s+of)?\s+${YARD_REF}$`);
const FB_REF = String.raw`(?:the\s+)?(front|home|back|visitors?|f|b|h|v)\s*(hash(?:\s*marks?)?|h|sideline|side\s*line|sl)`;
const VERT_ON = new RegExp(String.raw`^on\s+${FB_REF}$`);
const VERT_OFF = new RegExp(String.raw`^${NUMBER}\s*(?:steps?|stp?s?)?\s+(in\s+front\s+of|ahead\s+of|behind|in\s+back\s+of|back\s+of)\s+${FB_REF}$`);

function frontBackY(which: string, kind: string, rules: FieldRules): number {
  const front = /^(front|home|f|h)$/.test(which);
  const sideline = /^(sideline|side\s*line|sl)$/.test(kind);
  if (sideline) return front ? 0 : FIELD_WIDTH_M;
  const h = hashesY(rules);
  return front ? h.front : h.back;
}

function yardOf(goal: string | undefined, num: string | undefined): number | string {
  if (goal) return 0;
  const yard = Number(num);
  if (!(yard >= 0 && yard <= 50) || yard % 5 !== 0) return `"${num}" is not a yard line (0, 5, 10 … 50)`;
  return yard;
}

/** x of a yard-line position ("on the 50", "2 steps outside the 35"), or why it cannot be read. */
export function parseSideToSide(part: string, side: Side | null): number | string {
  let yard: number | string;
  let steps = 0;
  const on = HORIZ_ON.exec(part);
  const off = on ? null : HORIZ_OFF.exec(part);
  if (on) yard = yardOf(on[1], on[2]);
  else if (off) {
    yard = yardOf(off[3], off[4]);
    const n = parseSteps(off[1]);
    if (typeof n === "string") return n;
    steps = n * (off[2].startsWith("out") ? 1 : -1);
  } else return `"${part}" is not a yard-line position (e.g. "2 steps outside the 35 yard line")`;
  if (typeof yard === "string") return yard;
  const fromFifty = ((50 - yard) / 5) * STEPS_PER_FIVE_YARDS + steps;
  if (fromFifty < -1e-9) return `"${part}" crosses the 50; count from a yard line on the same side`;
  if (fromFifty > 1e-9 && side === null) return `say which side (side 1 or side 2) for "${part}"`;
  return (side === 1 ? -1 : 1) * fromFifty * STEP_M;
}

function parseFrontToBack(part: string, rules: FieldRules): number | string {
  const on = VERT_ON.exec(part);
  if (on) return frontBackY(on[1], on[2], rules);
  const off = VERT_OFF.exec(part);
  if (!off) return `"${part}" is not a front-to-back position (e.g. "4 steps in front of the front hash")`;
  const sign = off[2].startsWith("behind") || off[2].includes("back") ? 1 : -1;
  const n = parseSteps(off[1]);
  if (typeof n === "string") return n;
  return frontBackY(off[3], off[4], rules) + sign * n * STEP_M;
}

/** Text in lower case with single spaces, and the side it opens with ("side 1:", "S2") taken off. */
export function sideAndRest(text: string): { side: Side | null; rest: string } {
  const rest = text.trim().toLowerCase().replace(/\s+/g, " ");
  const prefix = SIDE_PREFIX.exec(rest);
  return prefix ? { side: Number(prefix[1]) as Side, rest: rest.slice(prefix[0].length) } : { side: null, rest };
}

/** Reads a position written as describePosition writes it (and common shorthands: S1, FH, BSL, yd ln). */
export function positionFromWords(text: string, rules: FieldRules): WordsResult {
  const opening = sideAndRest(text);
  let side = opening.side;
  const rest = opening.rest;
  const parts = rest.split(rest.includes(";") ? ";" : ",").map((p) => p.trim()).filter(Boolean);
  if (parts.length !== 2) return { ok: false, error: "Write a yard-line part and a front-to-back part, separated by a semicolon." };
  // Either order: the part that names a hash or sideline is the front-to-back one.
  const isFrontBack = (p: string) => VERT_ON.test(p) || VERT_OFF.test(p);
  const [horiz, vert] = isFrontBack(parts[0]) && !isFrontBack(parts[1]) ? [parts[1], parts[0]] : [parts[0], parts[1]];
  const sideMatch = SIDE_PREFIX.exec(horiz);
  const horizPart = sideMatch ? horiz.slice(sideMatch[0].length) : horiz;
  if (sideMatch) side = Number(sideMatch[1]) as Side;
  const x = parseSideToSide(horizPart, side);
  if (typeof x === "string") return { ok: false, error: x };
  const y = parseFrontToBack(vert, rules);
  if (typeof y === "string") return { ok: false, error: y };
  return { ok: true, x, y };
}
