// The football field in the field frame (metres): origin on the front sideline at the 50-yard
// line, x toward side 2, y toward the back sideline. Pure; shared by the editor, imports and sheets.
import { FIELD_MARGIN_M, HALF_LENGTH_M, WIDTH_M } from "@/lib/validation/positions";

export type FieldRules = "high-school" | "college";

export const YARD_M = 0.9144;
/** A step of 8 to 5: 5 yards in 8 steps, 22.5 in = 0.5715 m (common practice). */
export const STEP_M = (5 * YARD_M) / 8;
export const STEPS_PER_FIVE_YARDS = 8;
/** From the 50 to a goal line: 50 yd. */
export const GOAL_LINE_X_M = 50 * YARD_M;
/** From the 50 to an end line (back of the end zone): 60 yd. */
export const END_LINE_X_M = HALF_LENGTH_M;
/** Sideline to sideline: 53 1/3 yd = 160 ft. */
export const FIELD_WIDTH_M = WIDTH_M;

/** Distance of each hash from its own sideline: high school 53 ft 4 in, college 60 ft (see shared references). */
export const HASH_FROM_SIDELINE_M: Readonly<Record<FieldRules, number>> = { "high-school": 16.256, college: 18.288 };

/** y of the front and back hashes under the given rules. */
export function hashesY(rules: FieldRules): { front: number; back: number } {
  const d = HASH_FROM_SIDELINE_M[rules];
  return { front: d, back: FIELD_WIDTH_M - d };
}

export type Side = 1 | 2;

/** x of a yard line (0 = goal line … 50 = midfield) on a side; side 1 is negative x. */
export function yardLineX(yard: number, side: Side): number {
  if (!(yard >= 0 && yard <= 50)) throw new RangeError(`yard line ${yard} is not between 0 and 50`);
  const x = (50 - yard) * YARD_M;
  return side === 1 ? -x : x;
}

/** The yard line number (0…50) and side of an x, not rounded (e.g. 37.5 on side 1). */
export function yardOfX(x: number): { yard: number; side: Side | null } {
  const yard = 50 - Math.abs(x) / YARD_M;
  return { yard, side: x < 0 ? 1 : x > 0 ? 2 : null };
}

export interface YardLine {
  x: number;
  /** 0 (goal line) … 50. */
  yard: number;
  side: Side | null;
  /** Numbers are painted every 10 yards (10 … 50, not on the goal lines). */
  numbered: boolean;
}

/** Every yard line of the field, every 5 yards from goal line to goal line, side 1 to side 2. */
export function yardLines(): YardLine[] {
  const out: YardLine[] = [];
  for (let k = -10; k <= 10; k++) {
    const x = k * 5 * YARD_M;
    const yard = 50 - Math.abs(k) * 5;
    out.push({ x, yard, side: k < 0 ? 1 : k > 0 ? 2 : null, numbered: yard > 0 && yard % 10 === 0 });
  }
  return out;
}

/** Snaps a coordinate to the step grid (multiples of a step from the 50 and from the front sideline). */
export function snapToStep(v: number): number {
  return Math.round(v / STEP_M) * STEP_M;
}

/** Brings a point inside the area the API accepts (at most FIELD_MARGIN_M beyond a sideline or end line). */
export function clampToFieldArea(x: number, y: number): { x: number; y: number } {
  const maxX = END_LINE_X_M + FIELD_MARGIN_M;
  return { x: Math.min(maxX, Math.max(-maxX, x)), y: Math.min(FIELD_WIDTH_M + FIELD_MARGIN_M, Math.max(-FIELD_MARGIN_M, y)) };
}
