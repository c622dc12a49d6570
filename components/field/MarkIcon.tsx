// A performer's mark as a small SVG for legends and lists, drawn by PerformerMark like the field's.
import type { VoiceStyle } from "./palette";
import { PerformerMark } from "./PerformerMark";

/** `spreadDeg` null: the dot alone, as a voice's sample. */
export function MarkIcon({ style, spreadDeg = null, size = 18, title }: { style: VoiceStyle; spreadDeg?: number | null; size?: number; title?: string }) {
  // A forward wedge points right (toward side 2); the dot sits left of centre so the wedge fits the box.
  const forward = spreadDeg !== null && spreadDeg < 150;
  const r = spreadDeg === null ? size * 0.3 : size / 7;
  const cx = forward ? size * 0.2 : size / 2;
  return (
    <svg width={size} height={size} viewBox={`0 0 ${size} ${size}`} role={title ? "img" : undefined} aria-label={title} aria-hidden={title ? undefined : true}>
      <PerformerMark cx={cx} cy={size / 2} r={r} facingDeg={90} spreadDeg={spreadDeg} style={style} />
    </svg>
  );
}
