// Transition playback. A tempo in beats per minute gives 60 000 / bpm ms a beat, one count a beat
// (the definition of beats per minute; a count is one beat of the music: common practice, no source).
import { describe, expect, it } from "vitest";
import { clampCount, msPerCount, TEMPO_RANGE_BPM } from "@/lib/editor/playback";

describe("msPerCount", () => {
  it("is a minute divided by the tempo", () => {
    expect(msPerCount(120)).toBe(500);
    expect(msPerCount(60)).toBe(1000);
    expect(msPerCount(144)).toBeCloseTo(416.667, 3);
  });

  it("keeps the tempo inside the offered range", () => {
    expect(msPerCount(1)).toBe(60_000 / TEMPO_RANGE_BPM[0]);
    expect(msPerCount(10_000)).toBe(60_000 / TEMPO_RANGE_BPM[1]);
    expect(msPerCount(Number.NaN)).toBe(500);
  });
});

describe("clampCount", () => {
  it("gives whole counts from the previous set (0) to this one", () => {
    expect(clampCount(-1, 16)).toBe(0);
    expect(clampCount(17, 16)).toBe(16);
    expect(clampCount(4.4, 16)).toBe(4);
    expect(clampCount(Number.NaN, 16)).toBe(0);
  });
});
