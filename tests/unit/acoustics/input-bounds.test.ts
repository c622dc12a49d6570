// The engine's input contract at its edges: each documented bound accepted at the bound and
// refused just past it, with the field named (the API answers 400 with that message). The
// bounds are the engine's own (lib/acoustics/*.ts doc comments), not physics; the values at the
// accepted edges are checked against the cited formulas.
import { describe, expect, it } from "vitest";
import { airAbsorptionDbPerKm, speedOfSound, validateAir } from "@/lib/acoustics/atmosphere";
import { compileDirectivity, directivityDb } from "@/lib/acoustics/directivity";
import { divergenceDb, sumLevelsDb, dbToEnergy } from "@/lib/acoustics/levels";
import { groundAttenuationDb } from "@/lib/acoustics/ground";
import { regionGroundFactors } from "@/lib/acoustics/ground-regions";
import { nearestBandIndex } from "@/lib/acoustics/bands";
import { dailyDose, exposureLimitMinutes } from "@/lib/acoustics/exposure";
import { handSource } from "./helpers";

const AIR = { temperatureC: 20, relativeHumidityPct: 50, pressureKPa: 101.325 };

describe("air (atmosphere.ts: −50…60 °C, 0…100 % RH, 0 < p ≤ 200 kPa)", () => {
  it("accepts each bound and refuses just past it, naming the field with its prefix", () => {
    for (const ok of [{ temperatureC: -50 }, { temperatureC: 60 }, { relativeHumidityPct: 0 }, { relativeHumidityPct: 100 }, { pressureKPa: 200 }, { pressureKPa: 0.001 }]) {
      expect(() => validateAir({ ...AIR, ...ok })).not.toThrow();
    }
    expect(() => validateAir({ ...AIR, temperatureC: -50.01 }, "c.")).toThrow("c.temperatureC must be between -50 and 60");
    // Without a prefix the message starts with the field itself.
    expect(() => validateAir({ ...AIR, temperatureC: 60.01 })).toThrow(/^temperatureC must be between -50 and 60$/);
    expect(() => validateAir({ ...AIR, relativeHumidityPct: -0.01 })).toThrow("relativeHumidityPct must be between 0 and 100");
    expect(() => validateAir({ ...AIR, relativeHumidityPct: 100.01 })).toThrow("relativeHumidityPct");
    expect(() => validateAir({ ...AIR, pressureKPa: 0 }, "c.")).toThrow("c.pressureKPa must be above 0 and at most 200");
    expect(() => validateAir({ ...AIR, pressureKPa: 200.01 })).toThrow(/^pressureKPa must be above 0 and at most 200$/);
    expect(() => validateAir({ ...AIR, pressureKPa: Number.NaN })).toThrow("pressureKPa must be a finite number");
    expect(() => validateAir(null as never)).toThrow("conditions must be an object");
    expect(() => validateAir(5 as never)).toThrow("conditions must be an object");
    expect(() => validateAir(null as never, "weather.")).toThrow("weather. must be an object");
  });

  it("air absorption needs a frequency above 0 and checks the air (ISO 9613-1 eq. 5 is for f > 0)", () => {
    expect(() => airAbsorptionDbPerKm(0, AIR)).toThrow("frequencyHz must be above 0");
    expect(() => airAbsorptionDbPerKm(Number.NaN, AIR)).toThrow("frequencyHz must be a finite number");
    expect(() => airAbsorptionDbPerKm(1000, { ...AIR, relativeHumidityPct: 101 })).toThrow("relativeHumidityPct");
    // Below the lowest octave α keeps falling toward 0 with f² (eq. 5): 1 Hz is far under 0.001 dB/km.
    expect(airAbsorptionDbPerKm(1, AIR)).toBeGreaterThan(0);
    expect(airAbsorptionDbPerKm(1, AIR)).toBeLessThan(1e-3);
  });

  it("speed of sound: 343.2·√(T/293.15) (ISO 9613-1): 331.29 m/s at 0 °C, 354.7 m/s at 40 °C; refuses absolute zero", () => {
    expect(speedOfSound(0)).toBeCloseTo(343.2 * Math.sqrt(273.15 / 293.15), 9);
    expect(speedOfSound(40)).toBeCloseTo(354.71, 2);
    expect(() => speedOfSound(-273.15)).toThrow("temperatureC must be above absolute zero");
    expect(speedOfSound(-273.14)).toBeGreaterThan(0);
    expect(() => speedOfSound(Number.POSITIVE_INFINITY)).toThrow("temperatureC must be a finite number");
  });
});

describe("level arithmetic (levels.ts)", () => {
  it("refuses NaN and +Infinity in a sum, naming the index; −Infinity is silence", () => {
    expect(() => sumLevelsDb([70, Number.NaN])).toThrow("levels[1] must be a number below Infinity");
    expect(() => sumLevelsDb([Infinity])).toThrow("levels[0] must be a number below Infinity");
    expect(sumLevelsDb([-Infinity])).toBe(-Infinity);
    expect(dbToEnergy(-Infinity)).toBe(0);
    expect(dbToEnergy(30)).toBeCloseTo(1000, 9);
  });

  it("divergence: 11 dB at 1 m exactly (ISO 9613-2 eq. 7, 20·lg 1 = 0); refuses 0, negative, infinite and non-numbers", () => {
    expect(divergenceDb(1)).toBe(11);
    expect(divergenceDb(0.1)).toBeCloseTo(-9, 9);
    for (const bad of [0, -1, Infinity, Number.NaN, "5" as unknown as number]) expect(() => divergenceDb(bad)).toThrow("distanceM must be a positive finite number");
  });
});

describe("ground (ground.ts, ground-regions.ts)", () => {
  const q = { frequencyHz: 500, sourceHeightM: 1.5, receiverHeightM: 18, distanceM: 100, groundFactor: 0.5 };
  it("refuses a frequency at or below 0, negative heights or distance, and G outside 0…1, per region named", () => {
    expect(() => groundAttenuationDb({ ...q, frequencyHz: 0 })).toThrow("frequencyHz must be above 0");
    expect(() => groundAttenuationDb({ ...q, sourceHeightM: -0.01 })).toThrow("sourceHeightM must not be negative");
    expect(() => groundAttenuationDb({ ...q, receiverHeightM: -0.01 })).toThrow("receiverHeightM must not be negative");
    expect(() => groundAttenuationDb({ ...q, distanceM: -0.01 })).toThrow("distanceM must not be negative");
    expect(() => groundAttenuationDb({ ...q, groundFactor: 1.01 })).toThrow("groundFactor must be between 0 and 1");
    expect(() => groundAttenuationDb({ ...q, groundFactor: { source: 0, middle: -0.1, receiver: 0 } })).toThrow("groundFactor.middle");
    expect(() => groundAttenuationDb({ ...q, groundFactor: { source: 2, middle: 0, receiver: 0 } })).toThrow("groundFactor.source");
    expect(() => groundAttenuationDb({ ...q, groundFactor: { source: 0, middle: 0, receiver: 2 } })).toThrow("groundFactor.receiver");
    expect(groundAttenuationDb({ ...q, groundFactor: null })).toBe(0);
    expect(() => groundAttenuationDb({ ...q, groundFactor: undefined as never })).toThrow("groundFactor.source must be a finite number");
    expect(() => groundAttenuationDb({ ...q, frequencyHz: Number.NaN })).toThrow("frequencyHz must be a finite number");
    expect(() => groundAttenuationDb({ ...q, sourceHeightM: Number.NaN })).toThrow("sourceHeightM must be a finite number");
    expect(() => groundAttenuationDb({ ...q, receiverHeightM: Number.NaN })).toThrow("receiverHeightM must be a finite number");
    // Heights and distance of 0 are allowed (a source on the ground, a point above it).
    expect(Number.isFinite(groundAttenuationDb({ ...q, sourceHeightM: 0, receiverHeightM: 0, distanceM: 0 }))).toBe(true);
  });

  it("regions: refuses no stretches, a G per stretch missing, negative lengths and heights, G outside 0…1", () => {
    expect(() => regionGroundFactors([], [], 1, 1)).toThrow("lengthsM must list at least one stretch");
    expect(() => regionGroundFactors([10], [0, 1], 1, 1)).toThrow("factors must hold one G per stretch");
    expect(() => regionGroundFactors([10, -1], [0, 1], 1, 1)).toThrow("lengthsM[1] must not be negative");
    expect(() => regionGroundFactors([10], [1.5], 1, 1)).toThrow("factors[0] must be between 0 and 1");
    expect(() => regionGroundFactors([10], [1], -1, 1)).toThrow("sourceHeightM must not be negative");
    expect(() => regionGroundFactors([10], [1], 1, -1)).toThrow("receiverHeightM must not be negative");
    expect(() => regionGroundFactors([10], [1], Number.NaN, 1)).toThrow("sourceHeightM must be a finite number");
  });

  it("regions by hand (7.3.1: source region 30·hs, receiver region 30·hr): 100 m of G 1 then 100 m of G 0, hs 1, hr 2", () => {
    // Source region 0–30 m (G 1), receiver region 140–200 m (G 0), middle 30–140 m: (70·1 + 40·0)/110.
    const r = regionGroundFactors([100, 100], [1, 0], 1, 2);
    expect(r.source).toBe(1);
    expect(r.receiver).toBe(0);
    expect(r.middle).toBeCloseTo(70 / 110, 12);
    // Overlapping regions (200 m < 30·(5 + 5)): no middle of its own, the path's mean, (100·1 + 100·0)/200.
    expect(regionGroundFactors([100, 100], [1, 0], 5, 5).middle).toBeCloseTo(0.5, 12);
    // A receiver region of no length (hr = 0) takes the ground under the receiver.
    expect(regionGroundFactors([100, 100], [1, 0], 1, 0).receiver).toBe(0);
    // A source region of no length (hs = 0) takes the ground under the source.
    expect(regionGroundFactors([100, 100], [1, 0], 0, 1).source).toBe(1);
  });
});

describe("directivity tables (directivity.ts)", () => {
  const good = handSource([90, 90, 90, 90, 90, 90, 90, 90]).directivity;
  const withRow = (row: number[]) => ({ anglesDeg: [0, 90, 180], bandsDb: Array.from({ length: 8 }, (_, b) => (b === 3 ? row : [0, -3, -6])) });
  it("refuses fewer than two angles, angles not from 0 to 180 or not rising, and rows of the wrong size", () => {
    expect(() => compileDirectivity({ anglesDeg: [0], bandsDb: [] }, "d")).toThrow("d.anglesDeg must list at least two angles");
    expect(() => compileDirectivity({ ...good, anglesDeg: [1, 180] }, "d")).toThrow("d.anglesDeg must run from 0 to 180");
    expect(() => compileDirectivity({ ...good, anglesDeg: [0, 170] }, "d")).toThrow("d.anglesDeg must run from 0 to 180");
    expect(() => compileDirectivity({ anglesDeg: [0, 90, 90, 180], bandsDb: good.bandsDb }, "d")).toThrow("d.anglesDeg must rise strictly");
    expect(() => compileDirectivity({ anglesDeg: [0, 180], bandsDb: good.bandsDb.slice(1) }, "d")).toThrow("d.bandsDb must hold 8 bands");
    expect(() => compileDirectivity(withRow([0, -3]), "d")).toThrow("d.bandsDb[3] must hold 3 values");
    expect(() => compileDirectivity(withRow([0, 1, -3]), "d")).toThrow("d.bandsDb[3][1] must not be above 0");
    expect(() => compileDirectivity(withRow([-2, -1, -3]), "d")).toThrow("d.bandsDb[3][1] must not be above the 0° value");
    expect(() => compileDirectivity(withRow([0, Number.NaN, -3]), "d")).toThrow("d.bandsDb[3][1] must be a finite number");
  });

  it("interpolates linearly in angle and folds angles past 180° (a table 0, −3, −6 dB at 0°, 90°, 180°)", () => {
    const spec = { ...handSource([90, 90, 90, 90, 90, 90, 90, 90]), directivity: withRow([0, -3, -6]) };
    expect(directivityDb(spec, 3, 45)).toBeCloseTo(-1.5, 12);
    expect(directivityDb(spec, 3, 135)).toBeCloseTo(-4.5, 12);
    expect(directivityDb(spec, 3, 180)).toBeCloseTo(-6, 12);
    expect(directivityDb(spec, 3, 270)).toBeCloseTo(-3, 12);
    expect(directivityDb(spec, 3, -45)).toBeCloseTo(-1.5, 12);
    expect(directivityDb(spec, 3, 0)).toBe(0);
  });
});

describe("bands and exposure edges", () => {
  it("nearest octave band on a log scale: 700 Hz → 500 Hz band, 710 Hz → 1 kHz band (the geometric mean is 707.9 Hz)", () => {
    expect(nearestBandIndex(700)).toBe(3);
    expect(nearestBandIndex(710)).toBe(4);
    expect(nearestBandIndex(1)).toBe(0);
    expect(nearestBandIndex(20000)).toBe(7);
  });

  it("exposure: 0 minutes is a dose of 0; +Infinity dBA is refused; an unknown standard is named (NIOSH 98-126, OSHA 1910.95)", () => {
    expect(dailyDose(100, 0, "niosh")).toBe(0);
    expect(() => exposureLimitMinutes(Infinity, "osha")).toThrow("dbA must be a number below Infinity");
    expect(() => exposureLimitMinutes("90" as unknown as number, "osha")).toThrow("dbA");
    expect(() => dailyDose(90, Number.NaN, "osha")).toThrow("minutes must be a finite number");
    expect(() => exposureLimitMinutes(90, "constructor" as "osha")).toThrow('standard must be "niosh" or "osha"');
    expect(exposureLimitMinutes(-Infinity, "niosh")).toBe(Infinity);
  });
});
