// Selecting performers: click, shift-click and the rubber band. Pure.
export type Rect = { x0: number; y0: number; x1: number; y1: number };

/** Ids of the points inside a rectangle given by any two opposite corners. */
export function idsInRect(points: Iterable<{ id: string; x: number; y: number }>, r: Rect): string[] {
  const [xa, xb] = r.x0 <= r.x1 ? [r.x0, r.x1] : [r.x1, r.x0];
  const [ya, yb] = r.y0 <= r.y1 ? [r.y0, r.y1] : [r.y1, r.y0];
  const out: string[] = [];
  for (const p of points) if (p.x >= xa && p.x <= xb && p.y >= ya && p.y <= yb) out.push(p.id);
  return out;
}

/** A click on a performer: alone it selects just that one; with shift it toggles it in the selection. */
export function clickSelect(selected: readonly string[], id: string, additive: boolean): string[] {
  if (!additive) return [id];
  return selected.includes(id) ? selected.filter((s) => s !== id) : [...selected, id];
}

/** A rubber band: replaces the selection, or adds to it with shift. */
export function bandSelect(selected: readonly string[], inBand: readonly string[], additive: boolean): string[] {
  return additive ? [...new Set([...selected, ...inBand])] : [...inBand];
}
