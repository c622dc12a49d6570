// Loudness of the band and of each voice at one listening point, from the voices' octave levels and
// the point's background: totals and per-voice loudness by ISO 532-1 (loudness.ts) on third-octaves
// derived from the octave bands (third-octaves.ts); each voice's share of the whole (loudness of
// everything with it minus without it, background included); and whether it is heard at all over
// the rest of the band and the background (audibility.ts): the band's pitched players mask as tones,
// its drums and cymbals and the background as noise.
import { audibility, criticalBandLevelsInto, globalMaskedThresholdInto } from "./audibility";
import { BAND_COUNT } from "./bands";
import { loudnessIso532_1, soneToPhon, type SoundField } from "./loudness";
import { CORE_BAND_COUNT, THIRD_OCTAVE_COUNT } from "./loudness-tables";
import { thirdOctavesFromOctavesInto } from "./third-octaves";

export interface VoiceLoudness {
  /** The voice's own loudness, heard alone (sone, phon). */
  sone: number;
  phon: number;
  /** What it adds to the loudness of everything at the point: with it minus without it (sone). */
  shareSone: number;
  /** Audible over the rest of the band and the background in at least one critical band. */
  heard: boolean;
  /** How far (dB) it rises over its masked threshold where it rises most; negative when masked. */
  marginDb: number;
}

export interface PointLoudness {
  /** The band alone (sone, phon). */
  totalSone: number;
  totalPhon: number;
  /** The background alone (sone). */
  backgroundSone: number;
  voices: Record<string, VoiceLoudness>;
}

const T = THIRD_OCTAVE_COUNT;
const LN10_10 = Math.LN10 / 10;
const toDb = (e: number) => 10 * Math.log10(e);

/**
 * Loudness at a listening point. `voiceOctaveDb` maps each sounding voice to its 8 octave levels
 * (63 Hz … 8 kHz, dB SPL); `backgroundThirdOctaveDb` is the point's 28 background levels (all
 * −Infinity for none). `noiseLikeOctaveDb` gives, per voice, the part of its levels played by
 * noise-like sources (drums, cymbals); the rest masks as tones. Voices whose every band is silent are left out.
 */
export function pointLoudness(
  voiceOctaveDb: Record<string, ArrayLike<number>>,
  backgroundThirdOctaveDb: ArrayLike<number>,
  field: SoundField = "free",
  noiseLikeOctaveDb: Record<string, ArrayLike<number>> = {},
): PointLoudness {
  const names = Object.keys(voiceOctaveDb);
  const V = names.length;
  const thirds = new Float64Array(T);
  const energy = new Float64Array(V * T); // per voice, per third-octave
  const noise = new Float64Array(V * T); // its noise-like part
  const tonal = new Float64Array(V * T); // its tonal part
  const octave = new Float64Array(BAND_COUNT);
  const all = new Float64Array(T);
  const bg = new Float64Array(T);
  for (let t = 0; t < T; t++) bg[t] = Math.exp(backgroundThirdOctaveDb[t] * LN10_10);
  const sounding: number[] = [];
  for (let v = 0; v < V; v++) {
    thirdOctavesFromOctavesInto(voiceOctaveDb[names[v]], thirds);
    let any = false;
    for (let t = 0; t < T; t++) {
      const e = Math.exp(thirds[t] * LN10_10);
      energy[v * T + t] = e;
      all[t] += e;
      if (e > 0) any = true;
    }
    if (any) sounding.push(v);
    const noisy = noiseLikeOctaveDb[names[v]];
    if (!noisy) {
      tonal.set(energy.subarray(v * T, (v + 1) * T), v * T);
      continue;
    }
    // Each part's thirds from its own octaves (the derivation follows a spectrum's slope, so the parts are derived apart).
    for (const [part, levels] of [
      [noise, noisy],
      [tonal, Array.from(octave, (_, b) => toDb(Math.max(0, Math.exp(voiceOctaveDb[names[v]][b] * LN10_10) - Math.exp(noisy[b] * LN10_10))))],
    ] as const) {
      thirdOctavesFromOctavesInto(levels, thirds);
      for (let t = 0; t < T; t++) part[v * T + t] = Math.exp(thirds[t] * LN10_10);
    }
  }
  const levels = new Float64Array(T);
  const loudnessOf = (fill: (t: number) => number) => {
    for (let t = 0; t < T; t++) levels[t] = toDb(fill(t));
    return loudnessIso532_1(levels, field).sone;
  };
  const totalSone = loudnessOf((t) => all[t]);
  const backgroundSone = loudnessOf((t) => bg[t]);
  const wholeSone = loudnessOf((t) => all[t] + bg[t]);

  const cb = new Float64Array(CORE_BAND_COUNT);
  const tonalCb = new Float64Array(CORE_BAND_COUNT);
  const threshold = new Float64Array(CORE_BAND_COUNT);
  const voices: Record<string, VoiceLoudness> = {};
  for (const v of sounding) {
    const own = loudnessOf((t) => energy[v * T + t]);
    // Everything but this voice, summed afresh rather than subtracted, so no rounding goes negative.
    const restOf = (t: number) => {
      let e = bg[t];
      for (const u of sounding) if (u !== v) e += energy[u * T + t];
      return e;
    };
    const withoutSone = loudnessOf(restOf);
    // The masker: the rest's tonal part, and its noise-like part with the background.
    const partOfRest = (part: Float64Array, t: number) => {
      let e = 0;
      for (const u of sounding) if (u !== v) e += part[u * T + t];
      return e;
    };
    for (let t = 0; t < T; t++) levels[t] = toDb(partOfRest(tonal, t));
    criticalBandLevelsInto(levels, tonalCb);
    for (let t = 0; t < T; t++) levels[t] = toDb(partOfRest(noise, t) + bg[t]);
    criticalBandLevelsInto(levels, cb);
    globalMaskedThresholdInto(tonalCb, cb, threshold);
    for (let t = 0; t < T; t++) levels[t] = toDb(energy[v * T + t]);
    criticalBandLevelsInto(levels, cb);
    const heard = audibility(cb, threshold);
    const share = wholeSone - withoutSone;
    voices[names[v]] = { sone: own, phon: soneToPhon(own), shareSone: share > 0 ? share : 0, heard: heard.heard, marginDb: heard.marginDb };
  }
  return { totalSone, totalPhon: soneToPhon(totalSone), backgroundSone, voices };
}
