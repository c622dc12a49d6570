import { describe, expect, it } from "vitest";
import {
  AcousticsInputError,
  DEFAULT_INSTRUMENTS,
  airAbsorptionDbPerKm,
  analyzeSet,
  createSetEvaluator,
  divergenceDb,
  groundAttenuationDb,
  sumLevelsDb,
  toJsonSafe,
  type AnalysisInput,
} from "@/lib/acoustics";
import { AIR, BOX, performer } from "./helpers";

const good = (): AnalysisInput => ({
  performers: [performer({ id: "T1" }), performer({ id: "T2", x: 3 }), performer({ id: "T3", x: 6 }), performer({ id: "T4", x: 9 })],
  listeningPoints: [BOX],
  conditions: { ...AIR, groundFactor: 1 },
});
const withPerformer = (i: number, change: object): AnalysisInput => {
  const input = good();
  input.performers[i] = { ...input.performers[i], ...change };
  return input;
};

describe("bad input: a clear error naming the field, never a NaN", () => {
  it.each([
    ["NaN x", withPerformer(3, { x: Number.NaN }), "performers[3].x must be a finite number"],
    ["infinite y", withPerformer(1, { y: Infinity }), "performers[1].y must be a finite number"],
    ["NaN facing", withPerformer(0, { facingDeg: Number.NaN }), "performers[0].facingDeg must be a finite number"],
    ["negative height", withPerformer(2, { z: -1 }), "performers[2].z must not be negative"],
    ["NaN strength", withPerformer(2, { strengthDb: Number.NaN }), "performers[2].strengthDb must be a finite number"],
    ["unknown instrument", withPerformer(2, { instrument: "kazoo" }), 'performers[2].instrument "kazoo" is not in the instrument catalog'],
    ["prototype key as instrument", withPerformer(2, { instrument: "toString" }), 'performers[2].instrument "toString" is not in the instrument catalog'],
    ["unknown dynamic", withPerformer(0, { dynamic: "mezzo" }), "performers[0].dynamic must be one of"],
    ["unknown voice", withPerformer(0, { voice: "solo" }), "performers[0].voice must be one of"],
    ["duplicate id", withPerformer(1, { id: "T1" }), 'performers[1].id "T1" is used twice'],
  ])("%s", (_name, input, message) => {
    expect(() => analyzeSet(input)).toThrow(AcousticsInputError);
    expect(() => analyzeSet(input)).toThrow(message);
  });

  it.each([
    [101, "conditions.relativeHumidityPct must be between 0 and 100"],
    [-1, "conditions.relativeHumidityPct must be between 0 and 100"],
    [Number.NaN, "conditions.relativeHumidityPct must be a finite number"],
  ])("humidity %s", (rh, message) => {
    const input = good();
    input.conditions = { ...input.conditions, relativeHumidityPct: rh };
    expect(() => analyzeSet(input)).toThrow(message);
  });

  it("rejects a listening point with a non-finite coordinate or below the ground", () => {
    expect(() => analyzeSet({ ...good(), listeningPoints: [{ ...BOX, z: Number.NaN }] })).toThrow("listeningPoints[0].z must be a finite number");
    expect(() => analyzeSet({ ...good(), listeningPoints: [{ ...BOX, z: -2 }] })).toThrow("listeningPoints[0].z must not be negative");
  });

  it("rejects a ground factor outside 0…1 and a bad pressure or temperature", () => {
    expect(() => analyzeSet({ ...good(), conditions: { ...AIR, groundFactor: 1.5 } })).toThrow("conditions.groundFactor must be between 0 and 1");
    expect(() => analyzeSet({ ...good(), conditions: { ...AIR, groundFactor: 1, betweenGroundFactor: -0.1 } })).toThrow("conditions.betweenGroundFactor must be between 0 and 1");
    expect(() => analyzeSet({ ...good(), listeningPoints: [{ ...BOX, groundFactor: 2 }] })).toThrow("listeningPoints[0].groundFactor must be between 0 and 1");
    expect(() => analyzeSet({ ...good(), listeningPoints: [{ ...BOX, surroundingsM: -1 }] })).toThrow("listeningPoints[0].surroundingsM must not be negative");
    expect(() => analyzeSet({ ...good(), conditions: { ...AIR, pressureKPa: 0 } })).toThrow("conditions.pressureKPa");
    expect(() => analyzeSet({ ...good(), conditions: { ...AIR, temperatureC: Infinity } })).toThrow("conditions.temperatureC must be a finite number");
  });

  it("checks an instrument override and names the field", () => {
    const broken = { ...DEFAULT_INSTRUMENTS.trumpet, carryDb: Number.NaN };
    expect(() => analyzeSet({ ...good(), instruments: { trumpet: broken } })).toThrow("instruments.trumpet.carryDb must be a finite number");
    const flat = { ...DEFAULT_INSTRUMENTS.trumpet, powerDb: { ...DEFAULT_INSTRUMENTS.trumpet.powerDb, f: 90 } };
    expect(() => analyzeSet({ ...good(), instruments: { trumpet: flat } })).toThrow("instruments.trumpet.powerDb.f must be above powerDb.mf");
  });

  it("uses an instrument override (calibrated carry) in place of the default", () => {
    const louder = { ...DEFAULT_INSTRUMENTS.trumpet, carryDb: DEFAULT_INSTRUMENTS.trumpet.carryDb + 4 };
    const a = analyzeSet(good()).points[0].totalDbA;
    const b = analyzeSet({ ...good(), instruments: { trumpet: louder } }).points[0].totalDbA;
    expect(b - a).toBeCloseTo(4, 9);
  });

  it("rejects negative and non-finite distances in the building blocks", () => {
    expect(() => divergenceDb(-1)).toThrow("distanceM must be a positive finite number");
    expect(() => divergenceDb(Number.NaN)).toThrow("distanceM");
    const q = { frequencyHz: 500, sourceHeightM: 1.5, receiverHeightM: 18, distanceM: -5, groundFactor: 1 };
    expect(() => groundAttenuationDb(q)).toThrow("distanceM must not be negative");
    expect(() => groundAttenuationDb({ ...q, distanceM: Infinity })).toThrow("distanceM must be a finite number");
    expect(() => airAbsorptionDbPerKm(1000, { temperatureC: 20, relativeHumidityPct: 120, pressureKPa: 101.325 })).toThrow("relativeHumidityPct must be between 0 and 100");
    expect(() => sumLevelsDb([80, Number.NaN])).toThrow("levels[1]");
  });

  it("checks positions written into an evaluator before evaluating", () => {
    const ev = createSetEvaluator(good());
    ev.x[2] = Number.NaN;
    expect(() => ev.evaluate()).toThrow("positions[2].x must be a finite number");
    expect(() => ev.setPositions([{ performerId: "nobody", x: 0, y: 0, facingDeg: 0 }])).toThrow('positions[0].performerId "nobody"');
  });
});

describe("toJsonSafe", () => {
  it("maps -Infinity (silence) to null and keeps finite numbers", () => {
    const r = analyzeSet({ ...good(), performers: [performer({ id: "A", voice: "tacet" }), performer({ id: "B" })] });
    const safe = toJsonSafe(r);
    expect(safe.points[0].performers[0].dbA).toBeNull();
    expect(safe.points[0].performers[0].bandsDb.every((v) => v === null)).toBe(true);
    expect(safe.points[0].performers[1].dbA).toBeCloseTo(r.points[0].performers[1].dbA, 12);
    expect(JSON.parse(JSON.stringify(safe))).toEqual(safe);
  });
});

describe("instrument overrides are read afresh unless frozen", () => {
  it("follows a mutable override changed between calls", () => {
    const spec = structuredClone(DEFAULT_INSTRUMENTS.trumpet);
    const input = (): AnalysisInput => ({ ...good(), instruments: { trumpet: spec } });
    const a = analyzeSet(input()).points[0].totalDbA;
    for (const d of Object.keys(spec.powerDb) as (keyof typeof spec.powerDb)[]) spec.powerDb[d] += 5;
    const b = analyzeSet(input()).points[0].totalDbA;
    expect(b - a).toBeCloseTo(5, 9);
  });
});
