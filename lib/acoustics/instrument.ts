// Source levels: an instrument's sound power per band at a written dynamic, and the change
// between dynamics (used by the balance plan).
import { BAND_COUNT } from "./bands";
import { AcousticsInputError, requireFinite } from "./errors";
import { DYNAMICS, type Dynamic, type InstrumentSpec } from "./types";

const MF_INDEX = DYNAMICS.indexOf("mf");

/** Position of a dynamic in pp…fff (pp = 0). */
export function dynamicIndex(dynamic: Dynamic): number {
  const i = DYNAMICS.indexOf(dynamic);
  if (i < 0) throw new AcousticsInputError("dynamic", `must be one of ${DYNAMICS.join(", ")}`);
  return i;
}

/** The dynamic `steps` steps louder (negative: softer), or null beyond pp…fff. */
export function shiftDynamic(dynamic: Dynamic, steps: number): Dynamic | null {
  const i = dynamicIndex(dynamic) + Math.trunc(steps);
  return i >= 0 && i < DYNAMICS.length ? DYNAMICS[i] : null;
}

/**
 * Writes Lw per band (dB re 1 pW) at a dynamic into out[offset..offset+7]: the mf spectrum shape
 * brightened by the dynamic's steps from mf, normalised so the bands sum to powerDb[dynamic].
 */
export function instrumentBandsInto(spec: InstrumentSpec, dynamic: Dynamic, out: Float64Array, offset = 0): void {
  const steps = dynamicIndex(dynamic) - MF_INDEX;
  let energy = 0;
  for (let b = 0; b < BAND_COUNT; b++) {
    const shape = spec.spectrumDb[b] + spec.brightnessDbPerStep[b] * steps;
    out[offset + b] = shape;
    energy += 10 ** (shape / 10);
  }
  const shift = spec.powerDb[dynamic] - 10 * Math.log10(energy);
  for (let b = 0; b < BAND_COUNT; b++) out[offset + b] += shift;
}

/** Sound power level Lw (dB re 1 pW) of an instrument in one octave band at a written dynamic. */
export function instrumentLevelDb(spec: InstrumentSpec, dynamic: Dynamic, bandIndex: number): number {
  if (!Number.isInteger(bandIndex) || bandIndex < 0 || bandIndex >= BAND_COUNT) {
    throw new AcousticsInputError("bandIndex", `must be an integer from 0 to ${BAND_COUNT - 1}`);
  }
  const out = new Float64Array(BAND_COUNT);
  instrumentBandsInto(spec, dynamic, out);
  return out[bandIndex];
}

/**
 * Level change (dB) of an instrument from one dynamic to another: overall Lw when bandIndex is
 * omitted, else in that band. Positive when `to` is louder.
 */
export function dynamicChangeDb(spec: InstrumentSpec, from: Dynamic, to: Dynamic, bandIndex?: number): number {
  if (bandIndex === undefined) return spec.powerDb[to] - spec.powerDb[from];
  return instrumentLevelDb(spec, to, bandIndex) - instrumentLevelDb(spec, from, bandIndex);
}

function requireBands(values: unknown, field: string): void {
  if (!Array.isArray(values) || values.length !== BAND_COUNT) throw new AcousticsInputError(field, `must hold ${BAND_COUNT} numbers`);
  values.forEach((v, b) => requireFinite(v, `${field}[${b}]`));
}

/** Throws unless an instrument spec is complete and its power rises with every dynamic step. */
export function validateInstrumentSpec(spec: InstrumentSpec, field: string): void {
  if (spec === null || typeof spec !== "object") throw new AcousticsInputError(field, "must be an instrument spec");
  if (spec.powerDb === null || typeof spec.powerDb !== "object") throw new AcousticsInputError(`${field}.powerDb`, "must be an object");
  for (let i = 0; i < DYNAMICS.length; i++) {
    const v = requireFinite(spec.powerDb[DYNAMICS[i]], `${field}.powerDb.${DYNAMICS[i]}`);
    if (i > 0 && !(v > spec.powerDb[DYNAMICS[i - 1]])) {
      throw new AcousticsInputError(`${field}.powerDb.${DYNAMICS[i]}`, `must be above powerDb.${DYNAMICS[i - 1]}`);
    }
  }
  requireBands(spec.spectrumDb, `${field}.spectrumDb`);
  requireBands(spec.brightnessDbPerStep, `${field}.brightnessDbPerStep`);
  requireFinite(spec.carryDb, `${field}.carryDb`);
  if (spec.uncertaintyDb !== undefined && !(requireFinite(spec.uncertaintyDb, `${field}.uncertaintyDb`) >= 0)) {
    throw new AcousticsInputError(`${field}.uncertaintyDb`, "must be 0 or more");
  }
  if (spec.fit !== undefined) {
    if (spec.fit === null || typeof spec.fit !== "object") throw new AcousticsInputError(`${field}.fit`, "must be an object");
    if (!(requireFinite(spec.fit.stdErrorDb, `${field}.fit.stdErrorDb`) >= 0)) throw new AcousticsInputError(`${field}.fit.stdErrorDb`, "must be 0 or more");
    if (!Number.isInteger(spec.fit.readings) || spec.fit.readings < 1) throw new AcousticsInputError(`${field}.fit.readings`, "must be a whole number of at least 1");
  }
}
