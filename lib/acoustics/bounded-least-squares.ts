// A small bounded nonlinear least-squares solve: projected Levenberg–Marquardt with an active set.
// Variables at a bound whose gradient points outward are held; the rest take a damped
// Gauss–Newton step (mathjs solves the normal equations), clamped back into the box.
// The damping follows the gain ratio of each step (Nielsen's update, as in Madsen, Nielsen and
// Tingleff, "Methods for Non-Linear Least Squares Problems", 2nd ed., 2004, section 3.2; from memory),
// and the solve stops once a step gains less than FTOL of the cost: the plan rounds the result to
// whole dynamic steps, a dB or more apart, so closer convergence changes nothing it reports.
// The balance plan's Jacobian has a few non-zero entries a row (a target compares two groups),
// so it is given as sparse rows and the gradient and JᵀJ are summed over those entries only.
import { lusolve } from "mathjs";

/** The non-zero entries of one Jacobian row: J[i][cols[n]] = vals[n], each column listed once. */
export interface SparseRow {
  cols: number[];
  vals: number[];
}

export interface ResidualModel {
  /** Residuals r(x) and their Jacobian rows, J[i][j] = ∂r_i/∂x_j. */
  evaluate(x: readonly number[]): { r: number[]; J: SparseRow[] };
}

const EDGE = 1e-9;
/** Relative gain below which the solve has converged. */
const FTOL = 1e-6;

function clamp(x: readonly number[], lo: readonly number[], hi: readonly number[]): number[] {
  return x.map((v, i) => Math.min(hi[i]!, Math.max(lo[i]!, v)));
}

const sumSq = (r: readonly number[]) => r.reduce((s, v) => s + v * v, 0);

/** Gradient Jᵀr and Gauss–Newton matrix JᵀJ (n × n, row-major), from the non-zero entries of each row. */
function normalEquations(r: readonly number[], J: readonly SparseRow[], n: number) {
  const g = new Float64Array(n);
  const JtJ = new Float64Array(n * n);
  for (let i = 0; i < r.length; i++) {
    const { cols, vals } = J[i]!;
    for (let a = 0; a < cols.length; a++) {
      g[cols[a]!]! += vals[a]! * r[i]!;
      for (let b = 0; b < cols.length; b++) JtJ[cols[a]! * n + cols[b]!]! += vals[a]! * vals[b]!;
    }
  }
  return { g, JtJ };
}

/** −(2gᵀh + hᵀJᵀJh): how much |r|² falls for the step h if r were linear in x. */
function predictedDecrease(g: Float64Array, JtJ: Float64Array, h: readonly number[]): number {
  const n = h.length;
  let gh = 0;
  let hHh = 0;
  for (let a = 0; a < n; a++) {
    if (h[a] === 0) continue;
    gh += g[a]! * h[a]!;
    for (let b = 0; b < n; b++) hHh += h[a]! * JtJ[a * n + b]! * h[b]!;
  }
  return -(2 * gh + hHh);
}

/** Minimises |r(x)|² over lo ≤ x ≤ hi from x0; returns the best x found and its cost. */
export function boundedLeastSquares(
  model: ResidualModel,
  x0: readonly number[],
  lo: readonly number[],
  hi: readonly number[],
  maxIterations = 200,
): { x: number[]; cost: number; iterations: number } {
  const n = x0.length;
  let x = clamp(x0, lo, hi);
  let { r, J } = model.evaluate(x);
  let cost = sumSq(r);
  let normal = normalEquations(r, J, n);
  let mu = 1e-3;
  let nu = 2;
  let iterations = 0;
  for (; iterations < maxIterations && n > 0; iterations++) {
    const { g, JtJ } = normal;
    const free = [...Array(n).keys()].filter((j) => !((x[j]! <= lo[j]! + EDGE && g[j]! > 0) || (x[j]! >= hi[j]! - EDGE && g[j]! < 0)));
    if (free.length === 0 || Math.max(...free.map((j) => Math.abs(g[j]!))) < 1e-10) break;
    const H = free.map((a) => free.map((b) => {
      const s = JtJ[a * n + b]!;
      return a === b ? s + mu * (1 + s) : s;
    }));
    const step = (lusolve(H, free.map((j) => -g[j]!)) as number[][]).map((row) => row[0]!);
    const trial = [...x];
    free.forEach((j, k) => (trial[j] = x[j]! + step[k]!));
    const xNew = clamp(trial, lo, hi);
    const next = model.evaluate(xNew);
    const costNew = sumSq(next.r);
    // Gain ratio: the actual decrease over the one the linear model |r + J h|² predicts for the step taken.
    const predicted = predictedDecrease(g, JtJ, xNew.map((v, j) => v - x[j]!));
    const rho = predicted > 0 ? (cost - costNew) / predicted : -1;
    if (costNew < cost && rho > 0) {
      const gain = cost - costNew;
      x = xNew;
      ({ r, J } = next);
      cost = costNew;
      normal = normalEquations(r, J, n);
      mu = Math.max(mu * Math.max(1 / 3, 1 - (2 * rho - 1) ** 3), 1e-12);
      nu = 2;
      if (gain < FTOL * (1 + cost)) break;
    } else {
      mu *= nu;
      nu *= 2;
      if (mu > 1e10) break;
    }
  }
  return { x, cost, iterations };
}
