// The whole field to scale as SVG (front sideline at the bottom, side 1 on the left) with every dot.
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, yardLines, YARD_M, type FieldRules } from "@/lib/field/geometry";

const FRONT_ROOM = 7;
const BACK_ROOM = 2;

export function FieldDrawing({ rules, dots, title }: { rules: FieldRules; dots: { label: string; x: number; y: number }[]; title: string }) {
  const h = hashesY(rules);
  const width = 2 * END_LINE_X_M;
  const height = FIELD_WIDTH_M + FRONT_ROOM + BACK_ROOM;
  // SVG y grows downward: field y = FIELD_WIDTH_M + BACK_ROOM - svgY.
  const sy = (y: number) => FIELD_WIDTH_M + BACK_ROOM - y;
  const sx = (x: number) => x + END_LINE_X_M;
  return (
    <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={title} className="w-full rounded border border-ink/20 bg-white">
      <rect x={0} y={sy(FIELD_WIDTH_M)} width={width} height={FIELD_WIDTH_M} fill="#eef6ee" stroke="#1f2933" strokeWidth={0.15} />
      {yardLines().map((l) => (
        <g key={l.x}>
          <line x1={sx(l.x)} x2={sx(l.x)} y1={sy(FIELD_WIDTH_M)} y2={sy(0)} stroke={Math.abs(l.x) === GOAL_LINE_X_M ? "#1f2933" : "#8aa68a"} strokeWidth={Math.abs(l.x) === GOAL_LINE_X_M ? 0.25 : 0.1} />
          {l.numbered ? (
            <text x={sx(l.x)} y={sy(3)} fontSize={2.2} textAnchor="middle" fill="#7a937a" fontWeight={700}>
              {l.yard}
            </text>
          ) : null}
        </g>
      ))}
      {Array.from({ length: 101 }, (_, k) => (k - 50) * YARD_M).flatMap((x) =>
        [h.front, h.back].map((y) => <line key={`${x}-${y}`} x1={sx(x)} x2={sx(x)} y1={sy(y) - 0.4} y2={sy(y) + 0.4} stroke="#8aa68a" strokeWidth={0.08} />),
      )}
      <text x={1} y={sy(FIELD_WIDTH_M) - 0.6} fontSize={1.6} fill="#6b7280">
        Side 1
      </text>
      <text x={width - 1} y={sy(FIELD_WIDTH_M) - 0.6} fontSize={1.6} fill="#6b7280" textAnchor="end">
        Side 2
      </text>
      <text x={width / 2} y={height - 0.6} fontSize={1.6} fill="#6b7280" textAnchor="middle">
        Front sideline, press box side
      </text>
      {dots.map((d) => (
        <g key={d.label}>
          <circle cx={sx(d.x)} cy={sy(d.y)} r={0.45} fill="#1f2933" />
          <text x={sx(d.x) + 0.6} y={sy(d.y) - 0.5} fontSize={1.1} fill="#1f2933">
            {d.label}
          </text>
        </g>
      ))}
    </svg>
  );
}
