// A sheet's field picture as SVG: the very geometry the PDF draws (lib/sheets/field-picture.ts, in
// points of a Letter page), so screen, print and PDF place every dot and label alike.
import type { FieldRules } from "@/lib/field/geometry";
import { PerformerMark } from "@/components/field/PerformerMark";
import { VOICE_STYLES } from "@/components/field/palette";
import { fieldPicture, type PictureDot } from "@/lib/sheets/field-picture";

const INK = "#1f2933";
// Paper is read in black and white: the wedge in grey, the dot in ink (the PDF's colours).
const SHEET_MARK = { ...VOICE_STYLES.melody, colour: "#4a5566", fillAlpha: 1, dash: [], ring: false };
const LINE = "#8aa68a";

/** `mine`: one performer's dot, marked among the band (a small picture without labels). */
export function FieldDrawing({ rules, dots, title, mine, width = 532 }: { rules: FieldRules; dots: PictureDot[]; title: string; mine?: string; width?: number }) {
  const pic = fieldPicture(rules, dots, mine ? { width, labels: false, dotRadius: width / 150 } : { width });
  const me = mine ? pic.dots.find((d) => d.label === mine) : undefined;
  return (
    <svg viewBox={`0 0 ${pic.width} ${pic.height}`} role="img" aria-label={title} className="w-full rounded border border-ink/20 bg-white">
      <rect x={pic.field.x} y={pic.field.y} width={pic.field.w} height={pic.field.h} fill="#eef6ee" stroke={INK} strokeWidth={0.8} />
      {pic.yardLines.map((l) => (
        <g key={l.x}>
          <line x1={l.x} x2={l.x} y1={pic.field.y} y2={pic.field.y + pic.field.h} stroke={l.goal ? INK : LINE} strokeWidth={l.goal ? 1.1 : 0.4} />
          {l.number !== null && pic.width > 300 ? (
            <text x={l.x} y={pic.numberY} fontSize={pic.fontSize * 1.4} textAnchor="middle" fill="#7a937a" fontWeight={700}>
              {l.number}
            </text>
          ) : null}
        </g>
      ))}
      {pic.hashTicks.map((t, i) => (
        <line key={i} x1={t.x} x2={t.x} y1={t.y - pic.width / 400} y2={t.y + pic.width / 400} stroke={LINE} strokeWidth={0.3} />
      ))}
      {!mine ? (
        <text x={pic.width / 2} y={pic.height - 3} fontSize={7} fill="#5b6470" textAnchor="middle">
          Front sideline, press box side
        </text>
      ) : null}
      {pic.labels
        .filter((l) => l.leader)
        .map((l) => (
          <line
            key={`leader-${l.label}`}
            x1={l.dotX}
            y1={l.dotY}
            x2={Math.min(Math.max(l.dotX, l.box.x), l.box.x + l.box.w)}
            y2={Math.min(Math.max(l.dotY, l.box.y), l.box.y + l.box.h)}
            stroke="#5b6470"
            strokeWidth={0.3}
          />
        ))}
      {pic.dots
        .filter((d) => d.label !== mine)
        .map((d) =>
          !mine && d.facingDeg !== undefined && d.spreadDeg !== undefined ? (
            <PerformerMark key={d.label} cx={d.x} cy={d.y} r={pic.dotRadius} facingDeg={d.facingDeg} spreadDeg={d.spreadDeg} style={SHEET_MARK} />
          ) : (
            <circle key={d.label} cx={d.x} cy={d.y} r={pic.dotRadius} fill={mine ? "#9aa1ab" : INK} />
          ),
        )}
      {me ? (
        <g>
          <circle cx={me.x} cy={me.y} r={pic.dotRadius * 2.4} fill="#c2410c" />
          <circle cx={me.x} cy={me.y} r={pic.dotRadius * 3.4} fill="none" stroke={INK} strokeWidth={0.6} />
        </g>
      ) : null}
      {pic.labels.map((l) => (
        <text key={`label-${l.label}`} x={l.box.x} y={l.box.y + l.box.h * 0.8} fontSize={pic.fontSize} fill={INK} fontFamily="Helvetica, Arial, sans-serif">
          {l.label}
        </text>
      ))}
    </svg>
  );
}
