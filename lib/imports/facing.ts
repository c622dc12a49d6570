// Facing in a drill file: degrees (0 = toward the front sideline, 90 = toward side 2, clockwise as
// seen from above) or the trade's words. Pure.

const WORDS: Record<string, number> = {
  front: 0,
  "front sideline": 0,
  home: 0,
  "side 2": 90,
  s2: 90,
  back: 180,
  "back sideline": 180,
  visitors: 180,
  "side 1": 270,
  s1: 270,
};

/** Degrees in [0, 360), or a reason. Blank faces the front sideline. */
export function parseFacing(cell: string): number | string {
  const t = cell.trim().toLowerCase().replace(/\s+/g, " ");
  if (t === "") return 0;
  if (t in WORDS) return WORDS[t]!;
  const n = Number(t.replace(/°$/, ""));
  if (t !== "" && Number.isFinite(n)) return ((n % 360) + 360) % 360;
  return `facing "${cell}" is not a number of degrees or one of: front, back, side 1, side 2`;
}

/** The word for a facing that is exactly one of the four, else degrees. */
export function facingWords(deg: number): string {
  const d = ((Math.round(deg * 100) / 100) % 360 + 360) % 360;
  return d === 0 ? "front" : d === 90 ? "side 2" : d === 180 ? "back" : d === 270 ? "side 1" : String(d);
}
