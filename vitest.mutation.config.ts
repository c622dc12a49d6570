import { defineConfig } from "vitest/config";
import path from "node:path";

// The pure tests of the engine alone, for mutation runs (stryker.config.mjs): no database,
// no browser, no set-up script.
const alias = { "@": path.resolve(__dirname) };

export default defineConfig({
  resolve: { alias },
  test: { include: ["tests/unit/acoustics/**/*.test.ts", "tests/unit/music/**/*.test.ts"], environment: "node", setupFiles: ["tests/unit/mutation-setup.ts"] },
});
