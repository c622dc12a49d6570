// analyzeSet: the box mix of one set at every listening point.
import { backgroundThirdOctaves, type Background } from "./background";
import { catalogOf } from "./box-players";
import { createSetEvaluator } from "./evaluator";
import { pointLoudness, type PointLoudness, type VoiceLoudness } from "./point-loudness";
import type { AnalysisInput, AnalysisResult, PointResult } from "./types";

/** Families whose sound masks as noise rather than as tones (audibility.ts): the battery's drums and cymbals. */
export const NOISE_LIKE_FAMILIES: readonly string[] = ["percussion"];

/** Per group (a voice, or a section with `by`), the octave levels (dB) of its noise-like players at a point; groups without any are absent. */
export function noiseLikeVoiceBands(input: AnalysisInput, point: PointResult, by: "voice" | "section" = "voice"): Record<string, number[]> {
  const catalog = catalogOf(input);
  const byId = new Map(point.performers.map((p) => [p.id, p]));
  const energy: Record<string, number[]> = {};
  for (const perf of input.performers) {
    const res = byId.get(perf.id);
    if (perf.voice === "tacet" || !res || !NOISE_LIKE_FAMILIES.includes(catalog[perf.instrument]?.family ?? "")) continue;
    const e = (energy[by === "voice" ? perf.voice : perf.section] ??= res.bandsDb.map(() => 0));
    res.bandsDb.forEach((l, b) => (e[b] += 10 ** (l / 10)));
  }
  return Object.fromEntries(Object.entries(energy).map(([group, e]) => [group, e.map((x) => 10 * Math.log10(x))]));
}

/**
 * Loudness of each section at a point, as pointLoudness gives each voice's: its own sone and phon,
 * its share of the whole (with it minus without it, background included) and whether it is heard
 * over the other sections and the background. Sections whose players are all silent are absent.
 */
export function sectionLoudness(input: AnalysisInput, point: PointResult): Record<string, VoiceLoudness> {
  const bands: Record<string, number[]> = {};
  for (const [section, level] of Object.entries(point.sections)) bands[section] = level.bandsDb;
  const lp = input.listeningPoints.find((l) => l.id === point.listeningPointId);
  return pointLoudness(bands, backgroundThirdOctaves(lp?.background), "free", noiseLikeVoiceBands(input, point, "section")).voices;
}

/** The loudness at a point (ISO 532-1, point-loudness.ts) of its voices' levels over the point's background. */
export function loudnessOfPoint(input: AnalysisInput, point: PointResult, background: Background | null | undefined): PointLoudness {
  const voiceBands: Record<string, number[]> = {};
  for (const [voice, level] of Object.entries(point.voices)) if (level) voiceBands[voice] = level.bandsDb;
  return pointLoudness(voiceBands, backgroundThirdOctaves(background), "free", noiseLikeVoiceBands(input, point));
}

/**
 * Predicted levels of every performer, section, voice and the whole band at each listening
 * point, per octave band and A-weighted, with arrival times, and the loudness of the band and of
 * each voice with the point's background (ISO 532-1, point-loudness.ts). Tacet performers are
 * listed with dbA and bandsDb at -Infinity (not JSON-safe: see toJsonSafe) and an arrivalMs, and
 * are left out of every sum and of the arrival spread. A voice no one plays is absent from
 * `voices`; a section whose players are all tacet is present at -Infinity.
 */
export function analyzeSet(input: AnalysisInput): AnalysisResult {
  const evaluator = createSetEvaluator(input);
  evaluator.evaluate();
  const result = evaluator.result();
  result.points.forEach((point, n) => {
    point.loudness = loudnessOfPoint(input, point, input.listeningPoints[n].background);
  });
  return result;
}
