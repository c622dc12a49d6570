// Small helpers to lay out the demo drill's forms in the field frame (metres): origin on the
// front sideline at the 50-yard line, x toward side 2, y toward the back sideline. Demo-only;
// the field itself (steps, yard lines, hashes) is lib/field/geometry.
import { STEP_M } from "@/lib/field/geometry";

export { STEP_M, yardLineX } from "@/lib/field/geometry";

export interface Point {
  x: number;
  y: number;
}

export function steps(n: number): number {
  return n * STEP_M;
}

/** n points evenly from `from` to `to`, both ends included. */
export function line(from: Point, to: Point, n: number): Point[] {
  if (n < 1) return [];
  if (n === 1) return [{ ...from }];
  return Array.from({ length: n }, (_, i) => {
    const t = i / (n - 1);
    return { x: from.x + (to.x - from.x) * t, y: from.y + (to.y - from.y) * t };
  });
}

/** A line parallel to the yard lines' normal (side to side) centred on x, at an interval in steps. */
export function row(centerX: number, y: number, n: number, intervalSteps: number): Point[] {
  const half = (steps(intervalSteps) * (n - 1)) / 2;
  return line({ x: centerX - half, y }, { x: centerX + half, y }, n);
}

/**
 * n points on a circle's arc from fromDeg to toDeg (both included). Angles are counted from
 * +x (toward side 2) turning toward +y (the back sideline): 270° is the point nearest the box.
 */
export function arc(center: Point, radius: number, fromDeg: number, toDeg: number, n: number): Point[] {
  const step = n === 1 ? 0 : (toDeg - fromDeg) / (n - 1);
  return Array.from({ length: n }, (_, i) => {
    const a = ((fromDeg + step * i) * Math.PI) / 180;
    return { x: center.x + radius * Math.cos(a), y: center.y + radius * Math.sin(a) };
  });
}

/**
 * A block `cols` wide and `rows` deep; origin is its front corner on the side-1 end. Listed by
 * rows (front row first, side 1 to side 2) or by files (side-1 file first, front to back), so a
 * line that fills a block by files keeps everyone's side-to-side order.
 */
export function block(origin: Point, cols: number, rows: number, intervalSteps: number, order: "rows" | "files" = "rows"): Point[] {
  const d = steps(intervalSteps);
  const out: Point[] = [];
  if (order === "rows") {
    for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) out.push({ x: origin.x + c * d, y: origin.y + r * d });
  } else {
    for (let c = 0; c < cols; c++) for (let r = 0; r < rows; r++) out.push({ x: origin.x + c * d, y: origin.y + r * d });
  }
  return out;
}

/** A wedge (a V) of n points: the tip, then the two arms toward `leftEnd` and `rightEnd`, listed side 1 to side 2. */
export function wedge(tip: Point, leftEnd: Point, rightEnd: Point, n: number): Point[] {
  const perArm = Math.floor((n - 1) / 2);
  const extra = n - 1 - 2 * perArm; // an even count puts the spare dot on the side-2 arm
  const left = line(tip, leftEnd, perArm + 1).slice(1).reverse();
  const right = line(tip, rightEnd, perArm + extra + 1).slice(1);
  return [...left, { ...tip }, ...right];
}

export function translate(points: Point[], dx: number, dy: number): Point[] {
  return points.map((p) => ({ x: p.x + dx, y: p.y + dy }));
}
