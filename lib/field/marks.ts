// A performer's mark shows how they sound: a wedge from the dot toward where they face, as wide as
// their instrument throws its sound. The spread is read from the catalog's directivity table: the
// angle off the facing where the 2 kHz band (the one that carries brilliance and diction to the
// box) falls 3 dB below straight ahead — the usual half-power beam edge. Narrow for bells-forward
// brass, wide for woodwinds, all round for drums. Pure geometry in screen units (y down, the front
// sideline at the bottom), shared by the field editor, the compare view, the hearing map and the sheets.
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { facingVector } from "./view";

/** Band index of 2 kHz in the catalog's eight octave bands (63 Hz … 8 kHz). */
export const SPREAD_BAND = 5;
/** The beam edge: half the power of straight ahead. */
export const SPREAD_DROP_DB = 3;
/** Spreads at or past this are drawn as a full circle (the instrument sounds all round). */
export const ALL_ROUND_DEG = 150;

export interface DirectivityTable {
  anglesDeg: readonly number[];
  bandsDb: readonly (readonly number[])[];
}

/** Half-angle (degrees, 0…180) where the band first falls `dropDb` below 0°, interpolated; 180 when it never does. */
export function soundSpreadDeg(directivity: DirectivityTable, band = SPREAD_BAND, dropDb = SPREAD_DROP_DB): number {
  const row = directivity.bandsDb[band];
  const angles = directivity.anglesDeg;
  if (!row || row.length !== angles.length) throw new RangeError(`the directivity table has no band ${band}`);
  const ahead = row[0]!;
  for (let i = 1; i < row.length; i++) {
    const a = ahead - row[i - 1]!;
    const b = ahead - row[i]!;
    if (b >= dropDb) return angles[i - 1]! + ((dropDb - a) / (b - a)) * (angles[i]! - angles[i - 1]!);
  }
  return 180;
}

export type SpreadKind = "narrow" | "medium" | "wide" | "all round";

/** The spread in words, for the legend and screen readers. */
export function spreadKind(spreadDeg: number): SpreadKind {
  if (spreadDeg >= ALL_ROUND_DEG) return "all round";
  if (spreadDeg < 55) return "narrow";
  if (spreadDeg < 85) return "medium";
  return "wide";
}

/**
 * The wedge as a polygon around the dot at (0, 0): the apex at the dot and an arc of `radius`
 * from facing − spread to facing + spread. A spread past ALL_ROUND_DEG gives the whole circle
 * (no apex). Facing 0° points down the screen (toward the front sideline), 90° right (side 2).
 */
export function wedgePoints(facingDeg: number, spreadDeg: number, radius: number, segments = 16): [number, number][] {
  if (!Number.isFinite(facingDeg) || !Number.isFinite(spreadDeg) || !(radius > 0)) throw new RangeError("a wedge needs a finite facing and spread and a radius above 0");
  const all = spreadDeg >= ALL_ROUND_DEG;
  const half = all ? 180 : Math.max(5, spreadDeg);
  const pts: [number, number][] = all ? [] : [[0, 0]];
  const n = all ? segments * 2 : segments;
  for (let i = 0; i <= n; i++) {
    if (all && i === n) break;
    const { dx, dy } = facingVector(facingDeg - half + (2 * half * i) / n);
    pts.push([dx * radius, dy * radius]);
  }
  return pts;
}

/** The same wedge as an SVG path (d attribute), centred on (cx, cy). */
export function wedgePath(cx: number, cy: number, facingDeg: number, spreadDeg: number, radius: number): string {
  const pts = wedgePoints(facingDeg, spreadDeg, radius);
  return `${pts.map(([x, y], i) => `${i ? "L" : "M"}${(cx + x).toFixed(3)} ${(cy + y).toFixed(3)}`).join(" ")} Z`;
}

/** The spread of an instrument of a catalog (default the built-in one); all round for one the catalog lacks, as nothing says which way it throws its sound. */
export function instrumentSpreadDeg(key: string, catalog: Readonly<Record<string, { directivity: DirectivityTable }>> = DEFAULT_INSTRUMENTS): number {
  const spec = Object.hasOwn(catalog, key) ? catalog[key] : undefined;
  return spec ? soundSpreadDeg(spec.directivity) : 180;
}
