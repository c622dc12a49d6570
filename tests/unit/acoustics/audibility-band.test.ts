// "Heard" in a band: the judgement of audibility.ts on voices shaped like the catalog's instruments.
import { describe, expect, it } from "vitest";
import { BACKGROUND_PRESET_SPECS, backgroundThirdOctaves } from "@/lib/acoustics/background";
import { OCTAVE_BANDS } from "@/lib/acoustics/bands";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { instrumentBandsInto } from "@/lib/acoustics/instrument";
import { maskingIndexDb } from "@/lib/acoustics/audibility";
import { pointLoudness } from "@/lib/acoustics/point-loudness";
import type { Dynamic } from "@/lib/acoustics/types";
import { aWeightingDb } from "@/lib/acoustics/weighting";
import { lazy } from "./helpers";

const quiet = lazy(() => backgroundThirdOctaves(null));
const dbA = (bands: number[]) => 10 * Math.log10(bands.reduce((s, l, b) => s + 10 ** ((l + aWeightingDb(OCTAVE_BANDS[b].exactHz)) / 10), 0));
/** Octave levels at the point of `n` players of an instrument at a dynamic, scaled to `level` dBA. */
function voice(instrument: string, dynamic: Dynamic, level: number): number[] {
  const out = new Float64Array(8);
  instrumentBandsInto(DEFAULT_INSTRUMENTS[instrument], dynamic, out);
  const bands = Array.from(out);
  const shift = level - dbA(bands);
  return bands.map((l) => l + shift);
}
/** Energy sum of octave-level lists. */
const sum = (...lists: number[][]) => lists[0].map((_, b) => 10 * Math.log10(lists.reduce((s, l) => s + 10 ** (l[b] / 10), 0)));

describe("heard in a band (ISO/IEC 11172-3 Annex D model 1 masking on ISO 532-1 critical bands)", () => {
  it("the tonal masking index is model 1's av_tm = −1.525 − 0.275·z − 4.5 dB (rajmic/declipping2020_codes Methods/l1_relaxation/masking2.m @ 7170fbfe9149406221163fb576b58e81256f583c)", () => {
    expect(maskingIndexDb(10, "tonal")).toBeCloseTo(-1.525 - 2.75 - 4.5, 12);
    expect(maskingIndexDb(10, "noise")).toBeCloseTo(-1.525 - 1.75 - 0.5, 12);
  });

  it("a trumpet melody on top of a brass accompaniment is heard, and so is the accompaniment 2 dB under a wind melody (harmonic maskers mask as tones, model 1)", () => {
    const melody = voice("trumpet", "f", 70);
    const accompaniment = sum(voice("trombone", "mf", 62), voice("mellophone", "mf", 62), voice("baritone", "mf", 60));
    const r = pointLoudness({ melody, accompaniment, bass: voice("tuba", "mf", 58) }, quiet());
    expect(r.voices.melody.heard).toBe(true);
    expect(r.voices.melody.marginDb).toBeGreaterThan(6);
    // The demo's old case: a sax and mellophone melody at 55 dBA, 2 dB under a wind accompaniment of 57 dBA.
    const saxMelody = sum(voice("alto-sax", "mf", 52), voice("mellophone", "mf", 52));
    const winds = sum(voice("clarinet", "mp", 51), voice("trumpet", "mp", 54), voice("trombone", "mp", 52));
    expect(pointLoudness({ melody: saxMelody, accompaniment: winds }, quiet()).voices.melody.heard).toBe(true);
  });

  it("a clarinet countermelody 8 dB under the rest of the winds is still heard: harmonic maskers leave 6–11 dB (model 1's tonal index), not the 2–6 dB of noise", () => {
    const rest = sum(voice("trumpet", "f", 66), voice("mellophone", "mf", 62), voice("trombone", "mf", 62), voice("tuba", "mf", 58));
    const counter = voice("clarinet", "f", dbA(rest) - 8);
    const r = pointLoudness({ countermelody: counter, melody: rest }, quiet());
    expect(r.voices.countermelody.heard).toBe(true);
  });

  it("a pp flute 40 dB under a full brass band is masked", () => {
    const brass = sum(voice("trumpet", "ff", 85), voice("mellophone", "ff", 82), voice("trombone", "ff", 84), voice("tuba", "ff", 80));
    const flute = voice("flute", "pp", dbA(brass) - 40);
    const r = pointLoudness({ countermelody: flute, melody: brass }, quiet());
    expect(r.voices.countermelody.heard).toBe(false);
    expect(r.voices.melody.heard).toBe(true);
  });

  it("a voice at 10 dBA is not heard under a crowd during a performance (55 dBA), though at 50 dBA on a quiet practice field (about 42 dBA) it is", () => {
    const crowd = backgroundThirdOctaves({ preset: "crowd-during-performance" });
    expect(BACKGROUND_PRESET_SPECS["crowd-during-performance"].dbA).toBe(55);
    expect(pointLoudness({ melody: voice("clarinet", "mf", 10) }, crowd).voices.melody.heard).toBe(false);
    expect(pointLoudness({ melody: voice("clarinet", "mf", 50) }, backgroundThirdOctaves({ preset: "quiet-field" })).voices.melody.heard).toBe(true);
  });

  it("drums mask as noise: the same level of battery hides a voice that as many winds leave audible", () => {
    const melody = voice("clarinet", "mf", 60);
    const battery = sum(voice("snare", "mf", 64), voice("tenors", "mf", 62));
    const asNoise = pointLoudness({ melody, percussion: battery }, quiet(), "free", { percussion: battery });
    const asTones = pointLoudness({ melody, percussion: battery }, quiet());
    expect(asNoise.voices.melody.marginDb).toBeLessThan(asTones.voices.melody.marginDb - 3);
  });
});
