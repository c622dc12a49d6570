// Directivity: attenuation by the angle between a performer's facing and the direction to the
// listener, interpolated linearly in angle from the instrument's table, per band.
import { BAND_COUNT } from "./bands";
import { AcousticsInputError, requireFinite } from "./errors";
import type { InstrumentSpec } from "./types";

const RAD_TO_DEG = 180 / Math.PI;

/** A directivity table flattened for the hot loop: values[b·n + i] at angles[i]. */
export interface CompiledDirectivity {
  angles: Float64Array;
  values: Float64Array;
  n: number;
}

/**
 * Checks and flattens a directivity table. Angles must rise from 0° to 180°; every value ≤ 0 and
 * the 0° value the largest of its band, so facing the listener is never quieter than any other way.
 */
export function compileDirectivity(directivity: InstrumentSpec["directivity"], field: string): CompiledDirectivity {
  const angles = directivity?.anglesDeg;
  const bands = directivity?.bandsDb;
  if (!Array.isArray(angles) || angles.length < 2) throw new AcousticsInputError(`${field}.anglesDeg`, "must list at least two angles");
  if (angles[0] !== 0 || angles[angles.length - 1] !== 180) {
    throw new AcousticsInputError(`${field}.anglesDeg`, "must run from 0 to 180");
  }
  for (let i = 1; i < angles.length; i++) {
    if (!(requireFinite(angles[i], `${field}.anglesDeg[${i}]`) > angles[i - 1])) {
      throw new AcousticsInputError(`${field}.anglesDeg`, "must rise strictly");
    }
  }
  if (!Array.isArray(bands) || bands.length !== BAND_COUNT) {
    throw new AcousticsInputError(`${field}.bandsDb`, `must hold ${BAND_COUNT} bands`);
  }
  const n = angles.length;
  const values = new Float64Array(BAND_COUNT * n);
  for (let b = 0; b < BAND_COUNT; b++) {
    const row = bands[b];
    if (!Array.isArray(row) || row.length !== n) throw new AcousticsInputError(`${field}.bandsDb[${b}]`, `must hold ${n} values`);
    for (let i = 0; i < n; i++) {
      const v = requireFinite(row[i], `${field}.bandsDb[${b}][${i}]`);
      if (v > 0) throw new AcousticsInputError(`${field}.bandsDb[${b}][${i}]`, "must not be above 0");
      if (v > row[0]) throw new AcousticsInputError(`${field}.bandsDb[${b}][${i}]`, "must not be above the 0° value");
      values[b * n + i] = v;
    }
  }
  return { angles: Float64Array.from(angles), values, n };
}

/** Writes the directivity (dB) of every band at angleDeg (0…180) into out (one slot per band). */
export function directivityInto(out: Float64Array, d: CompiledDirectivity, angleDeg: number): void {
  const n = d.n;
  let i = 0;
  while (i < n - 2 && angleDeg > d.angles[i + 1]) i++;
  const t = (angleDeg - d.angles[i]) / (d.angles[i + 1] - d.angles[i]);
  const v = d.values;
  // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
  for (let b = 0, k = i; b < out.length; b++, k += n) out[b] = v[k] + (v[k + 1] - v[k]) * t;
}

/**
 * Angle (degrees, 0…180) between a horizontal facing unit vector (fx, fy) and the 3-D direction
 * (dx, dy, dz) of length r; dz does not enter the dot product since the facing is horizontal.
 * Facing 0° is toward the front sideline (fx, fy) = (0, −1); 90° toward side 2, (1, 0).
 */
export function angleFromFacingDeg(fx: number, fy: number, dx: number, dy: number, r: number): number {
  const c = (fx * dx + fy * dy) / r;
  // Stryker disable next-line EqualityOperator: at exactly ±1 clamping gives the same ±1
  return Math.acos(c > 1 ? 1 : c < -1 ? -1 : c) * RAD_TO_DEG;
}

/** Directivity (dB) of an instrument in one band at an angle from its facing. */
export function directivityDb(spec: InstrumentSpec, bandIndex: number, angleDeg: number): number {
  const folded = ((requireFinite(angleDeg, "angleDeg") % 360) + 360) % 360;
  const out = new Float64Array(BAND_COUNT);
  // Stryker disable next-line EqualityOperator: at exactly 180°, 360 − 180 is 180
  directivityInto(out, compileDirectivity(spec.directivity, "directivity"), folded > 180 ? 360 - folded : folded);
  return out[bandIndex];
}
