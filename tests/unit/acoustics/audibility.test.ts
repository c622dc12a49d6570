import { describe, expect, it } from "vitest";
import {
  audibility,
  CRITICAL_BAND_CENTRE_BARK,
  criticalBandLevelsInto,
  maskedThresholdInto,
  maskingIndexDb,
  QUIET_THRESHOLD_DB,
} from "@/lib/acoustics/audibility";
import { lazy } from "./helpers";

// Third-octave index (25 Hz = 0) → approximated critical band of ISO 532-1 (315 Hz and up: one each).
const cbOfThird = (third: number) => third - 8;
const silentThirds = () => new Array<number>(28).fill(-Infinity);
const cbLevels = (thirds: number[]) => {
  const out = new Float64Array(20);
  criticalBandLevelsInto(thirds, out);
  return out;
};
const thresholdOf = (maskerThirds: number[]) => {
  const out = new Float64Array(20);
  maskedThresholdInto(cbLevels(maskerThirds), out);
  return out;
};
const oneBand = (third: number, level: number) => {
  const t = silentThirds();
  t[third] = level;
  return t;
};
const noMasker = lazy(() => thresholdOf(silentThirds()));

describe("audibility: threshold in quiet", () => {
  // ISO 226:2003 hearing threshold T_f (dB), as transcribed in mlochbaum/JSound loudness.ijs
  // @ 5ef46b9a4f6263c63bb62cffd70a5c2758c0dd61. The rule's threshold is ISO 532-1's own (Tables A.4, A.6),
  // which follows ISO 226:1987, so agreement within 3 dB is what to expect.
  it.each([
    [250, 10, 11.4],
    [500, 13, 4.4],
    [1000, 16, 2.4],
    [2000, 19, 1.3],
    [4000, 22, -5.4],
  ])("at %s Hz it is within 3 dB of ISO 226:2003", (_hz, third, isoThreshold) => {
    const cb = third <= 10 ? 2 : cbOfThird(third);
    expect(Math.abs(QUIET_THRESHOLD_DB[cb] - isoThreshold)).toBeLessThan(3);
  });

  it("a 1 kHz voice alone is heard at 10 dB and not at 2 dB (ISO 532-1 Table A.6: 3 dB at 1 kHz)", () => {
    expect(audibility(cbLevels(oneBand(16, 10)), noMasker()).heard).toBe(true);
    expect(audibility(cbLevels(oneBand(16, 2)), noMasker()).heard).toBe(false);
  });

  it("silence is never heard", () => {
    expect(audibility(cbLevels(silentThirds()), noMasker())).toEqual({ heard: false, marginDb: -Infinity, band: -1 });
  });
});

describe("criticalBandLevelsInto", () => {
  it("gathers the three lowest critical bands from their third-octaves as energy sums (25–80, 100–160, 200–250 Hz), then one third-octave each", () => {
    // Hand calculation: six thirds of 50 dB are 50 + 10·lg 6 = 57.782 dB, three of 60 dB are
    // 60 + 10·lg 3 = 64.771 dB, two of 40 dB are 40 + 10·lg 2 = 43.010 dB; 315 Hz (third 11) is band 3.
    const thirds = silentThirds();
    for (let t = 0; t < 6; t++) thirds[t] = 50;
    for (let t = 6; t < 9; t++) thirds[t] = 60;
    for (let t = 9; t < 11; t++) thirds[t] = 40;
    thirds[11] = 70;
    thirds[27] = 30;
    const cb = cbLevels(thirds);
    expect(cb[0]).toBeCloseTo(57.782, 3);
    expect(cb[1]).toBeCloseTo(64.771, 3);
    expect(cb[2]).toBeCloseTo(43.01, 3);
    expect(cb[3]).toBe(70);
    expect(cb[19]).toBe(30);
  });

  it("writes the twenty bands and nothing after them", () => {
    const out = new Float64Array(21).fill(-1);
    criticalBandLevelsInto(oneBand(16, 60), out);
    expect(out[cbOfThird(16)]).toBe(60);
    expect(out[20]).toBe(-1);
  });
});

describe("audibility: masking", () => {
  it("in the masker's own critical band the threshold lies 2–6 dB below the masker, 500 Hz … 4 kHz (noise masking a tone: Zwicker & Fastl, Psychoacoustics, ch. 4 — from memory)", () => {
    for (const third of [13, 16, 19, 22]) {
      const t = thresholdOf(oneBand(third, 60))[cbOfThird(third)];
      expect(60 - t).toBeGreaterThan(2);
      expect(60 - t).toBeLessThan(6);
    }
  });

  it("the masking index is ISO/IEC 11172-3's for noise-like maskers, −1.525 − 0.175·z − 0.5 dB", () => {
    expect(maskingIndexDb(8.55)).toBeCloseTo(-1.525 - 0.175 * 8.55 - 0.5, 12);
  });

  it("a voice 5 dB under a masker in the same band is masked; one 2 dB under is heard", () => {
    const threshold = thresholdOf(oneBand(16, 60));
    expect(audibility(cbLevels(oneBand(16, 55)), threshold).heard).toBe(false);
    expect(audibility(cbLevels(oneBand(16, 58)), threshold).heard).toBe(true);
  });

  it("masking spreads upward more than downward: a loud 500 Hz masker hides a 1 kHz voice that a loud 1 kHz masker leaves audible at 500 Hz (upward spread of masking, Wegel & Lane 1924; Zwicker & Fastl ch. 4)", () => {
    const low = thresholdOf(oneBand(13, 85));
    const high = thresholdOf(oneBand(16, 85));
    expect(audibility(cbLevels(oneBand(16, 45)), low).heard).toBe(false);
    expect(audibility(cbLevels(oneBand(13, 45)), high).heard).toBe(true);
  });

  it("the upward spread grows faster than the masker: 20 dB more masker raises the threshold two octaves up by more than 20 dB (Terhardt's level-dependent slope)", () => {
    const at4k = cbOfThird(22);
    const rise = thresholdOf(oneBand(16, 90))[at4k] - thresholdOf(oneBand(16, 70))[at4k];
    expect(rise).toBeGreaterThan(20);
  });

  it("the critical-band centres rise from 0 to 24 Bark", () => {
    for (let i = 1; i < 20; i++) expect(CRITICAL_BAND_CENTRE_BARK[i]).toBeGreaterThan(CRITICAL_BAND_CENTRE_BARK[i - 1]);
    expect(CRITICAL_BAND_CENTRE_BARK[0]).toBeGreaterThan(0);
    expect(CRITICAL_BAND_CENTRE_BARK[19]).toBeLessThan(24);
  });
});
