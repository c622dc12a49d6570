// Form helpers for a selection of performers: spread along a line or an arc, fill a block,
// mirror side 1 ↔ side 2, copy from another set, nudge, snap, face. Pure; each returns the
// changed spots only (merge them with withSpots), kept inside the field area.
import { clampToFieldArea, snapToStep, STEP_M } from "@/lib/field/geometry";
import type { Layout, Spot } from "./layout";

export type Changes = Record<string, Spot>;
type Pt = { id: string; x: number; y: number };

/** Facings by name: 0 toward the front sideline, 90 toward side 2 (shared/API.md). */
export const FACINGS = { front: 0, "side 2": 90, back: 180, "side 1": 270 } as const;

const normDeg = (d: number) => ((d % 360) + 360) % 360;

function placed(layout: Layout, ids: readonly string[]): Pt[] {
  return ids.flatMap((id) => (layout[id] ? [{ id, x: layout[id].x, y: layout[id].y }] : []));
}

function put(layout: Layout, id: string, x: number, y: number, facingDeg = layout[id]?.facingDeg ?? 0): Spot {
  return { ...clampToFieldArea(x, y), facingDeg };
}

/** The two points farthest apart: the ends of a line or an arc. */
function ends(pts: Pt[]): [Pt, Pt] {
  let best: [Pt, Pt] = [pts[0], pts[pts.length - 1]];
  let bestD = -1;
  for (let i = 0; i < pts.length; i++) {
    for (let j = i + 1; j < pts.length; j++) {
      const d = (pts[i].x - pts[j].x) ** 2 + (pts[i].y - pts[j].y) ** 2;
      if (d > bestD) [bestD, best] = [d, [pts[i], pts[j]]];
    }
  }
  // Side 1 end first, so results do not depend on the order of the selection.
  return best[0].x < best[1].x || (best[0].x === best[1].x && best[0].y <= best[1].y) ? best : [best[1], best[0]];
}

/** Points in order along a→b (by projection), ties by id for a stable result. */
function alongChord(pts: Pt[], a: Pt, b: Pt): Pt[] {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = (p: Pt) => (p.x - a.x) * dx + (p.y - a.y) * dy;
  return [...pts].sort((p, q) => t(p) - t(q) || p.id.localeCompare(q.id));
}

/** Even spacing on the straight line between the two performers farthest apart (who stay put). */
export function spreadAlongLine(layout: Layout, ids: readonly string[]): Changes {
  const pts = placed(layout, ids);
  if (pts.length < 3) return {};
  const [a, b] = ends(pts);
  const ordered = alongChord(pts, a, b);
  const out: Changes = {};
  ordered.forEach((p, i) => {
    const t = i / (ordered.length - 1);
    out[p.id] = put(layout, p.id, a.x + (b.x - a.x) * t, a.y + (b.y - a.y) * t);
  });
  return out;
}

/** The circle through three points, or null when they are (nearly) on one line. */
export function circleThrough(p: { x: number; y: number }, q: { x: number; y: number }, r: { x: number; y: number }) {
  const d = 2 * (p.x * (q.y - r.y) + q.x * (r.y - p.y) + r.x * (p.y - q.y));
  const scale = Math.max(Math.hypot(q.x - p.x, q.y - p.y), Math.hypot(r.x - p.x, r.y - p.y), 1e-9);
  if (Math.abs(d) < 1e-6 * scale * scale) return null;
  const p2 = p.x * p.x + p.y * p.y;
  const q2 = q.x * q.x + q.y * q.y;
  const r2 = r.x * r.x + r.y * r.y;
  const cx = (p2 * (q.y - r.y) + q2 * (r.y - p.y) + r2 * (p.y - q.y)) / d;
  const cy = (p2 * (r.x - q.x) + q2 * (p.x - r.x) + r2 * (q.x - p.x)) / d;
  return { cx, cy, radius: Math.hypot(p.x - cx, p.y - cy) };
}

/**
 * Even spacing on the arc through the two performers farthest apart and the one farthest from
 * the chord between them (drag that one out to shape the arc first). A flat selection spreads on a line.
 */
export function spreadAlongArc(layout: Layout, ids: readonly string[]): Changes {
  const pts = placed(layout, ids);
  if (pts.length < 3) return {};
  const [a, b] = ends(pts);
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  const off = (p: Pt) => ((b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x)) / len; // signed distance from the chord
  const control = pts.reduce((m, p) => (Math.abs(off(p)) > Math.abs(off(m)) ? p : m), pts[0]);
  const circle = Math.abs(off(control)) < 0.05 * len ? null : circleThrough(a, control, b);
  if (!circle) return spreadAlongLine(layout, ids);
  const angle = (p: { x: number; y: number }) => Math.atan2(p.y - circle.cy, p.x - circle.cx);
  const start = angle(a);
  // Sweep from a to b the way that passes the control point.
  let sweep = angle(b) - start;
  let toControl = angle(control) - start;
  const wrap = (v: number) => ((v % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  sweep = wrap(sweep);
  toControl = wrap(toControl);
  if (toControl > sweep) sweep -= 2 * Math.PI;
  // Order performers by their angle along that sweep.
  const param = (p: Pt) => {
    const v = wrap(angle(p) - start);
    return sweep >= 0 ? v : v === 0 ? 0 : 2 * Math.PI - v;
  };
  const ordered = [...pts].sort((p, q) => param(p) - param(q) || p.id.localeCompare(q.id));
  const out: Changes = {};
  ordered.forEach((p, i) => {
    const th = start + (sweep * i) / (ordered.length - 1);
    out[p.id] = put(layout, p.id, circle.cx + circle.radius * Math.cos(th), circle.cy + circle.radius * Math.sin(th));
  });
  return out;
}

export interface BlockSpec {
  /** Files (performers per rank, side to side). */
  columns: number;
  /** Interval between files and between ranks, in steps. */
  intervalSteps: number;
  /** Interval between ranks if different, in steps. */
  rankIntervalSteps?: number;
}

/**
 * A block: ranks from the front, files from side 1, starting at the selection's front corner on
 * side 1. Performers keep their order (the front-most make the front rank, side 1 to side 2 in each).
 */
export function fillBlock(layout: Layout, ids: readonly string[], spec: BlockSpec): Changes {
  const pts = placed(layout, ids);
  const columns = Math.max(1, Math.floor(spec.columns));
  if (pts.length === 0 || !(spec.intervalSteps > 0)) return {};
  const ix = spec.intervalSteps * STEP_M;
  const iy = (spec.rankIntervalSteps ?? spec.intervalSteps) * STEP_M;
  const x0 = Math.min(...pts.map((p) => p.x));
  const y0 = Math.min(...pts.map((p) => p.y));
  // The front-most `columns` performers make the first rank, and so on; each rank from side 1.
  const byDepth = [...pts].sort((p, q) => p.y - q.y || p.x - q.x || p.id.localeCompare(q.id));
  const ordered: Pt[] = [];
  for (let i = 0; i < byDepth.length; i += columns) {
    ordered.push(...byDepth.slice(i, i + columns).sort((p, q) => p.x - q.x || p.id.localeCompare(q.id)));
  }
  const out: Changes = {};
  ordered.forEach((p, i) => {
    out[p.id] = put(layout, p.id, x0 + (i % columns) * ix, y0 + Math.floor(i / columns) * iy);
  });
  return out;
}

/** Side 1 ↔ side 2: x → −x, and facings mirrored across the 50 (90 ↔ 270). */
export function mirrorSides(layout: Layout, ids: readonly string[]): Changes {
  const out: Changes = {};
  for (const p of placed(layout, ids)) out[p.id] = put(layout, p.id, -p.x, p.y, normDeg(360 - layout[p.id].facingDeg));
  return out;
}

/** The spots the performers have in another set (performers not placed there are left out). */
export function copyFrom(source: Layout, ids: readonly string[]): Changes {
  const out: Changes = {};
  for (const id of ids) if (source[id]) out[id] = { ...source[id] };
  return out;
}

/** Moves the performers by a distance in metres. */
export function moveBy(layout: Layout, ids: readonly string[], dx: number, dy: number): Changes {
  const out: Changes = {};
  for (const p of placed(layout, ids)) out[p.id] = put(layout, p.id, p.x + dx, p.y + dy);
  return out;
}

/** Moves by whole or part steps (the arrow keys: one step). */
export function nudge(layout: Layout, ids: readonly string[], dxSteps: number, dySteps: number): Changes {
  return moveBy(layout, ids, dxSteps * STEP_M, dySteps * STEP_M);
}

/** Each performer to the nearest point of the step grid. */
export function snapToGrid(layout: Layout, ids: readonly string[]): Changes {
  const out: Changes = {};
  for (const p of placed(layout, ids)) out[p.id] = put(layout, p.id, snapToStep(p.x), snapToStep(p.y));
  return out;
}

/** A drag's offset with the leading performer landing on the step grid (the others keep their intervals). */
export function snappedOffset(lead: { x: number; y: number }, dx: number, dy: number): { dx: number; dy: number } {
  return { dx: snapToStep(lead.x + dx) - lead.x, dy: snapToStep(lead.y + dy) - lead.y };
}

export function face(layout: Layout, ids: readonly string[], facingDeg: number): Changes {
  const out: Changes = {};
  if (!Number.isFinite(facingDeg)) return out;
  for (const p of placed(layout, ids)) out[p.id] = { x: layout[p.id].x, y: layout[p.id].y, facingDeg: normDeg(facingDeg) };
  return out;
}
