// A voice the band plays with noise-like sources (drums, cymbals) masks as noise, as the point's
// background does (pointLoudness, lib/acoustics/point-loudness.ts; masking of tones by noise after
// Zwicker & Fastl, Psychoacoustics, ch. 4, from memory). Two routes reach the same masker: the same
// noise played in the band, or heard as background. A melody must be judged alike over either.
import { describe, expect, it } from "vitest";
import { pointLoudness } from "@/lib/acoustics/point-loudness";
import { thirdOctavesFromOctaves } from "@/lib/acoustics/third-octaves";

const SILENT_THIRDS = new Array<number>(28).fill(-Infinity);
const MELODY = [40, 48, 55, 58, 56, 50, 44, 36]; // a soft woodwind line, dB per octave 63 Hz … 8 kHz
const DRUMS = [70, 74, 72, 68, 66, 64, 60, 54]; // a battery, all noise-like

describe("a noise-like voice masks as the same noise heard as background", () => {
  it("gives the melody the same margin and audibility either way", () => {
    const inBand = pointLoudness({ melody: MELODY, percussion: DRUMS }, SILENT_THIRDS, "free", { percussion: DRUMS });
    const asBackground = pointLoudness({ melody: MELODY }, Array.from(thirdOctavesFromOctaves(DRUMS)), "free");
    expect(inBand.voices.melody!.marginDb).toBeCloseTo(asBackground.voices.melody!.marginDb, 9);
    expect(inBand.voices.melody!.heard).toBe(asBackground.voices.melody!.heard);
    // And the masker matters: the melody over silence rises much further over its threshold.
    const alone = pointLoudness({ melody: MELODY }, SILENT_THIRDS, "free");
    expect(alone.voices.melody!.marginDb).toBeGreaterThan(inBand.voices.melody!.marginDb + 10);
  });

  it("a voice's share of the whole is never negative, even when the rest covers it", () => {
    const r = pointLoudness({ melody: [20, 22, 25, 24, 20, 15, 10, 5], percussion: DRUMS }, SILENT_THIRDS, "free", { percussion: DRUMS });
    expect(r.voices.melody!.shareSone).toBeGreaterThanOrEqual(0);
  });
});
