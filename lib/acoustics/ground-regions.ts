// Ground by region, ISO 9613-2:1996 7.3.1: the source region runs 30·hs from the source toward
// the receiver, the receiver region 30·hr back from the receiver, the middle region between them
// (none when they overlap). Each region's G is the length-weighted mean of the ground under it,
// as ISO/TR 17534-3:2015 T04 and T06 average three kinds of ground into G_s, G_m and G_r.
import { HALF_LENGTH_M, WIDTH_M } from "@/lib/validation/positions";
import { AcousticsInputError, requireFinite, requireInRange } from "./errors";

/** The ground factors of the three regions of 7.3.1. */
export interface RegionGroundFactors {
  source: number;
  middle: number;
  receiver: number;
}

/**
 * Mean G over [u0, u1] of ground that is piecewise constant along the projected path: piece i
 * spans [cuts[i], cuts[i + 1]] with factor g[i], for i < pieces. An interval of no length takes
 * the ground at u0 (a source on the ground stands on one kind of ground, not on an average).
 */
export function meanGroundOver(u0: number, u1: number, cuts: Float64Array, g: Float64Array, pieces: number): number {
  if (u1 <= u0) {
    for (let i = 0; i < pieces; i++) if (u0 < cuts[i + 1]) return g[i];
    return g[pieces - 1];
  }
  let sum = 0;
  // Stryker disable next-line EqualityOperator: a pass past the last piece adds nothing (its lo is at least cuts[pieces], where every interval asked for ends)
  for (let i = 0; i < pieces; i++) {
    // Stryker disable next-line EqualityOperator: at a tie both give the same value
    const lo = cuts[i] > u0 ? cuts[i] : u0;
    // Stryker disable next-line EqualityOperator: at a tie both give the same value
    const hi = cuts[i + 1] < u1 ? cuts[i + 1] : u1;
    // Stryker disable next-line EqualityOperator: a piece of no length adds 0
    if (hi > lo) sum += (hi - lo) * g[i];
  }
  return sum / (u1 - u0);
}

/**
 * Writes G_s, G_m, G_r into out[offset..offset+2] for the piecewise ground of meanGroundOver
 * over a path of projected length dp with heights hs and hr. When the regions overlap
 * (dp ≤ 30(hs + hr)) the middle region has no length: G_m is the mean over the whole path,
 * which Table 3 multiplies by q = 0 anyway.
 */
export function regionGroundInto(out: Float64Array, offset: number, cuts: Float64Array, g: Float64Array, pieces: number, hs: number, hr: number, dp: number): void {
  const sourceEnd = Math.min(30 * hs, dp);
  const receiverStart = Math.max(dp - 30 * hr, 0);
  out[offset] = meanGroundOver(0, sourceEnd, cuts, g, pieces);
  out[offset + 1] = receiverStart > sourceEnd ? meanGroundOver(sourceEnd, receiverStart, cuts, g, pieces) : meanGroundOver(0, dp, cuts, g, pieces);
  // A receiver region of no length takes the ground under the receiver.
  // Stryker disable next-line ConditionalExpression,EqualityOperator: with receiverStart = dp the mean over no length at dp (= cuts[pieces]) is the last piece's ground too
  out[offset + 2] = receiverStart < dp ? meanGroundOver(receiverStart, dp, cuts, g, pieces) : g[pieces - 1];
}

/**
 * G_s, G_m and G_r for a path over consecutive stretches of ground, from the source to the
 * receiver: lengthsM[i] metres of ground factor factors[i]; heights hs and hr in metres.
 */
export function regionGroundFactors(lengthsM: readonly number[], factors: readonly number[], hs: number, hr: number): RegionGroundFactors {
  if (!Array.isArray(lengthsM) || lengthsM.length === 0) throw new AcousticsInputError("lengthsM", "must list at least one stretch");
  if (!Array.isArray(factors) || factors.length !== lengthsM.length) throw new AcousticsInputError("factors", "must hold one G per stretch");
  requireFinite(hs, "sourceHeightM");
  requireFinite(hr, "receiverHeightM");
  if (hs < 0) throw new AcousticsInputError("sourceHeightM", "must not be negative");
  if (hr < 0) throw new AcousticsInputError("receiverHeightM", "must not be negative");
  const n = lengthsM.length;
  const cuts = new Float64Array(n + 1);
  const g = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const len = requireFinite(lengthsM[i], `lengthsM[${i}]`);
    if (len < 0) throw new AcousticsInputError(`lengthsM[${i}]`, "must not be negative");
    cuts[i + 1] = cuts[i] + len;
    g[i] = requireInRange(factors[i], 0, 1, `factors[${i}]`);
  }
  const out = new Float64Array(3);
  regionGroundInto(out, 0, cuts, g, n, hs, hr, cuts[n]);
  return { source: out[0], middle: out[1], receiver: out[2] };
}

/** [t0, t1] of the clip in pathGroundInto (module scratch: the engine's loop allocates nothing). */
const CLIP = new Float64Array(2);

function clipEdge(p: number, q: number): void {
  if (p === 0) {
    if (q < 0) CLIP[1] = -1; // parallel to this edge and outside it
    return;
  }
  const t = q / p;
  // Stryker disable next-line EqualityOperator: p is not 0 here
  if (p < 0) {
    // Stryker disable next-line EqualityOperator: at a tie both keep the same value
    if (t > CLIP[0]) CLIP[0] = t;
    // Stryker disable next-line EqualityOperator: at a tie both keep the same value
  } else if (t < CLIP[1]) CLIP[1] = t;
}

/** Pieces of ground along a path from a performer to a listening point (see pathGroundInto). */
export const PATH_PIECES = 4;

/**
 * Writes the ground along the projected path from (sx, sy) to (rx, ry), dp metres long, into
 * cuts[0..4] and g[0..3]: `between` ground, the field surface where the path crosses the playing
 * field (the field frame's rectangle, end line to end line and sideline to sideline), `between`
 * again, and the listening point's own surroundings over its last surroundingsM metres.
 */
export function pathGroundInto(
  cuts: Float64Array,
  g: Float64Array,
  sx: number,
  sy: number,
  rx: number,
  ry: number,
  dp: number,
  fieldG: number,
  betweenG: number,
  pointG: number,
  surroundingsM: number,
): void {
  // Liang–Barsky: the part t ∈ [t0, t1] of the segment inside the field rectangle.
  const dx = rx - sx;
  const dy = ry - sy;
  CLIP[0] = 0;
  CLIP[1] = 1;
  clipEdge(-dx, sx + HALF_LENGTH_M);
  clipEdge(dx, HALF_LENGTH_M - sx);
  clipEdge(-dy, sy);
  clipEdge(dy, WIDTH_M - sy);
  const t0 = CLIP[0];
  const t1 = CLIP[1];
  const near = Math.max(dp - surroundingsM, 0);
  const f0 = t1 > t0 ? Math.min(t0 * dp, near) : near;
  const f1 = t1 > t0 ? Math.min(t1 * dp, near) : near;
  cuts[0] = 0;
  cuts[1] = f0;
  cuts[2] = f1;
  cuts[3] = near;
  cuts[4] = dp;
  g[0] = betweenG;
  g[1] = fieldG;
  g[2] = betweenG;
  g[3] = pointG;
}
