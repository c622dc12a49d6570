import { defineConfig } from "vitest/config";
import path from "node:path";

// Three suites: pure units, database-backed (real PostgreSQL, serial), and browser
// (the built app in headless Chromium, serial). scripts/test.sh provides the services.
const alias = { "@": path.resolve(__dirname) };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      // Units compute the engine inside their tests (mutation runs need that), some for seconds on a busy
      // machine: a timeout is no speed check here (npm run bench is), so it is generous.
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node", testTimeout: 30_000 } },
      {
        resolve: { alias },
        test: {
          name: "db",
          include: ["tests/db/**/*.test.ts", "tests/api/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "browser",
          include: ["tests/browser/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
