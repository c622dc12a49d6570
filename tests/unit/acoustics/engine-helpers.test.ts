// The engine's small helpers: what the weightings refuse, how an input error reads, JSON safety of
// results, the instrument tables' cache and the model version. Each test states the behaviour an API
// answer or a caller relies on.
import { describe, expect, it } from "vitest";
import { DEFAULT_INSTRUMENTS, toJsonSafe } from "@/lib/acoustics";
import { cWeightingDb } from "@/lib/acoustics/c-weighting";
import { AcousticsInputError, requireFinite } from "@/lib/acoustics/errors";
import { instrumentTables } from "@/lib/acoustics/instrument-tables";
import type { InstrumentSpec } from "@/lib/acoustics/types";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { aWeightingDb } from "@/lib/acoustics/weighting";

const caught = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    return e as AcousticsInputError;
  }
  throw new Error("nothing was thrown");
};

describe("input errors", () => {
  it("name the field and the problem, as the API's 400 answers repeat them", () => {
    const e = caught(() => requireFinite(Number.NaN, "performers[3].x"));
    expect(e).toBeInstanceOf(AcousticsInputError);
    expect(e.name).toBe("AcousticsInputError");
    expect(e.field).toBe("performers[3].x");
    expect(e.message).toBe("performers[3].x must be a finite number");
    expect(requireFinite(-2.5, "x")).toBe(-2.5);
  });

  it("A- and C-weighting refuse a frequency at or below 0 Hz, or not a number, naming frequencyHz", () => {
    for (const weight of [aWeightingDb, cWeightingDb]) {
      for (const bad of [0, -100]) expect(caught(() => weight(bad)).message).toBe("frequencyHz must be above 0");
      expect(caught(() => weight(Number.POSITIVE_INFINITY)).message).toBe("frequencyHz must be a finite number");
      // Just above 0 Hz is a frequency: a deep cut, not an error.
      expect(weight(0.001)).toBeLessThan(-100);
    }
  });
});

describe("toJsonSafe", () => {
  it("turns typed arrays into plain arrays, and non-finite numbers into null, at any depth", () => {
    const out = toJsonSafe({ bands: Float64Array.of(1.5, Number.POSITIVE_INFINITY), nested: [{ v: Number.NaN }], none: null, word: "pp" });
    expect(out).toEqual({ bands: [1.5, null], nested: [{ v: null }], none: null, word: "pp" });
    expect(Array.isArray(out.bands)).toBe(true);
    expect(JSON.stringify(out)).toBe('{"bands":[1.5,null],"nested":[{"v":null}],"none":null,"word":"pp"}');
  });
});

describe("instrument tables", () => {
  it("are kept for a frozen instrument (the catalog's) and computed again for one a caller may still change", () => {
    const frozen = DEFAULT_INSTRUMENTS.trumpet!;
    expect(instrumentTables(frozen, "instruments.trumpet")).toBe(instrumentTables(frozen, "instruments.trumpet"));

    const mutable = structuredClone(frozen) as InstrumentSpec;
    const before = instrumentTables(mutable, "instruments.mine").bandsByDynamic[0]!;
    mutable.powerDb = Object.fromEntries(Object.entries(mutable.powerDb).map(([d, db]) => [d, db + 6])) as InstrumentSpec["powerDb"];
    expect(instrumentTables(mutable, "instruments.mine").bandsByDynamic[0]! - before).toBeCloseTo(6, 9);

    // Frozen on top but with a level table still open to change: not kept either.
    const shallow = Object.freeze(structuredClone(frozen) as InstrumentSpec);
    const first = instrumentTables(shallow, "instruments.shallow").bandsByDynamic[0]!;
    for (const d of Object.keys(shallow.powerDb) as (keyof InstrumentSpec["powerDb"])[]) shallow.powerDb[d] += 6;
    expect(instrumentTables(shallow, "instruments.shallow").bandsByDynamic[0]! - first).toBeCloseTo(6, 9);
  });

  it("name the instrument's directivity in an error", () => {
    const bad = { ...structuredClone(DEFAULT_INSTRUMENTS.trumpet!), directivity: { anglesDeg: [0], bandsDb: [] } } as InstrumentSpec;
    expect(caught(() => instrumentTables(bad, "instruments.mine")).field).toBe("instruments.mine.directivity.anglesDeg");
  });
});

it("the model version names the engine and its revision, which stored results are keyed by", () => {
  expect(MODEL_VERSION).toMatch(/^farfield-acoustics-\d+$/);
});
