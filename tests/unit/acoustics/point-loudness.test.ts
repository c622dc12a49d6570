import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { loudnessIso532_1, thirdOctavesFromOctaves } from "@/lib/acoustics";
import { backgroundThirdOctaves } from "@/lib/acoustics/background";
import { pointLoudness } from "@/lib/acoustics/point-loudness";
import { lazy } from "./helpers";

const quiet = lazy(() => backgroundThirdOctaves(null));
const stadium = lazy(() => backgroundThirdOctaves({ preset: "stadium-between-bands" }));
const MELODY = [50, 60, 70, 75, 75, 70, 62, 55];
const BASS = [80, 85, 80, 70, 60, 50, 40, 30];

describe("pointLoudness", () => {
  it("nobody sounding: 0 sone and no voices", () => {
    const r = pointLoudness({}, quiet());
    expect(r.totalSone).toBe(0);
    expect(r.voices).toEqual({});
  });

  it("a voice alone in quiet: its share is all of its own loudness (ISO 532-1 on its derived third-octaves), and it is heard", () => {
    const r = pointLoudness({ melody: MELODY }, quiet());
    const own = loudnessIso532_1(thirdOctavesFromOctaves(MELODY)).sone;
    expect(r.totalSone).toBeCloseTo(own, 9);
    expect(r.voices.melody.sone).toBeCloseTo(own, 9);
    expect(r.voices.melody.shareSone).toBeCloseTo(own, 9);
    expect(r.voices.melody.heard).toBe(true);
  });

  it("two equal voices together are as loud as one 3 dB louder (energies add), and share equally", () => {
    const r = pointLoudness({ melody: MELODY, countermelody: MELODY }, quiet());
    expect(r.totalSone).toBeCloseTo(loudnessIso532_1(thirdOctavesFromOctaves(MELODY.map((l) => l + 10 * Math.log10(2)))).sone, 9);
    expect(r.voices.melody.shareSone).toBeCloseTo(r.voices.countermelody.shareSone, 9);
  });

  it("a voice adds less than its own loudness to a band, and less still over a stadium crowd (partial masking)", () => {
    const band = pointLoudness({ melody: MELODY, bass: BASS }, quiet());
    const crowd = pointLoudness({ melody: MELODY, bass: BASS }, stadium());
    expect(band.voices.melody.shareSone).toBeLessThan(band.voices.melody.sone);
    expect(crowd.voices.melody.shareSone).toBeLessThan(band.voices.melody.shareSone);
    expect(crowd.backgroundSone).toBeGreaterThan(0);
    expect(crowd.totalSone).toBeCloseTo(band.totalSone, 9); // the band's own total leaves the crowd out
  });

  // Within 0.01 sone: energy below the threshold in quiet (own loudness 0) still adds a trace to bands
  // the others make audible.
  it("no voice adds more than its own loudness (within 0.01 sone), nor a negative amount (fast-check)", () => {
    const octaves = fc.array(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 8, maxLength: 8 });
    fc.assert(
      fc.property(octaves, octaves, fc.boolean(), (a, b, crowd) => {
        const r = pointLoudness({ melody: a, bass: b }, crowd ? stadium() : quiet());
        for (const v of Object.values(r.voices)) {
          expect(v.shareSone).toBeGreaterThanOrEqual(0);
          expect(v.shareSone).toBeLessThanOrEqual(v.sone + 0.01);
        }
      }),
      { numRuns: 60 },
    );
  });

  it("a soft woodwind melody under loud low brass and a stadium crowd is not heard; alone on a quiet field it is", () => {
    const soft = [20, 28, 35, 42, 45, 40, 33, 25];
    expect(pointLoudness({ melody: soft, bass: BASS }, stadium()).voices.melody.heard).toBe(false);
    expect(pointLoudness({ melody: soft }, backgroundThirdOctaves({ preset: "quiet-field" })).voices.melody.heard).toBe(true);
  });

  it("a voice with every band silent is left out", () => {
    const r = pointLoudness({ melody: MELODY, percussion: new Array(8).fill(-Infinity) }, quiet());
    expect(Object.keys(r.voices)).toEqual(["melody"]);
  });
});
