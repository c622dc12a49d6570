// Mutation testing of the pure engine (npm run mutation; not part of npm test: it is slow).
// Stryker changes one operator or constant at a time in lib/acoustics and lib/music and runs the
// unit tests that cover it; a mutant that no test notices "survives". Scope a run while working:
// npm run mutation -- --mutate lib/acoustics/ground.ts
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
const config = {
  testRunner: "vitest",
  vitest: { configFile: "vitest.mutation.config.ts" },
  plugins: ["@stryker-mutator/vitest-runner"],
  mutate: ["lib/acoustics/**/*.ts", "lib/music/**/*.ts"],
  // Kept out of the sandbox copy: build output, databases and test clusters (their sockets cannot be copied).
  ignorePatterns: ["/.tmp", "/.next", "/.data", "/tests/api", "/tests/db", "/tests/browser", "/public"],
  coverageAnalysis: "perTest",
  // The machine is shared (2 cores, several sessions): one test process.
  concurrency: 1,
  reporters: ["clear-text", "progress", "json"],
  jsonReporter: { fileName: ".tmp/mutation/report.json" },
  tempDirName: ".tmp/stryker",
  cleanTempDir: "always",
  // Incremental: a rerun tests only the mutants whose code or covering tests changed since the
  // last run (the file lives under .tmp, per worktree).
  incremental: true,
  incrementalFile: ".tmp/mutation/incremental.json",
  timeoutMS: 20000,
  // The first full run of the unit tests takes minutes on a busy machine.
  dryRunTimeoutMinutes: 30,
};

export default config;
