// The field seen from the press box (front sideline at the bottom, side 1 on the left), zoomed to
// where the band stands; each performer's mark (the sound wedge of their instrument toward their
// facing, in their voice's colour) with the dot coloured by the level at their ears, outlined dark
// where the dose passes the limit. Labels for the most exposed players and the selected one.
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, yardLines, type FieldRules } from "@/lib/field/geometry";
import { PerformerMark } from "@/components/field/PerformerMark";
import { VOICE_STYLES } from "@/components/field/palette";
import type { VoiceOrTacet } from "@/lib/acoustics/types";
import { instrumentSpreadDeg } from "@/lib/field/marks";
import { levelStep, type HearingPerformer } from "./hearing-types";

const PAD_X = 8;
const PAD_Y = 5;
const MIN_WIDTH = 45;
const DOT_R = 0.6;
const LABELLED = 6;

type Props = { performers: HearingPerformer[]; rules: FieldRules; standard: "niosh" | "osha"; selectedId: string | null; onSelect: (id: string) => void };

/** The part of the field (m) to show: the band's extent with room around it, never beyond the field's surroundings. */
function extent(performers: HearingPerformer[]) {
  const xs = performers.map((p) => p.x);
  const ys = performers.map((p) => p.y);
  let x0 = Math.max(Math.min(...xs, 0) - PAD_X, -END_LINE_X_M - 2);
  let x1 = Math.min(Math.max(...xs, 0) + PAD_X, END_LINE_X_M + 2);
  if (x1 - x0 < MIN_WIDTH) {
    const c = (x0 + x1) / 2;
    x0 = Math.max(c - MIN_WIDTH / 2, -END_LINE_X_M - 2);
    x1 = Math.min(x0 + MIN_WIDTH, END_LINE_X_M + 2);
  }
  const y0 = Math.min(Math.min(...ys) - PAD_Y, -4); // room below the front sideline for its label
  const y1 = Math.min(Math.max(Math.max(...ys) + PAD_Y, FIELD_WIDTH_M / 2), FIELD_WIDTH_M + 2);
  return { x0, x1, y0, y1 };
}

export function HearingField({ performers, rules, standard, selectedId, onSelect }: Props) {
  const { x0, x1, y0, y1 } = extent(performers);
  const w = x1 - x0;
  const font = w * 0.018;
  // Screen: x right toward side 2, y down toward the front sideline.
  const sx = (x: number) => x - x0;
  const sy = (y: number) => y1 - y;
  const hashes = hashesY(rules);
  const labelled = new Set(
    [...performers]
      .sort((a, b) => (b.dbA ?? -Infinity) - (a.dbA ?? -Infinity))
      .slice(0, LABELLED)
      .map((p) => p.performerId),
  );
  if (selectedId) labelled.add(selectedId);
  return (
    <svg viewBox={`0 0 ${w} ${y1 - y0}`} className="h-auto w-full rounded-lg border border-ink/15" role="img" aria-label="The field with each performer coloured by the estimated level at their ears">
      <rect x={0} y={0} width={w} height={y1 - y0} fill="#dcebdf" />
      <rect x={sx(-END_LINE_X_M)} y={sy(FIELD_WIDTH_M)} width={2 * END_LINE_X_M} height={FIELD_WIDTH_M} fill="#cfe3d3" stroke="#5f7d5b" strokeWidth={0.25} />
      {[-1, 1].map((side) => (
        <rect key={side} x={side < 0 ? sx(-END_LINE_X_M) : sx(GOAL_LINE_X_M)} y={sy(FIELD_WIDTH_M)} width={END_LINE_X_M - GOAL_LINE_X_M} height={FIELD_WIDTH_M} fill="#c3dac8" />
      ))}
      {yardLines().map((l) => (
        <g key={l.x}>
          <line x1={sx(l.x)} x2={sx(l.x)} y1={sy(0)} y2={sy(FIELD_WIDTH_M)} stroke={l.yard % 10 === 0 ? "#5f7d5b" : "#8da889"} strokeWidth={l.yard === 50 ? 0.3 : 0.15} />
          {l.numbered ? (
            <text x={sx(l.x)} y={sy(3)} fontSize={font * 1.4} textAnchor="middle" fill="#6d8769">
              {l.yard}
            </text>
          ) : null}
        </g>
      ))}
      {[hashes.front, hashes.back].map((y) => (
        <line key={y} x1={sx(-GOAL_LINE_X_M)} x2={sx(GOAL_LINE_X_M)} y1={sy(y)} y2={sy(y)} stroke="#8da889" strokeWidth={0.15} strokeDasharray="0.6 1.686" />
      ))}
      <text x={w / 2} y={sy(y0) - font * 0.6} fontSize={font} textAnchor="middle" fill="#4a5566">
        Front sideline (press box side) ↓
      </text>
      <text x={font * 0.6} y={sy(y0) - font * 0.6} fontSize={font} fill="#4a5566">
        ← Side 1
      </text>
      <text x={w - font * 0.6} y={sy(y0) - font * 0.6} fontSize={font} textAnchor="end" fill="#4a5566">
        Side 2 →
      </text>
      {performers.map((p) => {
        const over = p[standard].dose >= 1;
        const selected = p.performerId === selectedId;
        return (
          <g key={p.performerId} onClick={() => onSelect(p.performerId)} className="cursor-pointer">
            <title>{`${p.label} (${p.section}): ${p.dbA === null ? "no one else sounding" : `${p.dbA.toFixed(1)} dBA`}`}</title>
            <PerformerMark
              cx={sx(p.x)}
              cy={sy(p.y)}
              r={DOT_R}
              // Shorter wedges here: the level colour of the dot is what this map reads.
              reach={1.9}
              facingDeg={p.facingDeg}
              spreadDeg={instrumentSpreadDeg(p.instrument)}
              style={VOICE_STYLES[(p.voice in VOICE_STYLES ? p.voice : "tacet") as VoiceOrTacet]}
              dotFill={levelStep(p.dbA).fill}
              dotStroke={selected ? "#1f6fb5" : over ? "#1c2430" : "#6b7280"}
              dotStrokeWidth={selected ? 0.32 : over ? 0.24 : 0.08}
            />
          </g>
        );
      })}
      {performers
        .filter((p) => labelled.has(p.performerId))
        .map((p) => (
          <text key={p.performerId} x={sx(p.x)} y={sy(p.y) - DOT_R - 0.35} fontSize={font * 0.8} textAnchor="middle" fill="#1c2430" fontWeight={600} paintOrder="stroke" stroke="#ffffff" strokeWidth={font * 0.15}>
            {p.label}
          </text>
        ))}
    </svg>
  );
}
