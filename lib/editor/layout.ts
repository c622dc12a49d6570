// A set's layout as the editor holds it: performer id → spot. Pure, immutable updates.
export interface Spot {
  x: number;
  y: number;
  facingDeg: number;
}

export type Layout = Readonly<Record<string, Spot>>;

export interface PositionRow extends Spot {
  performerId: string;
}

export function layoutOf(rows: readonly PositionRow[]): Layout {
  const out: Record<string, Spot> = {};
  for (const r of rows) out[r.performerId] = { x: r.x, y: r.y, facingDeg: r.facingDeg };
  return out;
}

export function rowsOf(layout: Layout, ids: Iterable<string> = Object.keys(layout)): PositionRow[] {
  const out: PositionRow[] = [];
  for (const id of ids) {
    const s = layout[id];
    if (s) out.push({ performerId: id, x: s.x, y: s.y, facingDeg: s.facingDeg });
  }
  return out;
}

/** The layout with some spots replaced (undefined removes the performer from the set). */
export function withSpots(layout: Layout, changes: Readonly<Record<string, Spot | undefined>>): Layout {
  const out: Record<string, Spot> = { ...layout };
  for (const [id, spot] of Object.entries(changes)) {
    if (spot) out[id] = spot;
    else delete out[id];
  }
  return out;
}

const same = (a: Spot, b: Spot) => a.x === b.x && a.y === b.y && a.facingDeg === b.facingDeg;

/** What a save must send to turn `before` into `after`: spots to write and performers to take off the set. */
export function diffLayouts(before: Layout, after: Layout): { upserts: PositionRow[]; removals: string[] } {
  const upserts = rowsOf(after, Object.keys(after).filter((id) => !before[id] || !same(before[id], after[id])));
  const removals = Object.keys(before).filter((id) => !after[id]);
  return { upserts, removals };
}
