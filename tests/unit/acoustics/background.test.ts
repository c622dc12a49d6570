import { describe, expect, it } from "vitest";
import {
  BACKGROUND_PRESETS,
  BACKGROUND_PRESET_SPECS,
  backgroundThirdOctaves,
  speechBandLevels,
  thirdOctavesDbA,
  validateBackground,
} from "@/lib/acoustics/background";

const sumDb = (levels: ArrayLike<number>, from = 0, to = levels.length) => {
  let e = 0;
  for (let i = from; i < to; i++) e += 10 ** (levels[i] / 10);
  return 10 * Math.log10(e);
};

describe("background: the speech spectrum the crowd presets are shaped by", () => {
  // ANSI S3.5-1997 Table 3 gives each effort's overall speech level; the third-octave band levels
  // 160 Hz … 8 kHz (spectrum level + 10·lg bandwidth) must add up to it.
  it.each([
    ["normal", 62.35],
    ["raised", 68.34],
  ] as const)("%s effort: the bands 160 Hz … 8 kHz add up to the overall %s dB of ANSI S3.5-1997 Table 3 (within 0.1 dB)", (effort, overall) => {
    expect(Math.abs(sumDb(speechBandLevels(effort), 8, 26) - overall)).toBeLessThan(0.1);
  });

  it("outside 160 Hz … 8 kHz the crowd spectrum falls, never rises", () => {
    const levels = speechBandLevels("normal");
    for (let i = 0; i < 8; i++) expect(levels[i]).toBeLessThan(levels[i + 1]);
    for (let i = 26; i < 28; i++) expect(levels[i]).toBeLessThan(levels[i - 1]);
  });
});

describe("background: A-weighted level of third-octave levels", () => {
  it("a 1 kHz band alone reads its own level (IEC 61672-1:2013: A-weighting is 0 dB at 1 kHz)", () => {
    const levels = new Array(28).fill(-Infinity);
    levels[16] = 60;
    expect(thirdOctavesDbA(levels)).toBeCloseTo(60, 2);
  });

  it("a 100 Hz band alone reads 19.1 dB lower (IEC 61672-1:2013 Table 3: A at 100 Hz = −19.1 dB)", () => {
    const levels = new Array(28).fill(-Infinity);
    levels[6] = 60;
    expect(Math.abs(thirdOctavesDbA(levels) - 40.9)).toBeLessThan(0.1);
  });
});

describe("background: presets and custom levels", () => {
  it("every preset has 28 finite levels, a source, and reads its stated A-weighted level", () => {
    for (const key of BACKGROUND_PRESETS) {
      const spec = BACKGROUND_PRESET_SPECS[key];
      expect(spec.thirdOctaveDb).toHaveLength(28);
      expect(Array.from(spec.thirdOctaveDb).every(Number.isFinite)).toBe(true);
      expect(spec.source.length).toBeGreaterThan(10);
      expect(thirdOctavesDbA(backgroundThirdOctaves({ preset: key }))).toBeCloseTo(spec.dbA, 6);
    }
  });

  it("a quiet field is quieter than a crowd during a performance, which is quieter than a stadium between bands", () => {
    const dbA = (k: (typeof BACKGROUND_PRESETS)[number]) => BACKGROUND_PRESET_SPECS[k].dbA;
    expect(dbA("quiet-field")).toBeLessThan(dbA("crowd-during-performance"));
    expect(dbA("crowd-during-performance")).toBeLessThan(dbA("stadium-between-bands"));
  });

  it("no background is silence in every band", () => {
    expect(Array.from(backgroundThirdOctaves(null)).every((l) => l === -Infinity)).toBe(true);
  });

  it("custom octave levels keep each octave's energy in its three thirds; custom thirds pass through", () => {
    const octaves = [60, 58, 55, 52, 50, 47, 44, 40];
    const thirds = backgroundThirdOctaves({ octaveDb: octaves });
    octaves.forEach((l, k) => expect(sumDb(thirds, 3 + 3 * k, 6 + 3 * k)).toBeCloseTo(l, 9));
    const custom = Array.from({ length: 28 }, (_, i) => 40 + i / 2);
    expect(Array.from(backgroundThirdOctaves({ thirdOctaveDb: custom }))).toEqual(custom);
  });

  it("refuses unknown presets, wrong band counts, out-of-range levels and mixed forms, naming the field", () => {
    expect(() => validateBackground({ preset: "rock-concert" })).toThrow(/background\.preset/);
    expect(() => validateBackground({ octaveDb: [50, 50] })).toThrow(/background\.octaveDb/);
    expect(() => validateBackground({ thirdOctaveDb: new Array(28).fill(200) })).toThrow(/background\.thirdOctaveDb\[0\]/);
    expect(() => validateBackground({ preset: "quiet-field", octaveDb: new Array(8).fill(40) })).toThrow(/exactly one/);
    expect(() => validateBackground("loud")).toThrow(/background/);
    expect(() => validateBackground(null)).not.toThrow();
  });

  it("says what is wanted: a preset or band levels, the presets by name, one known form, the count of levels", () => {
    expect(() => validateBackground("loud")).toThrow(/^background must be a preset or band levels$/);
    expect(() => validateBackground({ preset: "rock-concert" })).toThrow(
      /^background\.preset must be one of quiet-field, stadium-between-bands, crowd-during-performance$/,
    );
    // One key, but not a form the engine knows.
    expect(() => validateBackground({ levels: new Array(8).fill(40) })).toThrow(/^background must give exactly one of preset, octaveDb, thirdOctaveDb$/);
    expect(() => validateBackground({ octaveDb: [50, 50] })).toThrow(/^background\.octaveDb must hold 8 levels$/);
    expect(() => validateBackground({ thirdOctaveDb: [50] }, "points[2].background")).toThrow(/^points\[2\]\.background\.thirdOctaveDb must hold 28 levels$/);
  });
});
