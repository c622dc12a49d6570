import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { airAbsorptionDbPerKm, loudnessIso532_1 } from "@/lib/acoustics";
import { MAX_SLOPE_DB_PER_OCTAVE, thirdOctavesFromOctaves } from "@/lib/acoustics/third-octaves";

const energy = (levels: ArrayLike<number>, from = 0, to = levels.length) => {
  let e = 0;
  for (let i = from; i < to; i++) e += 10 ** (levels[i] / 10);
  return e;
};
const THIRDS_OF_OCTAVE = (k: number) => 3 + 3 * k; // 63 Hz octave → 50, 63, 80 Hz thirds

describe("thirdOctavesFromOctaves: hand calculations", () => {
  it("pink noise (equal energy per octave): every third, 25 Hz … 12.5 kHz, is the octave level − 10·lg 3 = −4.771 dB", () => {
    const thirds = thirdOctavesFromOctaves(new Array(8).fill(70));
    for (const l of thirds) expect(l).toBeCloseTo(70 - 4.7712, 3);
  });

  it("white noise (+10·lg 2 dB per octave): thirds share each octave by their bandwidths, which grow as 2^(1/3) per third", () => {
    const octaves = Array.from({ length: 8 }, (_, k) => 60 + 10 * Math.log10(2) * k);
    const thirds = thirdOctavesFromOctaves(octaves);
    // Constant-percentage bands: widths in the ratio 2^(-1/3) : 1 : 2^(1/3) within an octave.
    const widthSum = 2 ** (-1 / 3) + 1 + 2 ** (1 / 3);
    for (let k = 0; k < 8; k++) {
      for (let j = 0; j < 3; j++) {
        const expected = octaves[k] + 10 * Math.log10(2 ** ((j - 1) / 3) / widthSum);
        expect(thirds[THIRDS_OF_OCTAVE(k) + j]).toBeCloseTo(expected, 9);
      }
    }
    // Below 50 Hz the rising slope continues downward (−1.003 dB per third) …
    for (let m = 1; m <= 3; m++) expect(thirds[3 - m]).toBeCloseTo(thirds[3] - (m * 10 * Math.log10(2)) / 3, 9);
    // … but 12.5 kHz never rises above the 10 kHz third: the rule invents no energy above the model.
    expect(thirds[27]).toBe(thirds[26]);
  });

  it("a spectrum falling 6 dB per octave above 1 kHz continues to fall at 12.5 kHz by 2 dB per third", () => {
    const octaves = [70, 70, 70, 70, 70, 64, 58, 52];
    const thirds = thirdOctavesFromOctaves(octaves);
    expect(thirds[27] - thirds[26]).toBeCloseTo(-2, 9);
  });
});

describe("thirdOctavesFromOctaves: energy", () => {
  it("the three thirds of every octave carry exactly its energy (fast-check)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -10, max: 130, noNaN: true }), { minLength: 8, maxLength: 8 }), (octaves) => {
        const thirds = thirdOctavesFromOctaves(octaves);
        for (let k = 0; k < 8; k++) {
          const e = energy(thirds, THIRDS_OF_OCTAVE(k), THIRDS_OF_OCTAVE(k) + 3);
          expect(Math.abs(10 * Math.log10(e) - octaves[k])).toBeLessThan(1e-9);
        }
      }),
    );
  });

  it("a silent octave gives three silent thirds, and its neighbours split by their other neighbour's slope", () => {
    const octaves = [60, 66, -Infinity, 70, 70, 70, 70, 70];
    const thirds = thirdOctavesFromOctaves(octaves);
    expect([thirds[9], thirds[10], thirds[11]]).toEqual([-Infinity, -Infinity, -Infinity]);
    // 125 Hz octave: one-sided slope from 63 Hz, +6 dB per octave → thirds 2 dB apart.
    expect(thirds[7] - thirds[6]).toBeCloseTo(2, 9);
    expect(thirds.every((l) => !Number.isNaN(l))).toBe(true);
  });

  it(`a slope steeper than ${MAX_SLOPE_DB_PER_OCTAVE} dB per octave is split as ${MAX_SLOPE_DB_PER_OCTAVE} dB per octave`, () => {
    const thirds = thirdOctavesFromOctaves([0, 100, 100, 100, 100, 100, 100, 100]);
    expect(thirds[4] - thirds[3]).toBeCloseTo(MAX_SLOPE_DB_PER_OCTAVE / 3, 9);
  });

  it(`a fall steeper than ${MAX_SLOPE_DB_PER_OCTAVE} dB per octave is split as a fall of ${MAX_SLOPE_DB_PER_OCTAVE} dB per octave`, () => {
    // The 8 kHz octave at 0 dB under 4 kHz at 100 dB: its one-sided slope, −100 dB per octave, is
    // held at −30, so its thirds (indices 24–26) fall by 10 dB each.
    const thirds = thirdOctavesFromOctaves([100, 100, 100, 100, 100, 100, 100, 0]);
    expect(thirds[25] - thirds[24]).toBeCloseTo(-MAX_SLOPE_DB_PER_OCTAVE / 3, 9);
    expect(thirds[26] - thirds[25]).toBeCloseTo(-MAX_SLOPE_DB_PER_OCTAVE / 3, 9);
  });

  it("all octaves silent: all thirds silent, and the loudness is 0 sone", () => {
    const thirds = thirdOctavesFromOctaves(new Array(8).fill(-Infinity));
    expect(thirds.every((l) => l === -Infinity)).toBe(true);
    expect(loudnessIso532_1(thirds).sone).toBe(0);
  });
});

describe("thirdOctavesFromOctaves: accuracy against a third-octave calculation", () => {
  // Sources with a known third-octave spectrum, carried 30–150 m with spreading and ISO 9613-1 air
  // absorption evaluated at each third's own centre (the engine's atmosphere.ts, itself checked against
  // ISO 9613-1 Table 1); their octave sums go through the rule. Pink and white sources; 24 °C, 55 % RH.
  const AIR = { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325 };
  const centre = (i: number) => 1000 * 10 ** ((i - 16) / 10);
  it.each([
    ["pink", 0],
    ["white", 10 * Math.log10(2) / 3],
    ["falling 6 dB per octave", -2],
  ])("%s source: loudness within 0.15 phon at 30, 60 and 150 m", (_name, dbPerThird) => {
    for (const d of [30, 60, 150]) {
      const truth = Array.from({ length: 28 }, (_, i) => 80 + dbPerThird * (i - 16) - 20 * Math.log10(d / 10) - (airAbsorptionDbPerKm(centre(i), AIR) * d) / 1000);
      const octaves = Array.from({ length: 8 }, (_, k) => 10 * Math.log10(energy(truth, THIRDS_OF_OCTAVE(k), THIRDS_OF_OCTAVE(k) + 3)));
      const derived = thirdOctavesFromOctaves(octaves);
      expect(Math.abs(loudnessIso532_1(derived).phon - loudnessIso532_1(truth).phon)).toBeLessThan(0.15);
    }
  });
});
