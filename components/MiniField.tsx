"use client";
// A small drawing of one set's dots on the field (side 1 left, the front sideline at the bottom, as seen from the press box).
type Dot = { performerId: string; x: number; y: number };
const HALF = 54.864;
const WIDTH = 48.768;

export function MiniField({ dots, highlight, title }: { dots: Dot[]; highlight: Set<string>; title: string }) {
  const sx = (x: number) => ((x + HALF) / (2 * HALF)) * 440;
  const sy = (y: number) => 200 - (y / WIDTH) * 200;
  return (
    <svg viewBox="-10 -10 460 220" role="img" aria-label={title} className="w-full rounded-lg bg-turf-light">
      <rect x={sx(-45.72)} y={0} width={sx(45.72) - sx(-45.72)} height={200} fill="none" stroke="#2f6b46" strokeWidth={1.5} />
      {Array.from({ length: 21 }, (_, i) => -45.72 + i * 4.572).map((x) => <line key={x} x1={sx(x)} x2={sx(x)} y1={0} y2={200} stroke="#2f6b46" strokeOpacity={0.35} />)}
      {dots.map((d) => (
        <circle key={d.performerId} cx={sx(d.x)} cy={sy(d.y)} r={highlight.has(d.performerId) ? 5 : 3} fill={highlight.has(d.performerId) ? "#D55E00" : "#1c2430"} />
      ))}
    </svg>
  );
}
