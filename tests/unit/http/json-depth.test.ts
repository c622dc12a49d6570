// The nesting check run before JSON.parse: it counts arrays and objects, never brackets inside strings.
// Depths are compared with JSON.parse's own reading of the same text (Node's built-in parser as the reference).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { nestsDeeper } from "@/lib/http/body";

/** Depth of a parsed value: 0 for a scalar, 1 for [] or {}. */
const depthOf = (v: unknown): number =>
  v !== null && typeof v === "object" ? 1 + Math.max(0, ...Object.values(v as Record<string, unknown>).map(depthOf)) : 0;

describe("nestsDeeper", () => {
  it("finds a 20,000-deep array without walking it recursively", () => {
    expect(nestsDeeper("[".repeat(20_000) + "]".repeat(20_000), 32)).toBe(true);
  });

  it("ignores brackets in strings, escaped quotes included", () => {
    expect(nestsDeeper(JSON.stringify({ a: "[[[[{{{{\\\"[[[[" }), 2)).toBe(false);
    expect(nestsDeeper(JSON.stringify(["\\", [[1]]]), 2)).toBe(true);
  });

  it("agrees with the depth of the value JSON.parse reads", () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 8 }), fc.integer({ min: 0, max: 9 }), (value, max) => {
        const text = JSON.stringify(value);
        expect(nestsDeeper(text, max)).toBe(depthOf(JSON.parse(text)) > max);
      }),
      { seed: 42, numRuns: 300 },
    );
  });
});
