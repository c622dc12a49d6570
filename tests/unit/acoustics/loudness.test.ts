import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { loudnessIso532_1, phonToSone, soneToPhon } from "@/lib/acoustics";
import { coreLoudnessInto, totalLoudnessFromCore, SPECIFIC_LOUDNESS_POINTS } from "@/lib/acoustics/loudness";
import { filterGainDb, sineThirdOctaveLevels } from "./iso532-1-filter-bank";

// Test signal 1 of ISO 532-1:2017 Annex B.2: 28 third-octave levels (dB), 25 Hz … 12.5 kHz.
// Transcribed in ggrecow/SQAT validation/Loudness_ISO532_1/1_synthetic_signals_stationary_loudness/
// validation_stationary_loudness_synthetic_signals.m @ 11db720d862bb7fcd3511194b6dac8f1903c7d18 and in
// Eomys/MoSQITo tests/input/Test_signal_1.py @ 051e5d01e494d8b7545994bd22bdea65bcb88880 (the same values).
const TEST_SIGNAL_1 = [-60, -60, 78, 79, 89, 72, 80, 89, 75, 87, 85, 79, 86, 80, 71, 70, 72, 71, 72, 74, 69, 65, 67, 77, 68, 58, 45, 30];

// Reference results of ISO 532-1:2017 Annex B.2/B.3 for test signals 1–4, as transcribed in the SQAT
// validation script above (reference_loudness, reference_loudness_level); signal 1's loudness also in
// Eomys/MoSQITo tests/sq_metrics/loudness/test_loudness_zwst.py @ 051e5d01e494d8b7545994bd22bdea65bcb88880.
// Compliance (ISO 532-1:2017 5.1, as summarised in ggrecow/SQAT validation/Loudness_ISO532_1/README.md
// @ 24727bb34cb8f1db89befb2ac75efbc7d225743d): total loudness within ±5 % or ±1 sone.
const REFERENCE = {
  signal1: { sone: 83.296, phon: 103.802 },
  tone250Hz80dB: { sone: 14.655, phon: 78.733 },
  tone1kHz60dB: { sone: 4.019, phon: 60.069 },
  tone4kHz40dB: { sone: 1.549, phon: 46.317 },
};

const silence = () => new Array<number>(28).fill(-Infinity);

describe("loudnessIso532_1: the standard's stationary test signals (ISO 532-1:2017 Annex B)", () => {
  it("test signal 1 (third-octave levels, Annex B.2): 83.296 sone, 103.802 phon, to the printed digits", () => {
    const { sone, phon } = loudnessIso532_1(TEST_SIGNAL_1);
    // The standard's program prints N rounded to 0.001 sone; ours is unrounded.
    expect(Math.abs(sone - REFERENCE.signal1.sone)).toBeLessThan(0.001);
    expect(Math.abs(phon - REFERENCE.signal1.phon)).toBeLessThan(0.001);
  });

  it("the filter bank used to turn the pure-tone signals into band levels passes each band's own centre at 0 dB (checks our copy of Tables A.1/A.2)", () => {
    for (let band = 0; band < 28; band++) {
      const centre = 1000 * 10 ** ((band - 16) / 10); // IEC 61260-1 base-10 centres
      expect(Math.abs(filterGainDb(band, centre))).toBeLessThan(0.01);
    }
  });

  // Test signals 2–4 are steady sines (Annex B.3, wave files); the standard's own program measures their
  // third-octave levels with its filter bank, which the helper reproduces for a steady sine.
  it.each([
    ["test signal 2: 250 Hz at 80 dB", 250, 80, REFERENCE.tone250Hz80dB],
    ["test signal 3: 1 kHz at 60 dB", 1000, 60, REFERENCE.tone1kHz60dB],
    ["test signal 4: 4 kHz at 40 dB", 4000, 40, REFERENCE.tone4kHz40dB],
  ])("%s: within 1 % of the published loudness (the standard allows 5 %)", (_name, frequencyHz, levelDb, ref) => {
    const { sone, phon } = loudnessIso532_1(sineThirdOctaveLevels(frequencyHz, levelDb));
    expect(Math.abs(sone - ref.sone) / ref.sone).toBeLessThan(0.01);
    expect(Math.abs(phon - ref.phon)).toBeLessThan(0.15);
  });
});

describe("loudnessIso532_1: the definitions of sone and phon", () => {
  it("a 1 kHz tone at 40 dB is 1 sone and 40 phon (ISO 532-1:2017 clause 3, the reference sound; within 0.5 %)", () => {
    const { sone, phon } = loudnessIso532_1(sineThirdOctaveLevels(1000, 40));
    expect(Math.abs(sone - 1)).toBeLessThan(0.005);
    expect(Math.abs(phon - 40)).toBeLessThan(0.1);
  });

  it("a 1 kHz tone at L dB has a loudness level of L phon from 40 to 110 dB (definition of the phon; within 0.5 phon)", () => {
    for (let level = 40; level <= 110; level += 10) {
      expect(Math.abs(loudnessIso532_1(sineThirdOctaveLevels(1000, level)).phon - level)).toBeLessThan(0.5);
    }
  });

  it("+10 dB on a 1 kHz tone above 40 dB doubles its sones (definition of the sone scale; within 5 %)", () => {
    for (let level = 40; level <= 100; level += 10) {
      const ratio = loudnessIso532_1(sineThirdOctaveLevels(1000, level + 10)).sone / loudnessIso532_1(sineThirdOctaveLevels(1000, level)).sone;
      expect(Math.abs(ratio - 2)).toBeLessThan(0.1);
    }
  });

  it("soneToPhon: 1 sone is 40 phon, and doubling the sones above 1 sone adds 10 phon (ISO 532-1:2017 clause 3)", () => {
    expect(soneToPhon(1)).toBeCloseTo(40, 12);
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1000, noNaN: true }), (n) => {
        expect(soneToPhon(2 * n) - soneToPhon(n)).toBeCloseTo(10, 9);
      }),
    );
  });

  it("soneToPhon below 1 sone is 40·N^0.35 and never below 3 phon (Zwicker & Fastl 1991 program, as in Eomys/MoSQITo mosqito/sq_metrics/loudness/loudness_zwst/sone_to_phon.py @ 1c59463937891f6994fe0e77512a2b448669f180)", () => {
    expect(soneToPhon(0.5)).toBeCloseTo(40 * 0.5 ** 0.35, 12);
    expect(soneToPhon(0)).toBe(3);
    expect(soneToPhon(1e-6)).toBe(3);
  });

  it("phonToSone inverts soneToPhon above 3 phon", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 500, noNaN: true }), (n) => {
        expect(Math.abs(phonToSone(soneToPhon(n)) - n) / n).toBeLessThan(1e-9);
      }),
    );
  });
});

describe("loudnessIso532_1: behaviour", () => {
  it("silence is 0 sone and the 3-phon floor", () => {
    expect(loudnessIso532_1(silence())).toEqual({ sone: 0, phon: 3 });
  });

  it("a band below the threshold in quiet adds nothing (Table A.6: 3 dB critical-band threshold at 1 kHz)", () => {
    const quiet = silence();
    quiet[16] = 2;
    expect(loudnessIso532_1(quiet).sone).toBe(0);
  });

  it("raising any band never makes the sound softer (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -20, max: 110, noNaN: true }), { minLength: 28, maxLength: 28 }),
        fc.integer({ min: 0, max: 27 }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        (levels, band, rise) => {
          const louder = [...levels];
          louder[band] += rise;
          expect(loudnessIso532_1(louder).sone).toBeGreaterThanOrEqual(loudnessIso532_1(levels).sone - 1e-9);
        },
      ),
    );
  });

  it("the diffuse field applies Table A.5: louder than free field at 1 kHz (+3 dB), softer at 2.5 kHz (−2 dB)", () => {
    const at1k = sineThirdOctaveLevels(1000, 60);
    expect(loudnessIso532_1(at1k, "diffuse").sone).toBeGreaterThan(loudnessIso532_1(at1k, "free").sone);
    const at2k5 = sineThirdOctaveLevels(2500, 60);
    expect(loudnessIso532_1(at2k5, "diffuse").sone).toBeLessThan(loudnessIso532_1(at2k5, "free").sone);
  });

  it("the specific-loudness pattern integrates to the total loudness within 1 % (0.1-Bark sampling)", () => {
    const core = new Float64Array(21);
    coreLoudnessInto(TEST_SIGNAL_1, "free", core);
    const specific = new Float64Array(SPECIFIC_LOUDNESS_POINTS);
    const total = totalLoudnessFromCore(core, specific);
    const integral = specific.reduce((sum, n) => sum + n, 0) * 0.1;
    expect(Math.abs(integral - total) / total).toBeLessThan(0.01);
  });

  it("so does the pattern of a loud pure tone, most of it on the upper slope (250 Hz, 1 kHz and 4 kHz at 80 dB)", () => {
    for (const hz of [250, 1000, 4000]) {
      const core = new Float64Array(21);
      coreLoudnessInto(sineThirdOctaveLevels(hz, 80), "free", core);
      const specific = new Float64Array(SPECIFIC_LOUDNESS_POINTS);
      const total = totalLoudnessFromCore(core, specific);
      const integral = specific.reduce((sum, n) => sum + n, 0) * 0.1;
      expect(Math.abs(integral - total) / total, `${hz} Hz`).toBeLessThan(0.02);
      // Down the slope above the tone the pattern only falls.
      const peak = specific.indexOf(Math.max(...specific));
      for (let k = peak + 12; k < SPECIFIC_LOUDNESS_POINTS; k++) expect(specific[k]!).toBeLessThanOrEqual(specific[k - 1]! + 1e-12);
    }
  });

  it("refuses a wrong number of bands, NaN, +Infinity and a value that is no number, naming the field and what it must be", () => {
    // The count itself is named: a short list fails on its length, not on its first missing value.
    expect(() => loudnessIso532_1(new Array(27).fill(60))).toThrow(/^thirdOctaveDb must hold 28 third-octave levels/);
    expect(() => loudnessIso532_1(new Array(29).fill(60))).toThrow(/must hold 28 third-octave levels/);
    const nan = silence();
    nan[3] = Number.NaN;
    expect(() => loudnessIso532_1(nan)).toThrow(/thirdOctaveDb\[3\] must be a number in dB/);
    const inf = silence();
    inf[27] = Infinity;
    expect(() => loudnessIso532_1(inf)).toThrow(/thirdOctaveDb\[27\]/);
    const text = silence() as unknown[];
    text[0] = "60";
    expect(() => loudnessIso532_1(text as number[])).toThrow(/thirdOctaveDb\[0\] must be a number/);
    expect(() => loudnessIso532_1(TEST_SIGNAL_1, "outdoor" as "free")).toThrow(/field must be "free" or "diffuse"/);
  });

  it("keeps counting above the last range of the low-frequency table (Table A.3 ends at 120 dB; its last row applies, as in the standard's program)", () => {
    const lowAt = (db: number) => loudnessIso532_1(TEST_SIGNAL_1.map((l, i) => (i < 11 ? db : l)));
    const at120 = lowAt(120).sone;
    const at130 = lowAt(130).sone;
    expect(Number.isFinite(at130)).toBe(true);
    expect(at130).toBeGreaterThan(at120);
  });

  it("overwrites a reused specific-loudness pattern everywhere: zero above where the sound ends", () => {
    // A 1 kHz tone at 60 dB excites nothing near 24 Bark; a pattern array left from a louder sound must not keep its values.
    const core = new Float64Array(21);
    coreLoudnessInto(sineThirdOctaveLevels(1000, 60), "free", core);
    const specific = new Float64Array(SPECIFIC_LOUDNESS_POINTS).fill(7);
    totalLoudnessFromCore(core, specific);
    expect(specific.slice(200)).toEqual(new Float64Array(40));
    expect(specific.every((n) => n < 7)).toBe(true);
  });

  it("accepts a Float64Array", () => {
    expect(loudnessIso532_1(Float64Array.from(TEST_SIGNAL_1)).sone).toBeCloseTo(loudnessIso532_1(TEST_SIGNAL_1).sone, 12);
  });
});
