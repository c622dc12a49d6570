// targets.ts: a show's stored thresholds laid over the defaults, each refused outside its range
// with the field and the range named (the API answers 400 with that message).
import { describe, expect, it } from "vitest";
import { BALANCE_VERSION, DEFAULT_TARGETS, TARGET_RANGES, resolveTargets, type BalanceTargets } from "@/lib/acoustics/targets";
import { MODEL_VERSION } from "@/lib/acoustics/version";

// The ranges a director may choose from, as the targets form and its API offer them: a threshold
// outside them is a typo, not a choice (the product's own bounds, not physics).
const RANGES: [keyof typeof TARGET_RANGES, number, number][] = [
  ["melodyLeadDb", 0, 20],
  ["batteryOverWindsDb", -10, 20],
  ["pyramidToleranceDb", 0, 20],
  ["depthToleranceDb", 0, 20],
  ["wideFormWidthM", 5, 120],
  ["edgeToleranceDb", 0, 20],
  ["standOutDb", 0, 30],
  ["arrivalSpreadMs", 1, 500],
  ["arrivalWindowDb", 1, 40],
  ["heardMarginDb", -10, 20],
  ["blendToleranceDb", 0, 30],
  ["setChangeDb", 0, 30],
];
const VOICE_LIST = /^targets\.pyramidVoices must list voices among melody, countermelody, accompaniment, bass, percussion$/;

describe("resolveTargets", () => {
  it.each(RANGES)("%s: accepted at %s and %s, refused just past either, naming the field and its range", (key, min, max) => {
    expect(resolveTargets({ [key]: min })[key]).toBe(min);
    expect(resolveTargets({ [key]: max })[key]).toBe(max);
    const message = new RegExp(`^targets\\.${key} must be between ${min} and ${max}$`);
    expect(() => resolveTargets({ [key]: min - 0.01 })).toThrow(message);
    expect(() => resolveTargets({ [key]: max + 0.01 })).toThrow(message);
  });

  it("has a range for every numeric target, each holding its default", () => {
    expect(Object.keys(TARGET_RANGES).sort()).toEqual(RANGES.map(([k]) => k).sort());
    for (const [key, min, max] of RANGES) {
      expect(DEFAULT_TARGETS[key]).toBeGreaterThanOrEqual(min);
      expect(DEFAULT_TARGETS[key]).toBeLessThanOrEqual(max);
    }
  });

  it("takes the pyramid's voices from the show, once each, and keeps the default when none are given", () => {
    expect(resolveTargets({ melodyLeadDb: 4 }).pyramidVoices).toEqual(["accompaniment", "bass"]);
    expect(resolveTargets({ pyramidVoices: ["bass"] }).pyramidVoices).toEqual(["bass"]);
    expect(resolveTargets({ pyramidVoices: ["bass", "countermelody", "bass"] }).pyramidVoices).toEqual(["bass", "countermelody"]);
  });

  it("refuses pyramid voices that are not a list of voices, listing the allowed ones", () => {
    const bad: unknown[] = ["bass", ["tacet"], ["bass", "tacet"], ["tacet", "bass"], ["Bass"]];
    for (const pyramidVoices of bad) {
      expect(() => resolveTargets({ pyramidVoices } as Partial<BalanceTargets>)).toThrow(VOICE_LIST);
    }
  });
});

describe("BALANCE_VERSION", () => {
  it("is a numbered balance version of its own, so stored results keyed by model and balance versions tell the two apart", () => {
    expect(BALANCE_VERSION).toMatch(/^farfield-balance-\d+$/);
    expect(BALANCE_VERSION).not.toBe(MODEL_VERSION);
  });
});
