// A small bounded nonlinear least-squares solve: projected Levenberg–Marquardt with an active set.
// Variables at a bound whose gradient points outward are held; the rest take a damped
// Gauss–Newton step (mathjs solves the normal equations), clamped back into the box.
// The balance plan's Jacobian has a few non-zero entries a row (a target compares two groups),
// so the gradient and JᵀJ are summed over those entries only.
import { lusolve } from "mathjs";

export interface ResidualModel {
  /** Residuals r(x) and their Jacobian J[i][j] = ∂r_i/∂x_j. */
  evaluate(x: readonly number[]): { r: number[]; J: number[][] };
}

const EDGE = 1e-9;

function clamp(x: readonly number[], lo: readonly number[], hi: readonly number[]): number[] {
  return x.map((v, i) => Math.min(hi[i]!, Math.max(lo[i]!, v)));
}

const sumSq = (r: readonly number[]) => r.reduce((s, v) => s + v * v, 0);

/** Gradient Jᵀr and Gauss–Newton matrix JᵀJ (n × n, row-major), from the non-zero entries of each row. */
function normalEquations(r: readonly number[], J: readonly (readonly number[])[], n: number) {
  const g = new Float64Array(n);
  const JtJ = new Float64Array(n * n);
  const cols: number[] = [];
  for (let i = 0; i < r.length; i++) {
    const row = J[i]!;
    cols.length = 0;
    for (let j = 0; j < n; j++) if (row[j] !== 0) cols.push(j);
    for (const a of cols) {
      g[a]! += row[a]! * r[i]!;
      for (const b of cols) JtJ[a * n + b]! += row[a]! * row[b]!;
    }
  }
  return { g, JtJ };
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
  let mu = 1e-3;
  let iterations = 0;
  for (; iterations < maxIterations && n > 0; iterations++) {
    const { g, JtJ } = normalEquations(r, J, n);
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
    if (costNew < cost) {
      const gain = cost - costNew;
      x = xNew;
      ({ r, J } = next);
      cost = costNew;
      mu = Math.max(mu / 3, 1e-12);
      if (gain < 1e-12 * (1 + cost)) break;
    } else {
      mu *= 4;
      if (mu > 1e10) break;
    }
  }
  return { x, cost, iterations };
}
