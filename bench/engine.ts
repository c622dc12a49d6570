// Benchmark of the acoustic engine on a generated band (run: npx tsx bench/engine.ts).
// Prints readable figures, then as its last line one JSON object:
//   setAnalysisMs  median analyzeSet, 300 performers × 8 bands × 3 listening points (with ISO 532-1 loudness
//                  and audibility per voice; the box with a stadium background)
//   showSweepMs    100 sets × 16 counts of the same band (an evaluator per set, every count evaluated)
//   kernelRatio    the evaluator's time over a bare Float64Array loop doing the same arithmetic
//   confidenceMs   median checkConfidence of that set at the box (each sounding instrument one uncertainty
//                  louder and softer, every check rerun), the largest part of a stored analysis
import { BAND_COUNT, OCTAVE_BANDS } from "../lib/acoustics/bands";
import { absorptionDbPerKmUnchecked, speedOfSound } from "../lib/acoustics/atmosphere";
import { DEFAULT_INSTRUMENTS } from "../lib/acoustics/catalog";
import { compileDirectivity } from "../lib/acoustics/directivity";
import { GROUND_TERM_COUNT, regionTermsInto } from "../lib/acoustics/ground";
import { instrumentBandsInto } from "../lib/acoustics/instrument";
import { aWeightingDb } from "../lib/acoustics/weighting";
import { checkConfidence } from "../lib/acoustics/confidence";
import { analyzeSet, checkBalance, createSetEvaluator, positionsBetweenInto, DYNAMICS, VOICES, type AnalysisInput, type PerformerInput } from "../lib/acoustics";

const PERFORMERS = 300;
const SETS = 100;
const COUNTS = 16;

// Deterministic generator (mulberry32) so every run measures the same band.
let seed = 20260901;
function rand(): number {
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}
const pick = <T>(list: readonly T[]): T => list[Math.floor(rand() * list.length)];

const keys = Object.keys(DEFAULT_INSTRUMENTS);
const roster = Array.from({ length: PERFORMERS }, (_, i) => {
  const instrument = keys[i % keys.length];
  return { id: `P${i}`, instrument, section: instrument, voice: rand() < 0.1 ? ("tacet" as const) : pick(VOICES), dynamic: pick(DYNAMICS), z: 1.5, strengthDb: Math.round(rand() * 12 - 6) };
});
const sets = Array.from({ length: SETS + 1 }, () => ({
  x: Float64Array.from(roster, () => rand() * 100 - 50),
  y: Float64Array.from(roster, () => rand() * 48),
  facingDeg: Float64Array.from(roster, () => rand() * 360),
}));
const setInput = (s: number): AnalysisInput => ({
  performers: roster.map((p, i): PerformerInput => ({ ...p, x: sets[s].x[i], y: sets[s].y[i], facingDeg: sets[s].facingDeg[i] })),
  listeningPoints: [
    { id: "box", x: 0, y: -25, z: 18, background: { preset: "stadium-between-bands" } },
    { id: "judge", x: 15, y: 10, z: 1.6 },
    { id: "front-row", x: -20, y: -8, z: 3 },
  ],
  conditions: { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325, groundFactor: 1 },
});

function median(samples: number[]): number {
  const s = [...samples].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}
/** Median time (ms) of one call, from `samples` batches of `batch` calls. */
function time(fn: () => void, samples: number, batch: number): number {
  // Warm up for at least 300 ms, so the JIT has optimised the hot paths as in a long-running server.
  const warmUntil = performance.now() + 300;
  for (let i = 0; i < batch * 5 || performance.now() < warmUntil; i++) fn();
  const out: number[] = [];
  for (let s = 0; s < samples; s++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) fn();
    out.push((performance.now() - t0) / batch);
  }
  return median(out);
}

// 1. analyzeSet, from plain input (validation and precomputation included).
const input0 = setInput(0);
let sink = 0;
const setAnalysisMs = time(() => (sink += analyzeSet(input0).points[0].totalDbA), 101, 5);

// 1b. How sure the box's checks are (lib/acoustics/confidence.ts), given the set's analysis and checks.
const boxInput = { ...input0, listeningPoints: [input0.listeningPoints[0]] };
const boxPoint = analyzeSet(boxInput).points[0];
const boxChecks = checkBalance(boxInput, boxPoint);
const confidenceMs = time(() => (sink += checkConfidence(boxInput, "box", null, { point: boxPoint, checks: boxChecks }).length), 21, 1);

// 2. The show sweep: an evaluator per set, positions moved count by count.
const inputs = Array.from({ length: SETS }, (_, s) => setInput(s));
function sweep(): void {
  for (let s = 0; s < SETS; s++) {
    const ev = createSetEvaluator(inputs[s]);
    for (let c = 1; c <= COUNTS; c++) {
      positionsBetweenInto(sets[s], sets[s + 1], c / COUNTS, ev);
      sink += ev.evaluate().totalDbA[0];
    }
  }
}
const showSweepMs = time(sweep, 7, 1);

// 3. The kernel: the evaluator's evaluate() against the same arithmetic written as one bare loop.
const ev = createSetEvaluator(input0);
let evaluateMs = 0; // measured with the bare loop below

const P = PERFORMERS;
const B = BAND_COUNT;
const pts = input0.listeningPoints;
const N = pts.length;
const cond = input0.conditions;
const g = cond.groundFactor as number;
const base = new Float64Array(P * B);
const tacet = new Uint8Array(P);
const NA = 5;
const dirAngles = new Float64Array(P * NA);
const dirValues = new Float64Array(P * B * NA);
const src = new Float64Array(P * GROUND_TERM_COUNT);
const rcv = new Float64Array(N * GROUND_TERM_COUNT);
const alpha = Float64Array.from(OCTAVE_BANDS, (b) => absorptionDbPerKmUnchecked(b.exactHz, cond) / 1000);
const wA = Float64Array.from(OCTAVE_BANDS, (b) => 10 ** (aWeightingDb(b.exactHz) / 10));
const msPerM = 1000 / speedOfSound(cond.temperatureC);
const px = sets[0].x, py = sets[0].y, pf = sets[0].facingDeg;
const pz = new Float64Array(P).fill(1.5);
roster.forEach((p, i) => {
  const spec = DEFAULT_INSTRUMENTS[p.instrument];
  const bands = new Float64Array(B);
  instrumentBandsInto(spec, p.dynamic, bands);
  for (let b = 0; b < B; b++) base[i * B + b] = bands[b] + spec.carryDb + p.strengthDb;
  tacet[i] = p.voice === "tacet" ? 1 : 0;
  const d = compileDirectivity(spec.directivity, "bench");
  dirAngles.set(d.angles, i * NA);
  dirValues.set(d.values, i * B * NA);
  regionTermsInto(1.5, src, i * GROUND_TERM_COUNT);
});
pts.forEach((pt, n) => regionTermsInto(pt.z, rcv, n * GROUND_TERM_COUNT));
const out = new Float64Array(N * P * B);
const arrival = new Float64Array(N * P);
const perfEA = new Float64Array(N * P);
const totalE = new Float64Array(N * B);
const totalDbA = new Float64Array(N);
const fx = new Float64Array(P);
const fy = new Float64Array(P);
const sectionOf = Int32Array.from(roster, (p) => keys.indexOf(p.instrument));
const voiceOf = Int32Array.from(roster, (p) => (p.voice === "tacet" ? -1 : VOICES.indexOf(p.voice)));
const S = keys.length;
const V = VOICES.length;
const secE = new Float64Array(N * S * B);
const voiceE = new Float64Array(N * V * B);
const secDbA = new Float64Array(N * S);
const voiceDbA = new Float64Array(N * V);
const spread = new Float64Array(N);
const gr = new Float64Array(B);
const dir = new Float64Array(B);
function bareKernel(): void {
  for (let p = 0; p < P; p++) {
    const a = (pf[p] * Math.PI) / 180;
    fx[p] = Math.sin(a);
    fy[p] = -Math.cos(a);
  }
  secE.fill(0);
  voiceE.fill(0);
  totalE.fill(0);
  for (let n = 0; n < N; n++) {
    let lo = Infinity, hi = -Infinity;
    for (let p = 0; p < P; p++) {
      const dx = pts[n].x - px[p], dy = pts[n].y - py[p], dz = pts[n].z - pz[p];
      const dp = Math.sqrt(dx * dx + dy * dy);
      let r = Math.sqrt(dp * dp + dz * dz);
      if (r < 0.5) r = 0.5;
      const ms = r * msPerM;
      arrival[n * P + p] = ms;
      if (tacet[p]) continue;
      if (ms < lo) lo = ms;
      if (ms > hi) hi = ms;
      let c = (fx[p] * dx + fy[p] * dy) / r;
      c = c > 1 ? 1 : c < -1 ? -1 : c;
      const ang = (Math.acos(c) * 180) / Math.PI;
      let i = 0;
      const ao = p * NA;
      while (i < NA - 2 && ang > dirAngles[ao + i + 1]) i++;
      const t = (ang - dirAngles[ao + i]) / (dirAngles[ao + i + 1] - dirAngles[ao + i]);
      for (let b = 0, k = p * B * NA + i; b < B; b++, k += NA) dir[b] = dirValues[k] + (dirValues[k + 1] - dirValues[k]) * t;
      const e1 = 1 - Math.exp(-dp / 50), e2 = 1 - Math.exp(-2.8e-6 * dp * dp);
      const hsum = pz[p] + pts[n].z;
      const q = dp <= 30 * hsum ? 0 : 1 - (30 * hsum) / dp;
      const mid = -3 * q * (1 - g);
      const so = p * GROUND_TERM_COUNT, ro = n * GROUND_TERM_COUNT;
      gr[0] = -3 - 3 * q;
      gr[1] = -3 + g * (3 + (src[so] + rcv[ro]) * e1 + (src[so + 1] + rcv[ro + 1]) * e2) + mid;
      gr[2] = -3 + g * (3 + (src[so + 2] + rcv[ro + 2]) * e1) + mid;
      gr[3] = -3 + g * (3 + (src[so + 3] + rcv[ro + 3]) * e1) + mid;
      gr[4] = -3 + g * (3 + (src[so + 4] + rcv[ro + 4]) * e1) + mid;
      gr[5] = gr[6] = gr[7] = -3 * (1 - g) + mid;
      const common = -(20 * Math.log10(r) + 11);
      const po = (n * P + p) * B, sOff = (n * S + sectionOf[p]) * B, vOff = (n * V + voiceOf[p]) * B;
      let eA = 0;
      for (let b = 0; b < B; b++) {
        const l = base[p * B + b] + dir[b] + common - alpha[b] * r - gr[b];
        out[po + b] = l;
        const e = Math.exp(l * (Math.LN10 / 10));
        eA += e * wA[b];
        secE[sOff + b] += e;
        voiceE[vOff + b] += e;
        totalE[n * B + b] += e;
      }
      perfEA[n * P + p] = eA;
    }
    spread[n] = hi >= lo ? hi - lo : 0;
    const w = (arr: Float64Array, o: number) => {
      let e = 0;
      for (let b = 0; b < B; b++) e += arr[o + b] * wA[b];
      return 10 * Math.log10(e);
    };
    totalDbA[n] = w(totalE, n * B);
    for (let v = 0; v < V; v++) voiceDbA[n * V + v] = w(voiceE, (n * V + v) * B);
    for (let s = 0; s < S; s++) secDbA[n * S + s] = w(secE, (n * S + s) * B);
  }
}
// Engine and bare loop timed in alternating batches, so a change of machine load hits both.
const kernelMs = (() => {
  const engine: number[] = [];
  const bare: number[] = [];
  for (let i = 0; i < 50; i++) {
    ev.evaluate();
    bareKernel();
  }
  for (let s = 0; s < 201; s++) {
    let t0 = performance.now();
    for (let i = 0; i < 10; i++) sink += ev.evaluate().totalDbA[0];
    engine.push((performance.now() - t0) / 10);
    t0 = performance.now();
    for (let i = 0; i < 10; i++) {
      bareKernel();
      sink += totalDbA[0];
    }
    bare.push((performance.now() - t0) / 10);
  }
  evaluateMs = median(engine);
  return median(bare);
})();
const kernelRatio = evaluateMs / kernelMs;

// The two must compute the same thing, or the ratio means nothing.
ev.evaluate();
bareKernel();
const agreeDb = Math.max(...Array.from(totalDbA, (v, n) => Math.abs(v - ev.mix.totalDbA[n])));
if (!(agreeDb < 1e-9)) throw new Error(`bare kernel and engine disagree by ${agreeDb} dB`);

const round = (v: number, d = 4) => Math.round(v * 10 ** d) / 10 ** d;
console.log(`Acoustic engine benchmark: ${PERFORMERS} performers, ${BAND_COUNT} bands, ${N} listening points (Node ${process.version})`);
console.log(`  analyzeSet (validate, precompute, evaluate, build result, loudness): median ${round(setAnalysisMs, 3)} ms   target < 1 ms`);
console.log(`  checkConfidence at the box (every sounding instrument ± its uncertainty): median ${round(confidenceMs, 2)} ms`);
console.log(`  show sweep, ${SETS} sets × ${COUNTS} counts (${SETS * COUNTS} evaluations):   ${round(showSweepMs, 1)} ms   target < 500 ms`);
console.log(`  evaluate() alone: median ${round(evaluateMs, 4)} ms; bare Float64Array loop: ${round(kernelMs, 4)} ms`);
console.log(`  kernel ratio (engine / bare loop): ${round(kernelRatio, 3)}   target < 1.5   (totals agree within ${agreeDb.toExponential(1)} dB)`);
if (!Number.isFinite(sink)) console.log("  (sink)");
console.log(
  JSON.stringify({
    setAnalysisMs: round(setAnalysisMs),
    confidenceMs: round(confidenceMs, 2),
    showSweepMs: round(showSweepMs, 2),
    kernelRatio: round(kernelRatio, 3),
    evaluateMs: round(evaluateMs),
    kernelMs: round(kernelMs),
    performers: PERFORMERS,
    bands: BAND_COUNT,
    listeningPoints: N,
    sets: SETS,
    counts: COUNTS,
  }),
);
