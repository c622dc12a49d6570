// A new show's next step: roster, then drill, then music (common practice, no source: the order a band builds a show).
import { describe, expect, it } from "vitest";
import { nextStep } from "@/lib/show/next-step";

describe("nextStep", () => {
  it("asks for the roster first, whatever the page needs", () => {
    for (const need of ["roster", "drill", "music"] as const) expect(nextStep({ performers: 0, placedPerformers: 0, phrases: 0 }, need)?.need).toBe("roster");
  });
  it("asks for the drill once there is a roster, and only of pages that need it", () => {
    const p = { performers: 12, placedPerformers: 0, phrases: 3 };
    expect(nextStep(p, "roster")).toBeNull();
    expect(nextStep(p, "drill")?.need).toBe("drill");
    expect(nextStep(p, "music")?.need).toBe("drill");
  });
  it("asks for the music last, and nothing once the show has all three", () => {
    expect(nextStep({ performers: 12, placedPerformers: 12, phrases: 0 }, "drill")).toBeNull();
    expect(nextStep({ performers: 12, placedPerformers: 12, phrases: 0 }, "music")?.title).toBe("Write the music");
    expect(nextStep({ performers: 12, placedPerformers: 1, phrases: 1 }, "music")).toBeNull();
  });
});
