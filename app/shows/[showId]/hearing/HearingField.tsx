// The field seen from the press box (front sideline at the bottom, side 1 on the left), each
// performer a dot coloured by the level at their ears; a dark ring where the dose passes the limit.
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, yardLines, type FieldRules } from "@/lib/field/geometry";
import { levelStep, type HearingPerformer } from "./hearing-types";

const MARGIN = 4;

export function HearingField({ performers, rules, standard, selectedId, onSelect }: { performers: HearingPerformer[]; rules: FieldRules; standard: "niosh" | "osha"; selectedId: string | null; onSelect: (id: string) => void }) {
  const w = 2 * END_LINE_X_M + 2 * MARGIN;
  const h = FIELD_WIDTH_M + 2 * MARGIN;
  // Screen: x right toward side 2, y down toward the front sideline.
  const sx = (x: number) => x + END_LINE_X_M + MARGIN;
  const sy = (y: number) => FIELD_WIDTH_M - y + MARGIN;
  const hashes = hashesY(rules);
  return (
    <svg viewBox={`0 0 ${w} ${h}`} className="h-auto w-full rounded-lg border border-ink/15" role="img" aria-label="Field with each performer coloured by the estimated level at their ears">
      <rect x={0} y={0} width={w} height={h} fill="#dcebdf" />
      <rect x={sx(-END_LINE_X_M)} y={sy(FIELD_WIDTH_M)} width={2 * END_LINE_X_M} height={FIELD_WIDTH_M} fill="#cfe3d3" stroke="#5f7d5b" strokeWidth={0.3} />
      {[-1, 1].map((side) => (
        <rect key={side} x={side < 0 ? sx(-END_LINE_X_M) : sx(GOAL_LINE_X_M)} y={sy(FIELD_WIDTH_M)} width={END_LINE_X_M - GOAL_LINE_X_M} height={FIELD_WIDTH_M} fill="#c3dac8" />
      ))}
      {yardLines().map((l) => (
        <g key={l.x}>
          <line x1={sx(l.x)} x2={sx(l.x)} y1={sy(0)} y2={sy(FIELD_WIDTH_M)} stroke={l.yard % 10 === 0 ? "#5f7d5b" : "#8da889"} strokeWidth={l.yard === 50 ? 0.35 : 0.2} />
          {l.numbered ? (
            <text x={sx(l.x)} y={sy(3.5)} fontSize={2.2} textAnchor="middle" fill="#6d8769">{l.yard}</text>
          ) : null}
        </g>
      ))}
      {[hashes.front, hashes.back].map((y) => (
        <line key={y} x1={sx(-GOAL_LINE_X_M)} x2={sx(GOAL_LINE_X_M)} y1={sy(y)} y2={sy(y)} stroke="#8da889" strokeWidth={0.15} strokeDasharray="0.6 1.686" />
      ))}
      <text x={sx(0)} y={h - 0.9} fontSize={1.8} textAnchor="middle" fill="#4a5566">Front sideline (press box side)</text>
      <text x={sx(-END_LINE_X_M) + 1} y={h - 0.9} fontSize={1.8} fill="#4a5566">Side 1</text>
      <text x={sx(END_LINE_X_M) - 1} y={h - 0.9} fontSize={1.8} textAnchor="end" fill="#4a5566">Side 2</text>
      {performers.map((p) => {
        const step = levelStep(p.dbA);
        const over = p[standard].dose >= 1;
        const selected = p.performerId === selectedId;
        return (
          <g key={p.performerId} onClick={() => onSelect(p.performerId)} className="cursor-pointer">
            <title>{`${p.label} (${p.section}): ${p.dbA === null ? "no one else sounding" : `${p.dbA.toFixed(1)} dBA`}`}</title>
            {over ? <circle cx={sx(p.x)} cy={sy(p.y)} r={1.25} fill="none" stroke="#1c2430" strokeWidth={0.3} /> : null}
            <circle cx={sx(p.x)} cy={sy(p.y)} r={0.85} fill={step.fill} stroke={selected ? "#1f6fb5" : "#1c2430"} strokeWidth={selected ? 0.35 : 0.1} />
            <text x={sx(p.x)} y={sy(p.y) - 1.5} fontSize={0.9} textAnchor="middle" fill="#1c2430">{p.label}</text>
          </g>
        );
      })}
    </svg>
  );
}
