// Stadium minutes per rehearsal item (our own rule: common practice, no source). Hand-worked shares.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { shareMinutes } from "@/lib/rehearsal/budget";

describe("shareMinutes", () => {
  it("shares 30 minutes 4 + 2 : 3 + 0 : 2 + 1 = 6 : 3 : 3 → 15, 7.5, 7.5 → 15, 8, 7", () => {
    expect(shareMinutes([{ severity: 2, buildUpSteps: 4 }, { severity: 0, buildUpSteps: 3 }, { severity: 1, buildUpSteps: 2 }], 30)).toEqual([15, 8, 7]);
  });

  it("gives a worse item more time than a calmer one of the same build-up", () => {
    const [worse, calm] = shareMinutes([{ severity: 5, buildUpSteps: 3 }, { severity: 0, buildUpSteps: 3 }], 20);
    expect(worse!).toBeGreaterThan(calm!);
  });

  it("always adds up to the budget, in whole minutes (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.record({ severity: fc.double({ min: 0, max: 20, noNaN: true }), buildUpSteps: fc.integer({ min: 0, max: 5 }) }), { minLength: 1, maxLength: 12 }), fc.integer({ min: 0, max: 240 }), (items, budget) => {
        const m = shareMinutes(items, budget);
        expect(m.reduce((a, b) => a + b, 0)).toBe(budget);
        for (const x of m) expect(Number.isInteger(x) && x >= 0).toBe(true);
      }),
    );
  });

  it("refuses a budget that is no whole number of minutes", () => {
    expect(() => shareMinutes([{ severity: 0, buildUpSteps: 1 }], 2.5)).toThrow(RangeError);
  });
});
