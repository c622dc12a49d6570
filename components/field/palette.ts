// How the field shows a performer: a WEDGE toward the facing as wide as the instrument throws its
// sound (lib/field/marks.ts), COLOUR and OUTLINE of the dot for the voice, so colour is never the only cue. Colours are picked from the Okabe–Ito set, which stays
// distinct for the common colour-vision deficiencies (Okabe & Ito 2008, "Color Universal Design").
import type { VoiceOrTacet } from "@/lib/acoustics/types";

export interface VoiceStyle {
  name: string;
  colour: string;
  /** Fill opacity of the symbol. */
  fillAlpha: number;
  /** Outline dash pattern in px (empty = solid). */
  dash: number[];
  /** A second ring around the symbol. */
  ring: boolean;
  /** What the outline looks like, in words, for the legend. */
  outline: string;
}

export const VOICE_STYLES: Record<VoiceOrTacet, VoiceStyle> = {
  melody: { name: "Melody", colour: "#D55E00", fillAlpha: 1, dash: [], ring: false, outline: "solid" },
  countermelody: { name: "Countermelody", colour: "#0072B2", fillAlpha: 1, dash: [3, 2], ring: false, outline: "dashed" },
  accompaniment: { name: "Accompaniment", colour: "#009E73", fillAlpha: 0.45, dash: [], ring: false, outline: "light fill" },
  bass: { name: "Bass", colour: "#CC79A7", fillAlpha: 1, dash: [], ring: true, outline: "double ring" },
  percussion: { name: "Percussion", colour: "#E69F00", fillAlpha: 1, dash: [1, 2], ring: false, outline: "dotted" },
  tacet: { name: "Tacet", colour: "#9AA1AB", fillAlpha: 0, dash: [2, 2], ring: false, outline: "hollow" },
};

export const VOICE_ORDER: VoiceOrTacet[] = ["melody", "countermelody", "accompaniment", "bass", "percussion", "tacet"];

/** Halo radius (px) for a performer's level relative to the loudest one at the listening point. */
export function haloRadius(symbolRadius: number, relDb: number | undefined): number {
  if (relDb === undefined || !Number.isFinite(relDb)) return 0;
  const t = Math.min(1, Math.max(0, (relDb + 18) / 18)); // 18 dB below the loudest → no halo
  return t === 0 ? 0 : symbolRadius + 2 + t * symbolRadius * 1.6;
}
