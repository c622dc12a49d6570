import { defineConfig } from "vitest/config";
import path from "node:path";

// The pure tests of the engine alone, for mutation runs (stryker.config.mjs): no database,
// no browser, no set-up script. plan-optimum.test.ts runs 80 of its 1,000 exhaustive searches here
// (tests/unit/mutation-setup.ts, about 1 s): every mutant of the evaluator is covered by it, and all
// 1,000 would make a run take days on this machine. Every file computes inside its tests (`lazy` in tests/unit/acoustics/helpers.ts): work done while
// vitest collects a file makes every mutant it reaches "static", rerun against all tests.
// isolate: false keeps the modules loaded between the runs of one mutant's tests (about 8× faster here).
const alias = { "@": path.resolve(__dirname) };

export default defineConfig({
  resolve: { alias },
  test: { include: ["tests/unit/acoustics/**/*.test.ts", "tests/unit/music/**/*.test.ts"], environment: "node", isolate: false, setupFiles: ["tests/unit/mutation-setup.ts"] },
});
