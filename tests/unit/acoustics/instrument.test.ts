// instrument.ts alone: the dynamic and band look-ups refuse what is out of range with a message
// that says what is allowed, band powers land only where the caller asked, and the check of an
// instrument spec (run on every spec an analysis receives) refuses each bad part by its name.
// An instrument override reaches the API as JSON, so these messages are what a person reads.
import { describe, expect, it } from "vitest";
import { dynamicIndex, instrumentBandsInto, instrumentLevelDb, validateInstrumentSpec } from "@/lib/acoustics/instrument";
import type { Dynamic, InstrumentSpec } from "@/lib/acoustics";
import { handSource } from "./helpers";

const FIELD = "instruments.horn";
/** A complete, valid spec (8 bands of 80 dB at mf, 6 dB a step) with some parts replaced. */
const spec = (over: object = {}): InstrumentSpec => ({ ...handSource([80, 80, 80, 80, 80, 80, 80, 80]), ...over }) as InstrumentSpec;
const check = (over: object) => () => validateInstrumentSpec(spec(over), FIELD);

describe("dynamicIndex", () => {
  it("refuses an unknown dynamic, listing the written ones in order", () => {
    expect(() => dynamicIndex("loud" as Dynamic)).toThrow(/^dynamic must be one of pp, p, mp, mf, f, ff, fff$/);
  });
});

describe("instrumentLevelDb", () => {
  it("refuses a negative band index, saying the range of the eight bands", () => {
    expect(() => instrumentLevelDb(spec(), "mf", -1)).toThrow(/^bandIndex must be an integer from 0 to 7$/);
  });
});

describe("instrumentBandsInto", () => {
  it("writes the eight bands at the offset and nothing after them", () => {
    // Hand calculation: a flat spectrum of 80 dB a band at mf (handSource), no brightening, 6 dB a
    // step, so at f every band is 86 dB. Slots 8…15 belong to another dynamic and keep their −1.
    const out = new Float64Array(16).fill(-1);
    instrumentBandsInto(spec(), "f", out, 0);
    for (let b = 0; b < 8; b++) expect(out[b]).toBeCloseTo(86, 9);
    expect(Array.from(out.subarray(8))).toEqual([-1, -1, -1, -1, -1, -1, -1, -1]);
  });
});

describe("validateInstrumentSpec", () => {
  it("accepts a complete spec, with or without an uncertainty and a fit, at their lowest allowed values", () => {
    expect(check({})).not.toThrow();
    expect(check({ uncertaintyDb: 0 })).not.toThrow();
    expect(check({ uncertaintyDb: 2.5, fit: { readings: 6, stdErrorDb: 1.2 } })).not.toThrow();
    // One reading with no scatter is a fit still: the least of each.
    expect(check({ fit: { readings: 1, stdErrorDb: 0 } })).not.toThrow();
  });

  it("refuses a spec that is null or not an object, naming the instrument", () => {
    expect(() => validateInstrumentSpec(null as never, FIELD)).toThrow(/^instruments\.horn must be an instrument spec$/);
    expect(() => validateInstrumentSpec(5 as never, FIELD)).toThrow(/^instruments\.horn must be an instrument spec$/);
  });

  it("refuses powers that are null or not an object", () => {
    expect(check({ powerDb: null })).toThrow(/^instruments\.horn\.powerDb must be an object$/);
    expect(check({ powerDb: 90 })).toThrow(/^instruments\.horn\.powerDb must be an object$/);
  });

  it("names the dynamic whose power is not a finite number", () => {
    const powerDb = { ...spec().powerDb, mf: Number.NaN };
    expect(check({ powerDb })).toThrow(/^instruments\.horn\.powerDb\.mf must be a finite number$/);
  });

  it("refuses a power equal to the one of the softer dynamic below it: each step must be louder", () => {
    const powerDb = { ...spec().powerDb };
    powerDb.f = powerDb.mf;
    expect(check({ powerDb })).toThrow(/^instruments\.horn\.powerDb\.f must be above powerDb\.mf$/);
  });

  it("refuses a spectrum or brightening that is not eight numbers, by its name", () => {
    const seven = [0, 0, 0, 0, 0, 0, 0];
    expect(check({ spectrumDb: seven })).toThrow(/^instruments\.horn\.spectrumDb must hold 8 numbers$/);
    expect(check({ brightnessDbPerStep: seven })).toThrow(/^instruments\.horn\.brightnessDbPerStep must hold 8 numbers$/);
    // Array-like but not an array.
    expect(check({ spectrumDb: { length: 8 } })).toThrow(/^instruments\.horn\.spectrumDb must hold 8 numbers$/);
  });

  it("names the band of a spectrum or brightening that is not a finite number", () => {
    expect(check({ spectrumDb: [-9, -9, -9, Number.NaN, -9, -9, -9, -9] })).toThrow(/^instruments\.horn\.spectrumDb\[3\] must be a finite number$/);
    expect(check({ brightnessDbPerStep: [0, 0, 0, 0, 0, 0, 0, "1"] })).toThrow(/^instruments\.horn\.brightnessDbPerStep\[7\] must be a finite number$/);
  });

  it("refuses an uncertainty that is not a number, or below 0", () => {
    expect(check({ uncertaintyDb: Number.NaN })).toThrow(/^instruments\.horn\.uncertaintyDb must be a finite number$/);
    expect(check({ uncertaintyDb: -0.5 })).toThrow(/^instruments\.horn\.uncertaintyDb must be 0 or more$/);
  });

  it("refuses a fit that is null or not an object", () => {
    expect(check({ fit: null })).toThrow(/^instruments\.horn\.fit must be an object$/);
    expect(check({ fit: 4 })).toThrow(/^instruments\.horn\.fit must be an object$/);
  });

  it("refuses a fit's standard error that is not a number, or below 0", () => {
    expect(check({ fit: { readings: 4, stdErrorDb: Number.NaN } })).toThrow(/^instruments\.horn\.fit\.stdErrorDb must be a finite number$/);
    expect(check({ fit: { readings: 4, stdErrorDb: -0.1 } })).toThrow(/^instruments\.horn\.fit\.stdErrorDb must be 0 or more$/);
  });

  it("refuses a fit of no readings or of a fractional count", () => {
    for (const readings of [0, 2.5, "3"]) {
      expect(check({ fit: { readings, stdErrorDb: 1 } })).toThrow(/^instruments\.horn\.fit\.readings must be a whole number of at least 1$/);
    }
  });
});
