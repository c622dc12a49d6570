// The screen view of the field: metres ↔ pixels, seen from the press box (front sideline at the
// bottom, side 1 on the left). Pure: the stage, its tests and any printed sheet share it.
import { END_LINE_X_M, FIELD_WIDTH_M } from "./geometry";

export interface View {
  /** Pixels per metre. */
  scale: number;
  /** Screen position of the field origin (front sideline, 50-yard line). */
  originX: number;
  originY: number;
}

export interface Bounds {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** The whole field with a little room around it, plus the points given (listening points off the front). */
export function fieldBounds(extra: readonly { x: number; y: number }[] = [], marginM = 3): Bounds {
  const b = { minX: -END_LINE_X_M - marginM, maxX: END_LINE_X_M + marginM, minY: -marginM - 2, maxY: FIELD_WIDTH_M + marginM };
  for (const p of extra) {
    b.minX = Math.min(b.minX, p.x - marginM);
    b.maxX = Math.max(b.maxX, p.x + marginM);
    b.minY = Math.min(b.minY, p.y - marginM);
    b.maxY = Math.max(b.maxY, p.y + marginM);
  }
  return b;
}

/** The view that shows the bounds as large as the screen allows, centred. */
export function fitView(widthPx: number, heightPx: number, b: Bounds): View {
  const scale = Math.max(0.1, Math.min(widthPx / (b.maxX - b.minX), heightPx / (b.maxY - b.minY)));
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return { scale, originX: widthPx / 2 - cx * scale, originY: heightPx / 2 + cy * scale };
}

export function toScreen(v: View, x: number, y: number): { x: number; y: number } {
  return { x: v.originX + x * v.scale, y: v.originY - y * v.scale };
}

export function toField(v: View, px: number, py: number): { x: number; y: number } {
  return { x: (px - v.originX) / v.scale, y: (v.originY - py) / v.scale };
}

/** Zooms by `factor` keeping the field point under (px, py) in place; scale kept within limits. */
export function zoomAt(v: View, factor: number, px: number, py: number, minScale = 1, maxScale = 120): View {
  const scale = Math.min(maxScale, Math.max(minScale, v.scale * factor));
  const k = scale / v.scale;
  return { scale, originX: px - (px - v.originX) * k, originY: py - (py - v.originY) * k };
}

export function panBy(v: View, dxPx: number, dyPx: number): View {
  return { ...v, originX: v.originX + dxPx, originY: v.originY + dyPx };
}

/** Screen direction of a facing (0 = toward the front sideline, i.e. down the screen; 90 = toward side 2, right). */
export function facingVector(facingDeg: number): { dx: number; dy: number } {
  const a = (facingDeg * Math.PI) / 180;
  return { dx: Math.sin(a), dy: Math.cos(a) };
}
