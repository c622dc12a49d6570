// How the field shows a performer: SHAPE for the instrument family, COLOUR and OUTLINE for the
// voice, so colour is never the only cue. Colours are picked from the Okabe–Ito set, which stays
// distinct for the common colour-vision deficiencies (Okabe & Ito 2008, "Color Universal Design").
import type { Family, VoiceOrTacet } from "@/lib/acoustics/types";

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

export type Shape = "circle" | "triangle" | "square" | "diamond" | "hexagon";

export const FAMILY_SHAPES: Record<Family, { shape: Shape; name: string }> = {
  woodwind: { shape: "circle", name: "Woodwinds" },
  brass: { shape: "triangle", name: "Brass" },
  percussion: { shape: "square", name: "Battery" },
  keyboard: { shape: "diamond", name: "Keyboards" },
  amplified: { shape: "hexagon", name: "Amplified" },
};

/** Outline path of a shape of "radius" r centred on 0,0 (canvas or SVG alike). */
export function shapePoints(shape: Shape, r: number): [number, number][] {
  const poly = (n: number, rot: number, k = 1) =>
    Array.from({ length: n }, (_, i) => {
      const a = rot + (2 * Math.PI * i) / n;
      return [r * k * Math.cos(a), r * k * Math.sin(a)] as [number, number];
    });
  switch (shape) {
    case "triangle":
      return poly(3, -Math.PI / 2, 1.2);
    case "square":
      return poly(4, Math.PI / 4, 1.15);
    case "diamond":
      return poly(4, 0, 1.25);
    case "hexagon":
      return poly(6, 0, 1.1);
    default:
      return [];
  }
}

/** Traces a shape on a canvas context (circle as an arc). */
export function traceShape(ctx: { beginPath(): void; arc(x: number, y: number, r: number, a: number, b: number): void; moveTo(x: number, y: number): void; lineTo(x: number, y: number): void; closePath(): void }, shape: Shape, r: number): void {
  ctx.beginPath();
  if (shape === "circle") ctx.arc(0, 0, r, 0, 2 * Math.PI);
  else {
    const pts = shapePoints(shape, r);
    ctx.moveTo(pts[0][0], pts[0][1]);
    for (const [x, y] of pts.slice(1)) ctx.lineTo(x, y);
  }
  ctx.closePath();
}

/** Halo radius (px) for a performer's level relative to the loudest one at the listening point. */
export function haloRadius(symbolRadius: number, relDb: number | undefined): number {
  if (relDb === undefined || !Number.isFinite(relDb)) return 0;
  const t = Math.min(1, Math.max(0, (relDb + 18) / 18)); // 18 dB below the loudest → no halo
  return t === 0 ? 0 : symbolRadius + 2 + t * symbolRadius * 1.6;
}
