// A performer symbol as a small SVG, drawn like the field draws it (legend, lists).
import { shapePoints, type Shape, type VoiceStyle } from "./palette";

export function SymbolIcon({ shape, style, size = 18, title }: { shape: Shape; style: VoiceStyle; size?: number; title?: string }) {
  const r = size * 0.32;
  const c = size / 2;
  const fill = style.fillAlpha === 0 ? "#ffffff" : style.colour;
  const stroke = style.fillAlpha === 1 ? "#1c2430" : style.colour;
  const common = {
    fill,
    fillOpacity: style.fillAlpha === 0 ? 1 : style.fillAlpha,
    stroke,
    strokeWidth: style.fillAlpha === 0 ? 1.6 : 1.2,
    strokeDasharray: style.dash.length ? style.dash.join(" ") : undefined,
  };
  const outline = (k: number) =>
    shape === "circle" ? null : shapePoints(shape, r * k).map(([x, y]) => `${(c + x).toFixed(2)},${(c + y).toFixed(2)}`).join(" ");
  return (
    <svg width={size} height={size} viewBox={`0 0 ${size} ${size}`} role={title ? "img" : undefined} aria-label={title} aria-hidden={title ? undefined : true}>
      {shape === "circle" ? <circle cx={c} cy={c} r={r} {...common} /> : <polygon points={outline(1)!} {...common} />}
      {style.ring ? (shape === "circle" ? <circle cx={c} cy={c} r={r + 2} fill="none" stroke="#1c2430" strokeWidth={1} /> : <polygon points={outline(1 + 2 / r)!} fill="none" stroke="#1c2430" strokeWidth={1} />) : null}
    </svg>
  );
}
