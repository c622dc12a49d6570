// A performer's mark in an SVG drawing (sheets, compare, hearing map, legend): the sound wedge toward
// the facing, as wide as the instrument throws its sound (lib/field/marks.ts), under the dot in the
// voice's colour and outline. The field editor's canvas draws the same wedge from the same points.
import { wedgePath } from "@/lib/field/marks";
import type { VoiceStyle } from "./palette";

export function PerformerMark(props: {
  cx: number;
  cy: number;
  /** Dot radius; the wedge reaches `reach` of them (2.6 unless a crowded drawing asks for less). */
  r: number;
  reach?: number;
  facingDeg: number;
  /** Null: the dot alone (a voice in a legend). */
  spreadDeg: number | null;
  style: VoiceStyle;
  /** A fill for the dot other than the voice's (the hearing map's level colour). */
  dotFill?: string;
  dotStroke?: string;
  dotStrokeWidth?: number;
}) {
  const { cx, cy, r, style } = props;
  const fill = props.dotFill ?? (style.fillAlpha === 0 ? "#ffffff" : style.colour);
  const stroke = props.dotStroke ?? (style.fillAlpha === 1 ? "#1c2430" : style.colour);
  const width = props.dotStrokeWidth ?? r * 0.3;
  return (
    <g>
      {props.spreadDeg === null ? null : <path d={wedgePath(cx, cy, props.facingDeg, props.spreadDeg, r * (props.reach ?? 2.6))} fill={style.colour} fillOpacity={0.3} stroke={style.colour} strokeOpacity={0.9} strokeWidth={r * 0.18} />}
      <circle cx={cx} cy={cy} r={r} fill={fill} fillOpacity={props.dotFill || style.fillAlpha === 0 ? 1 : style.fillAlpha} stroke={stroke} strokeWidth={width} strokeDasharray={style.dash.length ? style.dash.map((d) => (d * r) / 4).join(" ") : undefined} />
      {style.ring ? <circle cx={cx} cy={cy} r={r * 1.45} fill="none" stroke="#1c2430" strokeWidth={r * 0.2} /> : null}
    </g>
  );
}
