// Calibration from box readings: the change to each instrument's outdoor carry (carryDb) that
// best explains levels measured with a sound level meter at a listening point.
//
// carryDb is a plain dB offset on every band of an instrument, so a reading's prediction is
// L(δ) = 10·lg Σk Ek·10^(δk/10), Ek the weighted energy at the meter of the performers playing
// instrument k under the starting catalog: the model adds energies, one engine run per reading.
// The residual is taken in dB (a meter's error is a dB error); the fit is Levenberg–Marquardt on
// the offsets δ with Tikhonov regularisation λ·|δ|², so an instrument the readings say little
// about stays near 0. Only instruments sounding in some reading are parameters.
import { inv, lusolve } from "mathjs";
import { OCTAVE_BANDS } from "./bands";
import { DEFAULT_INSTRUMENTS } from "./catalog";
import { cWeightingDb } from "./c-weighting";
import { AcousticsInputError, requireFinite } from "./errors";
import { createSetEvaluator } from "./evaluator";
import type { AnalysisInput, InstrumentCatalog } from "./types";
import { aWeightingDb } from "./weighting";

/** One box reading: the set as played (tacet performers do not sound), the point, the level read. */
export interface BoxReading {
  input: Pick<AnalysisInput, "performers" | "listeningPoints" | "conditions">;
  listeningPointId: string;
  /** The meter's level, A-weighted (dBA); give this or measuredDbC. */
  measuredDbA?: number;
  /** The meter's level, C-weighted (dBC). */
  measuredDbC?: number;
}

export interface FitCarryOptions {
  readings: readonly BoxReading[];
  /** The catalog to start from (merged over DEFAULT_INSTRUMENTS); its carryDb are the zero point. */
  instruments?: InstrumentCatalog;
  /** Tikhonov weight λ toward 0 dB; (meter error / prior spread)² = (1 dB / 10 dB)² by default. */
  regularization?: number;
  /** Floor of the reading error used for standard errors (dB); 1 dB, about a class 2 meter (from memory). */
  meterUncertaintyDb?: number;
}

/** How well the readings pin one instrument's offset. */
export interface Determination {
  /** Readings in which the instrument sounds. */
  readings: number;
  /** Its mean share of the energy at the meter in those readings (0…1). */
  meanShare: number;
  /** Standard error of the offset (dB); near 1/√λ·σ (≈ 10 dB) when the readings say nothing. */
  stdErrorDb: number;
}

export interface CarryFit {
  /** Change to carryDb per instrument key; only instruments some reading involves. */
  offsetsDb: Record<string, number>;
  /** Predicted − measured after the fit, per reading (dB). */
  residualsDb: number[];
  /** Predicted level per reading with the starting catalog and after the fit (in each reading's weighting). */
  predictedBeforeDb: number[];
  predictedAfterDb: number[];
  determination: Record<string, Determination>;
  /** Pairs of instruments the readings cannot tell apart (always heard in the same proportion). */
  indistinguishable: [string, string][];
  /** Readings minus fitted offsets: with 0 or fewer the fit can match any readings and checks nothing. */
  degreesOfFreedom: number;
  /** Spread of the readings about the fit, √(Σ residual² / degrees of freedom) in dB; null with no degrees of freedom. */
  residualStdDb: number | null;
  iterations: number;
}

const LN10_10 = Math.LN10 / 10;
const A_WEIGHTS = OCTAVE_BANDS.map((b) => aWeightingDb(b.exactHz));
const C_WEIGHTS = OCTAVE_BANDS.map((b) => cWeightingDb(b.exactHz));
/** Columns of the sensitivity matrix this close to parallel (cosine) cannot be told apart. */
const PARALLEL_COSINE = 0.995;
const MAX_ITERATIONS = 200;

function measuredOf(r: BoxReading, i: number): { value: number; weights: number[] } {
  if (r === null || typeof r !== "object") throw new AcousticsInputError(`readings[${i}]`, "must be an object");
  const hasA = r.measuredDbA !== undefined;
  const hasC = r.measuredDbC !== undefined;
  if (hasA === hasC) throw new AcousticsInputError(`readings[${i}]`, "must give exactly one of measuredDbA, measuredDbC");
  return hasA
    ? { value: requireFinite(r.measuredDbA, `readings[${i}].measuredDbA`), weights: A_WEIGHTS }
    : { value: requireFinite(r.measuredDbC, `readings[${i}].measuredDbC`), weights: C_WEIGHTS };
}

/** Weighted energy at the meter per instrument key, for one reading under a catalog. */
function energiesByInstrument(r: BoxReading, i: number, catalog: InstrumentCatalog, weights: number[]): Map<string, number> {
  if (r.input === null || typeof r.input !== "object") {
    throw new AcousticsInputError(`readings[${i}].input`, "must be an object");
  }
  const point = Array.isArray(r.input.listeningPoints) ? r.input.listeningPoints.find((p) => p?.id === r.listeningPointId) : undefined;
  if (!point) throw new AcousticsInputError(`readings[${i}].listeningPointId`, "is not a listening point of the reading's input");
  const evaluator = createSetEvaluator({ ...r.input, listeningPoints: [point], instruments: catalog });
  evaluator.evaluate();
  const out = new Map<string, number>();
  evaluator.result().points[0]!.performers.forEach((perf, p) => {
    let e = 0;
    for (let b = 0; b < weights.length; b++) e += Math.exp((perf.bandsDb[b]! + weights[b]!) * LN10_10);
    if (e > 0) {
      const key = r.input.performers[p]!.instrument;
      out.set(key, (out.get(key) ?? 0) + e);
    }
  });
  if (out.size === 0) throw new AcousticsInputError(`readings[${i}].input.performers`, "no performer sounds in this reading");
  return out;
}

/**
 * The change to each instrument's carryDb that best explains the box readings (least squares on
 * dB residuals of energetic sums, Levenberg–Marquardt, Tikhonov toward 0), with the residuals,
 * how well each offset is determined, and the pairs of instruments the readings cannot separate.
 * Instruments no reading involves get no offset.
 */
export function fitCarryOffsets(options: FitCarryOptions): CarryFit {
  const { readings } = options;
  if (!Array.isArray(readings) || readings.length === 0) throw new AcousticsInputError("readings", "must be a non-empty array");
  const lambda = requireFinite(options.regularization ?? 0.01, "regularization");
  if (lambda <= 0) throw new AcousticsInputError("regularization", "must be above 0");
  const floorDb = requireFinite(options.meterUncertaintyDb ?? 1, "meterUncertaintyDb");
  const catalog: InstrumentCatalog = { ...DEFAULT_INSTRUMENTS, ...(options.instruments ?? {}) };

  const measured: number[] = [];
  const perReading = readings.map((r, i) => {
    const m = measuredOf(r, i);
    measured.push(m.value);
    return energiesByInstrument(r, i, catalog, m.weights);
  });
  const keys = [...new Set(perReading.flatMap((m) => [...m.keys()]))].sort();
  const R = readings.length;
  const K = keys.length;
  const energy = perReading.map((m) => keys.map((k) => m.get(k) ?? 0));

  // Prediction and Jacobian: ∂L/∂δk is instrument k's share of the energy at the meter.
  function evaluateAt(delta: number[]) {
    // Stryker disable next-line ArrayDeclaration: every entry is written, in order, below: an empty array ends the same
    const pred = new Array<number>(R);
    const jac = energy.map((row) => {
      const parts = row.map((e, k) => e * Math.exp(delta[k]! * LN10_10));
      const total = parts.reduce((a, b) => a + b, 0);
      return parts.map((p) => p / total);
    });
    energy.forEach((row, r) => {
      let total = 0;
      row.forEach((e, k) => (total += e * Math.exp(delta[k]! * LN10_10)));
      pred[r] = 10 * Math.log10(total);
    });
    const res = pred.map((p, r) => p - measured[r]!);
    const cost = res.reduce((a, x) => a + x * x, 0) + lambda * delta.reduce((a, x) => a + x * x, 0);
    return { pred, jac, res, cost };
  }
  function normalMatrix(jac: number[][]): number[][] {
    return keys.map((_, a) => keys.map((_, b) => jac.reduce((s, row) => s + row[a]! * row[b]!, 0) + (a === b ? lambda : 0)));
  }

  let delta = new Array<number>(K).fill(0);
  const before = evaluateAt(delta);
  let current = before;
  let mu = 1e-3;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    const A = normalMatrix(current.jac);
    const g = keys.map((_, a) => current.jac.reduce((s, row, r) => s + row[a]! * current.res[r]!, 0) + lambda * delta[a]!);
    const damped = A.map((row, a) => row.map((v, b) => (a === b ? v * (1 + mu) : v)));
    const step = (lusolve(damped, g.map((v) => -v)) as number[][]).map((row) => row[0]!);
    const trial = delta.map((d, k) => d + step[k]!);
    const next = evaluateAt(trial);
    if (next.cost <= current.cost) {
      delta = trial;
      current = next;
      mu = Math.max(mu / 3, 1e-12);
      if (Math.max(...step.map(Math.abs)) < 1e-9) break;
    } else {
      mu *= 4;
      if (mu > 1e12) break;
    }
  }

  const ssr = current.res.reduce((a, x) => a + x * x, 0);
  // The residual spread says how well the model fits only when there are more readings than
  // offsets; otherwise the standard errors rest on the meter floor alone.
  const residualStdDb = R > K ? Math.sqrt(ssr / (R - K)) : null;
  const sigma = Math.max(residualStdDb ?? 0, floorDb);
  const covariance = inv(normalMatrix(current.jac)) as number[][];
  const determination: Record<string, Determination> = {};
  const offsetsDb: Record<string, number> = {};
  keys.forEach((key, k) => {
    const shares = current.jac.map((row) => row[k]!).filter((_, r) => energy[r]![k]! > 0);
    offsetsDb[key] = delta[k]!;
    determination[key] = {
      readings: shares.length,
      meanShare: shares.reduce((a, s) => a + s, 0) / shares.length,
      stdErrorDb: sigma * Math.sqrt(covariance[k]![k]!),
    };
  });

  const indistinguishable: [string, string][] = [];
  const column = (k: number) => current.jac.map((row) => row[k]!);
  const norm = (v: number[]) => Math.sqrt(v.reduce((a, x) => a + x * x, 0));
  for (let a = 0; a < K; a++) {
    for (let b = a + 1; b < K; b++) {
      const ca = column(a);
      const cb = column(b);
      const cosine = ca.reduce((s, x, r) => s + x * cb[r]!, 0) / (norm(ca) * norm(cb));
      if (cosine >= PARALLEL_COSINE) indistinguishable.push([keys[a]!, keys[b]!]);
    }
  }

  return {
    offsetsDb,
    residualsDb: current.res,
    predictedBeforeDb: before.pred,
    predictedAfterDb: current.pred,
    determination,
    indistinguishable,
    degreesOfFreedom: R - K,
    residualStdDb,
    iterations,
  };
}

/** A copy of the catalog with the offsets added to each instrument's carryDb; others untouched. */
export function applyCarryOffsets(catalog: InstrumentCatalog, offsetsDb: Record<string, number>): InstrumentCatalog {
  const out: InstrumentCatalog = { ...catalog };
  for (const [key, offset] of Object.entries(offsetsDb)) {
    const spec = Object.hasOwn(catalog, key) ? catalog[key] : undefined;
    if (!spec) throw new AcousticsInputError(`offsetsDb.${key}`, "is not in the instrument catalog");
    out[key] = { ...spec, carryDb: spec.carryDb + requireFinite(offset, `offsetsDb.${key}`) };
  }
  return out;
}
