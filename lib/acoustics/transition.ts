// Positions between two sets: straight lines at an even step, facing turning the short way.
import { AcousticsInputError, requireFinite } from "./errors";
import type { Position } from "./types";

/** An angle brought into [0, 360). */
export function normalizeDeg(deg: number): number {
  let d = deg % 360;
  // Stryker disable next-line EqualityOperator: with <=, 0 becomes 360, which the next line maps back to 0 (−0 comes out +0, an equal number)
  if (d < 0) d += 360;
  return d >= 360 ? 0 : d; // −1e-20 + 360 rounds to 360
}

/** Facing (0…360) a fraction t of the way from a to b, turning the short way. */
export function facingBetweenDeg(fromDeg: number, toDeg: number, t: number): number {
  let turn = toDeg - fromDeg;
  turn -= 360 * Math.round(turn / 360); // −180 … 180
  if (turn === -180) turn = 180; // a half turn goes clockwise
  return normalizeDeg(fromDeg + turn * t);
}

/** Throws unless 0 ≤ count ≤ counts and counts > 0; returns the fraction count / counts. */
export function transitionFraction(count: number, counts: number): number {
  const c = requireFinite(counts, "counts");
  if (c <= 0) throw new AcousticsInputError("counts", "must be above 0");
  const k = requireFinite(count, "count");
  if (k < 0 || k > c) throw new AcousticsInputError("count", `must be between 0 and ${c}`);
  return k / c;
}

/**
 * Writes positions a fraction t of the way between two sets held in typed arrays (same performer
 * order): the allocation-free form for sweeps.
 */
export function positionsBetweenInto(
  from: { x: Float64Array; y: Float64Array; facingDeg: Float64Array },
  to: { x: Float64Array; y: Float64Array; facingDeg: Float64Array },
  t: number,
  out: { x: Float64Array; y: Float64Array; facingDeg: Float64Array },
): void {
  const { x: ax, y: ay, facingDeg: af } = from;
  const { x: bx, y: by, facingDeg: bf } = to;
  const { x: ox, y: oy, facingDeg: of } = out;
  // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
  for (let i = 0; i < ox.length; i++) {
    ox[i] = ax[i] + (bx[i] - ax[i]) * t;
    oy[i] = ay[i] + (by[i] - ay[i]) * t;
    of[i] = facingBetweenDeg(af[i], bf[i], t);
  }
}

function checkPositions(positions: readonly Position[], field: string): Map<string, Position> {
  if (!Array.isArray(positions)) throw new AcousticsInputError(field, "must be an array");
  const byId = new Map<string, Position>();
  positions.forEach((p, i) => {
    if (typeof p?.performerId !== "string") throw new AcousticsInputError(`${field}[${i}].performerId`, "must be a string");
    if (byId.has(p.performerId)) throw new AcousticsInputError(`${field}[${i}].performerId`, `"${p.performerId}" is used twice`);
    requireFinite(p.x, `${field}[${i}].x`);
    requireFinite(p.y, `${field}[${i}].y`);
    requireFinite(p.facingDeg, `${field}[${i}].facingDeg`);
    byId.set(p.performerId, p);
  });
  return byId;
}

/**
 * Every performer's position at `count` of a transition of `counts` counts from one set to the
 * next. Performers come in the order of fromPositions, then those only in toPositions; a
 * performer present in only one of the sets stands at that set's position.
 */
export function positionsAtCount(
  fromPositions: readonly Position[],
  toPositions: readonly Position[],
  count: number,
  counts: number,
): Position[] {
  const from = checkPositions(fromPositions, "fromPositions");
  const to = checkPositions(toPositions, "toPositions");
  const t = transitionFraction(count, counts);
  const out: Position[] = [];
  for (const a of from.values()) {
    const b = to.get(a.performerId) ?? a;
    out.push({
      performerId: a.performerId,
      x: a.x + (b.x - a.x) * t,
      y: a.y + (b.y - a.y) * t,
      facingDeg: facingBetweenDeg(a.facingDeg, b.facingDeg, t),
    });
  }
  for (const b of to.values()) if (!from.has(b.performerId)) out.push({ ...b, facingDeg: normalizeDeg(b.facingDeg) });
  return out;
}
