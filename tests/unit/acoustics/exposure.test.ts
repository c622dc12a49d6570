import { describe, expect, it } from "vitest";
import { dailyDose, exposureLimitMinutes } from "@/lib/acoustics";

describe("exposure limits", () => {
  // NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure (1998, DHHS 98-126):
  // T = 8 h / 2^((L − 85)/3). Table values from memory of the published table; the formula is the standard's.
  it.each([
    [85, 480],
    [88, 240],
    [94, 60],
    [100, 15],
  ])("NIOSH 98-126: %d dBA → %d min", (dbA, minutes) => {
    expect(exposureLimitMinutes(dbA, "niosh")).toBeCloseTo(minutes, 6);
  });

  // OSHA 29 CFR 1910.95 Table G-16: 90 dBA for 8 h, 5 dB exchange (table values from memory).
  it.each([
    [90, 480],
    [95, 240],
    [100, 120],
    [115, 15],
  ])("OSHA 29 CFR 1910.95 Table G-16: %d dBA → %d min", (dbA, minutes) => {
    expect(exposureLimitMinutes(dbA, "osha")).toBeCloseTo(minutes, 6);
  });

  it("gives a dose of 1 (100 %) for the allowed time and scales with time (NIOSH 98-126, OSHA 1910.95)", () => {
    expect(dailyDose(94, 60, "niosh")).toBeCloseTo(1, 9);
    expect(dailyDose(85, 240, "niosh")).toBeCloseTo(0.5, 9);
    expect(dailyDose(100, 240, "osha")).toBeCloseTo(2, 9);
    expect(dailyDose(-Infinity, 600, "niosh")).toBe(0);
  });

  it("is stricter under NIOSH than OSHA above 85 dBA", () => {
    for (const l of [86, 90, 95, 100, 110]) expect(exposureLimitMinutes(l, "niosh")).toBeLessThan(exposureLimitMinutes(l, "osha"));
  });

  it("rejects bad input with the field named", () => {
    expect(() => exposureLimitMinutes(Number.NaN, "niosh")).toThrow(/dbA/);
    expect(() => dailyDose(90, -1, "osha")).toThrow(/minutes.*must not be negative/);
    expect(() => exposureLimitMinutes(90, "ansi" as "osha")).toThrow(/standard/);
  });
});
