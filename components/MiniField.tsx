"use client";
// A small drawing of one set's dots on the field (side 1 left, the front sideline at the bottom, as
// seen from the press box). A dot with a facing and a spread is drawn as a performer's mark (the
// sound wedge, PerformerMark); the highlighted ones are larger and orange.
import { PerformerMark } from "./field/PerformerMark";
import { VOICE_STYLES } from "./field/palette";

type Dot = { performerId: string; x: number; y: number; facingDeg?: number; spreadDeg?: number };
const HALF = 54.864;
const WIDTH = 48.768;
const PLAIN = { ...VOICE_STYLES.tacet, colour: "#1c2430", fillAlpha: 1, dash: [] };
const MARKED = { ...VOICE_STYLES.melody, colour: "#D55E00", ring: true };

export function MiniField({ dots, highlight, title }: { dots: Dot[]; highlight: Set<string>; title: string }) {
  const sx = (x: number) => ((x + HALF) / (2 * HALF)) * 440;
  const sy = (y: number) => 200 - (y / WIDTH) * 200;
  return (
    <svg viewBox="-10 -10 460 220" role="img" aria-label={title} className="w-full rounded-lg bg-turf-light">
      <rect x={sx(-45.72)} y={0} width={sx(45.72) - sx(-45.72)} height={200} fill="none" stroke="#2f6b46" strokeWidth={1.5} />
      {Array.from({ length: 21 }, (_, i) => -45.72 + i * 4.572).map((x) => <line key={x} x1={sx(x)} x2={sx(x)} y1={0} y2={200} stroke="#2f6b46" strokeOpacity={0.35} />)}
      {dots.map((d) => {
        const on = highlight.has(d.performerId);
        return d.facingDeg !== undefined && d.spreadDeg !== undefined ? (
          <PerformerMark key={d.performerId} cx={sx(d.x)} cy={sy(d.y)} r={on ? 4 : 2.6} facingDeg={d.facingDeg} spreadDeg={d.spreadDeg} style={on ? MARKED : PLAIN} />
        ) : (
          <circle key={d.performerId} cx={sx(d.x)} cy={sy(d.y)} r={on ? 5 : 3} fill={on ? "#D55E00" : "#1c2430"} />
        );
      })}
    </svg>
  );
}
