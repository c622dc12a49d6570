// Where each instrument's numbers come from, as the catalog says it: an adopted fit first, then a
// source that gives its own uncertainty, else from memory (README "How sure").
import { describe, expect, it } from "vitest";
import { catalogProvenance, instrumentProvenance, MEMORY_UNCERTAINTY_DB } from "@/lib/acoustics/provenance";
import { handSource } from "./helpers";

const sourced = { ...handSource([80, 80, 80, 80, 80, 80, 80, 80]), source: "a handbook table", uncertaintyDb: 2.5 };
const remembered = { ...handSource([80, 80, 80, 80, 80, 80, 80, 80]), source: "from memory" };

describe("instrument provenance", () => {
  it("names a source with the uncertainty it gives, and says from memory with the memory uncertainty otherwise", () => {
    expect(instrumentProvenance(sourced)).toEqual({ kind: "source", text: "a handbook table", uncertaintyDb: 2.5 });
    expect(instrumentProvenance(remembered)).toEqual({ kind: "memory", text: "from memory", uncertaintyDb: MEMORY_UNCERTAINTY_DB });
  });

  it("puts an adopted fit first, counting its readings in words", () => {
    expect(instrumentProvenance({ ...sourced, fit: { stdErrorDb: 1.2, readings: 1 } })).toEqual({ kind: "fitted", text: "fitted from 1 box reading", uncertaintyDb: 1.2 });
    expect(instrumentProvenance({ ...remembered, fit: { stdErrorDb: 0.8, readings: 4 } }).text).toBe("fitted from 4 box readings");
  });

  it("gives every instrument of a catalog its own, by key", () => {
    const all = catalogProvenance({ horn: sourced, drum: remembered });
    expect(Object.keys(all).sort()).toEqual(["drum", "horn"]);
    expect(all.horn!.kind).toBe("source");
    expect(all.drum!.kind).toBe("memory");
  });
});
