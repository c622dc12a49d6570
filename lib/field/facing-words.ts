// Facing in words: "toward the press box", "toward side 2, 30° toward the back sideline". The
// press box is on the front sideline's side of the field (the field frame's 0°). Pure.

const NAMES = ["the press box", "side 2", "the back sideline", "side 1"] as const;

/** Where a performer faces in words; degrees only as detail when between two of the four directions. */
export function facingInWords(deg: number): string {
  if (!Number.isFinite(deg)) throw new RangeError("a facing must be a finite number of degrees");
  const d = ((Math.round(deg) % 360) + 360) % 360;
  const quarter = Math.round(d / 90) % 4;
  const off = d - quarter * 90;
  const turn = off > 180 ? off - 360 : off < -180 ? off + 360 : off;
  const main = `toward ${NAMES[quarter]}`;
  if (turn === 0) return main;
  // Clockwise seen from above (0° front, 90° side 2): a positive turn leans to the next quarter.
  const lean = NAMES[(quarter + (turn > 0 ? 1 : 3)) % 4];
  return `${main}, ${Math.abs(turn)}° toward ${lean}`;
}
