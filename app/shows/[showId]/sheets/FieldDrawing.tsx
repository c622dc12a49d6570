// A sheet's field picture as SVG: the very geometry the PDF draws (lib/sheets/field-picture.ts, in
// points of a Letter page), so screen, print and PDF place every dot and label alike.
import type { FieldRules } from "@/lib/field/geometry";
import { PerformerMark } from "@/components/field/PerformerMark";
import { VOICE_STYLES } from "@/components/field/palette";
import { fieldPicture, type FieldPicture, type PictureDot } from "@/lib/sheets/field-picture";

const INK = "#1f2933";
// Paper is read in black and white: the wedge in grey, the dot in ink (the PDF's colours).
const SHEET_MARK = { ...VOICE_STYLES.melody, colour: "#4a5566", fillAlpha: 1, dash: [], ring: false };
const LINE = "#8aa68a";

/** A set's whole field with every dot labelled (the per-set sheet). */
export function FieldDrawing({ rules, dots, title, width = 532 }: { rules: FieldRules; dots: PictureDot[]; title: string; width?: number }) {
  const pic = fieldPicture(rules, dots, { width });
  return (
    <svg viewBox={`0 0 ${pic.width} ${pic.height}`} role="img" aria-label={title} className="w-full rounded border border-ink/20 bg-white">
      <FieldLines pic={pic} />
      <text x={pic.width / 2} y={pic.height - 3} fontSize={7} fill="#5b6470" textAnchor="middle">
        Front sideline, press box side
      </text>
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
      {pic.dots.map((d) =>
          d.facingDeg !== undefined && d.spreadDeg !== undefined ? (
            <PerformerMark key={d.label} cx={d.x} cy={d.y} r={pic.dotRadius} facingDeg={d.facingDeg} spreadDeg={d.spreadDeg} style={SHEET_MARK} />
          ) : (
            <circle key={d.label} cx={d.x} cy={d.y} r={pic.dotRadius} fill={INK} />
          ),
        )}
      {pic.labels.map((l) => (
        <text key={`label-${l.label}`} x={l.box.x} y={l.box.y + l.box.h * 0.8} fontSize={pic.fontSize} fill={INK} fontFamily="Helvetica, Arial, sans-serif">
          {l.label}
        </text>
      ))}
    </svg>
  );
}

/** The field itself: its rectangle, yard lines (numbered when the picture is large enough) and hash ticks. */
function FieldLines({ pic }: { pic: FieldPicture }) {
  return (
    <>
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
      {/* Some two hundred ticks as one path: as many elements made each small picture heavy. */}
      <path data-part="hash-ticks" d={pic.hashTicks.map((t) => `M${round2(t.x)} ${round2(t.y - pic.width / 400)}V${round2(t.y + pic.width / 400)}`).join("")} stroke={LINE} strokeWidth={0.3} fill="none" />
    </>
  );
}

const round2 = (x: number) => Math.round(x * 100) / 100;

/** The small pictures' width in drawing units (points: a quarter of the sheet's text width). */
const SMALL = 127;
const smallPicture = (rules: FieldRules, dots: readonly PictureDot[]) => fieldPicture(rules, dots, { width: SMALL, labels: false, dotRadius: SMALL / 150 });
const bandId = (prefix: string, set: string) => `${prefix}-band-${set.replace(/[^A-Za-z0-9_-]/g, "_")}`;

/**
 * Each set's field with the whole band in grey, drawn once for the page: every performer's small
 * picture of that set shows it by reference and adds only its own dot. (Drawn in full for each, a
 * 72-player show's sheets held about 90,000 dots and took seconds to open.)
 */
export function SetBands({ rules, sets, prefix }: { rules: FieldRules; sets: { number: string; dots: PictureDot[] }[]; prefix: string }) {
  // The field is the same in every set: drawn once, shown by reference under each set's band.
  const field = `${prefix}-field`;
  return (
    <svg width="0" height="0" aria-hidden="true" className="absolute">
      <defs>
        <g id={field}>
          <FieldLines pic={smallPicture(rules, [])} />
        </g>
        {sets.map((set) => {
          const pic = smallPicture(rules, set.dots);
          return (
            <symbol key={set.number} id={bandId(prefix, set.number)} viewBox={`0 0 ${pic.width} ${pic.height}`}>
              <use href={`#${field}`} />
              {/* The band as one path of round dots (a zero-length stroke with round caps draws a dot): a
                  circle element per player made the page's drawing many times heavier. */}
              <path d={pic.dots.map((d) => `M${round2(d.x)} ${round2(d.y)}h0`).join("")} stroke="#9aa1ab" strokeWidth={round2(2 * pic.dotRadius)} strokeLinecap="round" fill="none" data-dots={pic.dots.length} />
            </symbol>
          );
        })}
      </defs>
    </svg>
  );
}

/** One performer among the band in one set: the set's shared band picture (SetBands) and their own dot over it. */
export function MySpot({ rules, set, mine, prefix, title }: { rules: FieldRules; set: { number: string; dots: PictureDot[] }; mine: string; prefix: string; title: string }) {
  const pic = smallPicture(rules, set.dots.filter((d) => d.label === mine));
  const me = pic.dots[0];
  return (
    <svg viewBox={`0 0 ${pic.width} ${pic.height}`} role="img" aria-label={title} className="w-full rounded border border-ink/20 bg-white">
      <use href={`#${bandId(prefix, set.number)}`} />
      {me ? <MyDot x={me.x} y={me.y} r={pic.dotRadius} /> : null}
    </svg>
  );
}

function MyDot({ x, y, r }: { x: number; y: number; r: number }) {
  return (
    <g>
      <circle cx={x} cy={y} r={r * 2.4} fill="#c2410c" />
      <circle cx={x} cy={y} r={r * 3.4} fill="none" stroke={INK} strokeWidth={0.6} />
    </g>
  );
}
