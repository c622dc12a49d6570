// The reusable set evaluator: validates and precomputes everything that does not depend on
// positions once (source bands, absorption, A-weights, directivity and ground height terms),
// then evaluates the mix for any positions with an allocation-free loop over Float64Arrays.
// analyzeSet is built on it; transition sweeps move the positions and evaluate again.
import { absorptionDbPerKmUnchecked, speedOfSound } from "./atmosphere";
import { BAND_COUNT, OCTAVE_BANDS } from "./bands";
import { DEFAULT_INSTRUMENTS } from "./catalog";
import { angleFromFacingDeg, directivityInto, type CompiledDirectivity } from "./directivity";
import { AcousticsInputError } from "./errors";
import { GROUND_TERM_COUNT, groundBandsInto, regionTermsInto } from "./ground";
import { PATH_PIECES, pathGroundInto, regionGroundInto } from "./ground-regions";
import { instrumentTables, type InstrumentTables } from "./instrument-tables";
import { aWeightingDb } from "./weighting";
import { DEFAULT_SOURCE_HEIGHT_M, validateConditions, validateListeningPoints, validatePerformers } from "./validate";
import {
  DYNAMICS,
  VOICES,
  type Dynamic,
  type AnalysisInput,
  type AnalysisResult,
  type InstrumentCatalog,
  type LevelSummary,
  type PointResult,
  type Position,
  type Voice,
} from "./types";

// Module-local copies of imported bindings used in the hot loop: when the code runs as CommonJS
// (tsx, Node) every imported name is read through a getter, which costs more than the arithmetic.
const B = BAND_COUNT;
const V = VOICES.length;
const TERMS = GROUND_TERM_COUNT;
const directivityAt = directivityInto;
const angleOf = angleFromFacingDeg;
const groundAt = groundBandsInto;
const pathGround = pathGroundInto;
const regionGround = regionGroundInto;
const DYNAMIC_INDEX = Object.fromEntries(DYNAMICS.map((d, i) => [d, i])) as Record<Dynamic, number>;

/** Closer than this the point-source model does not hold; distances are clamped to it. */
export const MIN_DISTANCE_M = 0.5;

const DB_TO_LN = Math.LN10 / 10;
const DEG_TO_RAD = Math.PI / 180;
/** A-weighting of each band as an energy factor, at the exact centres. */
const A_WEIGHT_ENERGY = Float64Array.from(OCTAVE_BANDS, (b) => 10 ** (aWeightingDb(b.exactHz) / 10));

/** Levels of the last evaluation, in reusable typed arrays (overwritten by the next one). */
export interface MixBuffers {
  readonly sectionNames: readonly string[];
  /** A-weighted total per listening point (dBA; -Infinity when nothing sounds). */
  readonly totalDbA: Float64Array;
  /** dBA per point and voice: [point · VOICES.length + voice index], -Infinity for an absent voice. */
  readonly voiceDbA: Float64Array;
  /** dBA per point and section: [point · sectionNames.length + section index]. */
  readonly sectionDbA: Float64Array;
  /** Arrival spread per point (ms) between the nearest and farthest sounding performer. */
  readonly arrivalSpreadMs: Float64Array;
}

export interface SetEvaluator {
  readonly performerIds: readonly string[];
  /** Positions in performer order; write them directly (checked at evaluate) or use setPositions. */
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly facingDeg: Float64Array;
  readonly mix: MixBuffers;
  /** Index of a performer in the arrays, or -1. */
  indexOf(performerId: string): number;
  /** Moves the listed performers (others keep their place). */
  setPositions(positions: readonly Position[]): void;
  /** Recomputes the mix for the current positions; returns the (reused) buffers. */
  evaluate(): MixBuffers;
  /** The full result of the last evaluate(), as analyzeSet returns it. */
  result(): AnalysisResult;
}

/** Everything evaluate() reads: built once per set, one object shape for every evaluator. */
interface EvaluatorState {
  P: number;
  N: number;
  S: number;
  g: number | null;
  /** G of the ground between the field and the points, and of each point's surroundings (and how far they reach). */
  gBetween: number;
  gPoint: Float64Array;
  surroundingsM: Float64Array;
  pathCuts: Float64Array;
  pathG: Float64Array;
  regionG: Float64Array; // G_s, G_m, G_r of the current pair
  msPerM: number;
  alphaDbPerM: Float64Array;
  base: Float64Array; // Lw + carry + strength per performer and band
  z: Float64Array;
  srcTerms: Float64Array;
  rcvTerms: Float64Array;
  sectionOf: Int32Array;
  voiceOf: Int32Array; // -1 for tacet
  dirOf: CompiledDirectivity[];
  x: Float64Array;
  y: Float64Array;
  facingDeg: Float64Array;
  lx: Float64Array;
  ly: Float64Array;
  lz: Float64Array;
  perfDb: Float64Array; // per point, performer and band
  perfEA: Float64Array; // A-weighted energy per point and performer
  arrivalMs: Float64Array;
  sectionE: Float64Array;
  voiceE: Float64Array;
  totalE: Float64Array;
  fx: Float64Array;
  fy: Float64Array;
  dirDb: Float64Array;
  grDb: Float64Array;
  mix: MixBuffers;
}

/** Validates an analysis input and prepares an evaluator for it. */
export function createSetEvaluator(input: AnalysisInput): SetEvaluator {
  if (input === null || typeof input !== "object") throw new AcousticsInputError("input", "must be an object");
  const catalog: InstrumentCatalog = input.instruments ? { ...DEFAULT_INSTRUMENTS, ...input.instruments } : DEFAULT_INSTRUMENTS;
  const { performers, listeningPoints: points, conditions } = input;
  if (conditions === null || typeof conditions !== "object") throw new AcousticsInputError("conditions", "must be an object");
  validateConditions(conditions);
  validatePerformers(performers, (key) => Object.hasOwn(catalog, key));
  validateListeningPoints(points);

  const P = performers.length;
  const N = points.length;

  const tablesByKey = new Map<string, InstrumentTables>();
  const sectionIndex = new Map<string, number>();
  const sectionNames: string[] = [];
  const indexById = new Map<string, number>();
  const base = new Float64Array(P * B);
  const z = new Float64Array(P);
  const srcTerms = new Float64Array(P * GROUND_TERM_COUNT);
  const sectionOf = new Int32Array(P);
  const voiceOf = new Int32Array(P);
  // Stryker disable next-line ArrayDeclaration: the length only preallocates; every entry is set below
  const dirOf: CompiledDirectivity[] = new Array(P);
  const x = new Float64Array(P);
  const y = new Float64Array(P);
  const facingDeg = new Float64Array(P);

  for (let p = 0; p < P; p++) {
    const perf = performers[p];
    const spec = catalog[perf.instrument];
    let tables = tablesByKey.get(perf.instrument);
    // Stryker disable next-line ConditionalExpression: a cache; building the tables again gives the same tables
    if (!tables) {
      tables = instrumentTables(spec, `instruments.${perf.instrument}`);
      tablesByKey.set(perf.instrument, tables);
    }
    dirOf[p] = tables.directivity;
    const bandOffset = DYNAMIC_INDEX[perf.dynamic] * B;
    const offset = spec.carryDb + (perf.strengthDb ?? 0);
    // Stryker disable next-line EqualityOperator: one more band writes the next performer's first entry (set again on its turn) or past the end of the array (ignored)
    for (let b = 0; b < B; b++) base[p * B + b] = tables.bandsByDynamic[bandOffset + b] + offset;
    let s = sectionIndex.get(perf.section);
    if (s === undefined) {
      s = sectionNames.length;
      sectionIndex.set(perf.section, s);
      sectionNames.push(perf.section);
    }
    sectionOf[p] = s;
    voiceOf[p] = VOICES.indexOf(perf.voice as Voice); // tacet is not a voice: -1
    z[p] = perf.z ?? DEFAULT_SOURCE_HEIGHT_M;
    regionTermsInto(z[p], srcTerms, p * TERMS);
    x[p] = perf.x;
    y[p] = perf.y;
    facingDeg[p] = perf.facingDeg;
    indexById.set(perf.id, p);
  }

  const S = sectionNames.length;
  const gBetween = conditions.betweenGroundFactor ?? conditions.groundFactor ?? 0;
  const rcvTerms = new Float64Array(N * GROUND_TERM_COUNT);
  points.forEach((pt, i) => regionTermsInto(pt.z, rcvTerms, i * GROUND_TERM_COUNT));
  const st: EvaluatorState = {
    P,
    N,
    S,
    g: conditions.groundFactor,
    gBetween,
    gPoint: Float64Array.from(points, (pt) => pt.groundFactor ?? gBetween),
    surroundingsM: Float64Array.from(points, (pt) => pt.surroundingsM ?? 0),
    pathCuts: new Float64Array(PATH_PIECES + 1),
    pathG: new Float64Array(PATH_PIECES),
    regionG: new Float64Array(3),
    msPerM: 1000 / speedOfSound(conditions.temperatureC),
    alphaDbPerM: Float64Array.from(OCTAVE_BANDS, (b) => absorptionDbPerKmUnchecked(b.exactHz, conditions) / 1000),
    base,
    z,
    srcTerms,
    rcvTerms,
    sectionOf,
    voiceOf,
    dirOf,
    x,
    y,
    facingDeg,
    lx: Float64Array.from(points, (pt) => pt.x),
    ly: Float64Array.from(points, (pt) => pt.y),
    lz: Float64Array.from(points, (pt) => pt.z),
    perfDb: new Float64Array(N * P * B).fill(-Infinity), // tacet performers stay at -Infinity
    perfEA: new Float64Array(N * P),
    arrivalMs: new Float64Array(N * P),
    sectionE: new Float64Array(N * S * B),
    voiceE: new Float64Array(N * V * B),
    totalE: new Float64Array(N * B),
    fx: new Float64Array(P),
    fy: new Float64Array(P),
    dirDb: new Float64Array(B),
    grDb: new Float64Array(B),
    mix: {
      sectionNames,
      totalDbA: new Float64Array(N),
      voiceDbA: new Float64Array(N * V),
      sectionDbA: new Float64Array(N * S),
      arrivalSpreadMs: new Float64Array(N),
    },
  };

  function setPositions(positions: readonly Position[]): void {
    if (!Array.isArray(positions)) throw new AcousticsInputError("positions", "must be an array");
    positions.forEach((pos, i) => {
      const p = indexById.get(pos?.performerId);
      if (p === undefined) throw new AcousticsInputError(`positions[${i}].performerId`, `"${String(pos?.performerId)}" is not a performer of this set`);
      if (!Number.isFinite(pos.x)) throw new AcousticsInputError(`positions[${i}].x`, "must be a finite number");
      if (!Number.isFinite(pos.y)) throw new AcousticsInputError(`positions[${i}].y`, "must be a finite number");
      if (!Number.isFinite(pos.facingDeg)) throw new AcousticsInputError(`positions[${i}].facingDeg`, "must be a finite number");
      x[p] = pos.x;
      y[p] = pos.y;
      facingDeg[p] = pos.facingDeg;
    });
  }

  return {
    performerIds: performers.map((p) => p.id),
    x,
    y,
    facingDeg,
    mix: st.mix,
    indexOf: (id) => indexById.get(id) ?? -1,
    setPositions,
    evaluate: () => evaluateState(st),
    result: () => resultOf(st, performers, points),
  };
}

function weightedDb(energy: Float64Array, offset: number): number {
  let e = 0;
  for (let b = 0; b < B; b++) e += energy[offset + b] * A_WEIGHT_ENERGY[b];
  return 10 * Math.log10(e);
}

// A module-level function over one state shape (not a closure per evaluator), so the optimised
// code is shared by every evaluator instead of being specialised to, and thrown away for, one.
function evaluateState(st: EvaluatorState): MixBuffers {
  const { P, N, S, g, gBetween, gPoint, surroundingsM, pathCuts, pathG, regionG, msPerM, alphaDbPerM, base, z, srcTerms, rcvTerms, sectionOf, voiceOf, dirOf, x, y, facingDeg } = st;
  const { lx, ly, lz, perfDb, perfEA, arrivalMs, sectionE, voiceE, totalE, fx, fy, dirDb, grDb, mix } = st;
  for (let p = 0; p < P; p++) {
    if (!Number.isFinite(x[p]) || !Number.isFinite(y[p]) || !Number.isFinite(facingDeg[p])) {
      const field = !Number.isFinite(x[p]) ? "x" : !Number.isFinite(y[p]) ? "y" : "facingDeg";
      throw new AcousticsInputError(`positions[${p}].${field}`, "must be a finite number");
    }
    const a = facingDeg[p] * DEG_TO_RAD;
    fx[p] = Math.sin(a);
    fy[p] = -Math.cos(a);
  }
  sectionE.fill(0);
  voiceE.fill(0);
  totalE.fill(0);
  // Stryker disable next-line EqualityOperator: a pass for a point past the last reads and writes only outside the typed arrays (ignored)
  for (let n = 0; n < N; n++) {
    let minMs = Infinity;
    let maxMs = -Infinity;
    const rOff = n * TERMS;
    // One kind of ground everywhere: no need to follow each path over the ground.
    const uniform = g === null || (gBetween === g && gPoint[n] === g);
    for (let p = 0; p < P; p++) {
      const dx = lx[n] - x[p];
      const dy = ly[n] - y[p];
      const dz = lz[n] - z[p];
      const dp = Math.sqrt(dx * dx + dy * dy);
      let r = Math.sqrt(dp * dp + dz * dz);
      // Stryker disable next-line EqualityOperator: at exactly the minimum both give the minimum
      if (r < MIN_DISTANCE_M) r = MIN_DISTANCE_M;
      const ms = r * msPerM;
      arrivalMs[n * P + p] = ms;
      const v = voiceOf[p];
      if (v < 0) continue;
      if (ms < minMs) minMs = ms;
      if (ms > maxMs) maxMs = ms;
      directivityAt(dirDb, dirOf[p], angleOf(fx[p], fy[p], dx, dy, r));
      if (g !== null) {
        if (uniform) groundAt(grDb, g, g, g, srcTerms, p * TERMS, rcvTerms, rOff, z[p] + lz[n], dp);
        else {
          pathGround(pathCuts, pathG, x[p], y[p], lx[n], ly[n], dp, g, gBetween, gPoint[n], surroundingsM[n]);
          regionGround(regionG, 0, pathCuts, pathG, PATH_PIECES, z[p], lz[n], dp);
          groundAt(grDb, regionG[0], regionG[1], regionG[2], srcTerms, p * TERMS, rcvTerms, rOff, z[p] + lz[n], dp);
        }
      }
      const common = -(20 * Math.log10(r) + 11); // ISO 9613-2 eq. (7)
      const pOff = (n * P + p) * B;
      const sOff = (n * S + sectionOf[p]) * B;
      const vOff = (n * V + v) * B;
      const tOff = n * B;
      let eA = 0;
      for (let b = 0; b < B; b++) {
        const level = base[p * B + b] + dirDb[b] + common - alphaDbPerM[b] * r - grDb[b];
        perfDb[pOff + b] = level;
        const e = Math.exp(level * DB_TO_LN);
        eA += e * A_WEIGHT_ENERGY[b];
        sectionE[sOff + b] += e;
        voiceE[vOff + b] += e;
        totalE[tOff + b] += e;
      }
      perfEA[n * P + p] = eA;
    }
    // Stryker disable next-line EqualityOperator: with equal arrivals both give 0
    mix.arrivalSpreadMs[n] = maxMs >= minMs ? maxMs - minMs : 0;
    mix.totalDbA[n] = weightedDb(totalE, n * B);
    for (let v = 0; v < V; v++) mix.voiceDbA[n * V + v] = weightedDb(voiceE, (n * V + v) * B);
    for (let s = 0; s < S; s++) mix.sectionDbA[n * S + s] = weightedDb(sectionE, (n * S + s) * B);
  }
  return mix;
}

function bandsDbOf(energy: Float64Array, offset: number): number[] {
  // Stryker disable next-line ArrayDeclaration: the length only preallocates; every entry is set below
  const out = new Array<number>(B);
  for (let b = 0; b < B; b++) out[b] = 10 * Math.log10(energy[offset + b]);
  return out;
}

function resultOf(st: EvaluatorState, performers: AnalysisInput["performers"], points: AnalysisInput["listeningPoints"]): AnalysisResult {
  const { P, N, S, mix, perfDb, perfEA, arrivalMs, voiceE, sectionE } = st;
  const out: PointResult[] = [];
  for (let n = 0; n < N; n++) {
    const voices: Partial<Record<Voice, LevelSummary>> = {};
    for (let v = 0; v < V; v++) {
      const dbA = mix.voiceDbA[n * V + v];
      if (dbA > -Infinity) voices[VOICES[v]] = { dbA, bandsDb: bandsDbOf(voiceE, (n * V + v) * B) };
    }
    const sections: Record<string, LevelSummary> = {};
    for (let s = 0; s < S; s++) {
      sections[mix.sectionNames[s]] = { dbA: mix.sectionDbA[n * S + s], bandsDb: bandsDbOf(sectionE, (n * S + s) * B) };
    }
    // Stryker disable next-line ArrayDeclaration: the length only preallocates; every entry is set below
    const perfs = new Array<PointResult["performers"][number]>(P);
    for (let p = 0; p < P; p++) {
      const pOff = (n * P + p) * B;
      // Stryker disable next-line ArrayDeclaration: the length only preallocates; every entry is set below
      const bandsDb = new Array<number>(B);
      for (let b = 0; b < B; b++) bandsDb[b] = perfDb[pOff + b];
      // A tacet performer's energy stays 0: -Infinity dB.
      perfs[p] = { id: performers[p].id, dbA: 10 * Math.log10(perfEA[n * P + p]), bandsDb, arrivalMs: arrivalMs[n * P + p] };
    }
    out.push({
      listeningPointId: points[n].id,
      totalDbA: mix.totalDbA[n],
      voices,
      sections,
      performers: perfs,
      arrivalSpreadMs: mix.arrivalSpreadMs[n],
    });
  }
  return { points: out };
}
