// Benchmark of one ISO 532-1 loudness evaluation (run: npx tsx bench/loudness.ts).
// Prints a readable figure, then as its last line one JSON object:
//   loudnessMs  median time of one loudnessIso532_1 call on 28 third-octave levels (input checks included)
import { loudnessIso532_1 } from "../lib/acoustics";

// A band-like spectrum that changes a little each call, so nothing is constant-folded.
const levels = Float64Array.from({ length: 28 }, (_, i) => 70 - Math.abs(i - 16) * 2.5);
let sink = 0;
const one = (k: number) => {
  levels[16] = 70 + (k & 7);
  sink += loudnessIso532_1(levels).sone;
};

const BATCH = 1000;
for (let k = 0; k < 50 * BATCH; k++) one(k); // warm up the JIT
const samples: number[] = [];
for (let s = 0; s < 51; s++) {
  const t0 = performance.now();
  for (let k = 0; k < BATCH; k++) one(k);
  samples.push((performance.now() - t0) / BATCH);
}
samples.sort((a, b) => a - b);
const loudnessMs = samples[samples.length >> 1];
console.log(`ISO 532-1 loudness, one evaluation (28 bands): median ${(loudnessMs * 1000).toFixed(2)} µs${Number.isFinite(sink) ? "" : " (sink)"}`);
console.log(JSON.stringify({ loudnessMs: Math.round(loudnessMs * 1e6) / 1e6 }));
