import { defineConfig } from "vitest/config";
import path from "node:path";

// The pure tests of the engine alone, for mutation runs (stryker.config.mjs): no database,
// no browser, no set-up script. plan-optimum.test.ts (1,000 exhaustive searches, about 11 s) is
// left out: every mutant of the evaluator is covered by it, so it alone would make a run take days
// on this machine; plan-search.ts keeps its other tests. Files that compute while vitest collects
// them (outside any test) make every mutant they reach "static", rerun against all tests: the
// balance plan's and the loudness-at-a-point tests still do (they are being reworked elsewhere),
// so they stay out of mutation runs until they compute inside their tests. isolate: false keeps
// the modules loaded between the runs of one mutant's tests (about 8× faster here).
const PENDING = ["plan-optimum", "plan", "plan-limits", "point-loudness", "audibility", "audibility-band"].map((f) => `tests/unit/acoustics/${f}.test.ts`);
const alias = { "@": path.resolve(__dirname) };

export default defineConfig({
  resolve: { alias },
  test: { include: ["tests/unit/acoustics/**/*.test.ts", "tests/unit/music/**/*.test.ts"], exclude: PENDING, environment: "node", isolate: false, setupFiles: ["tests/unit/mutation-setup.ts"] },
});
