// What the symbols mean: shape = instrument family, colour and outline = the voice in this set's phrase.
import { FAMILY_SHAPES, VOICE_ORDER, VOICE_STYLES } from "./palette";
import { SymbolIcon } from "./SymbolIcon";

const NEUTRAL = { ...VOICE_STYLES.tacet, colour: "#4a5566", fillAlpha: 0, dash: [] };

export function Legend() {
  return (
    <div className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-soft" aria-label="Legend">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <span className="font-semibold text-ink">Shape: family</span>
        {Object.values(FAMILY_SHAPES).map((f) => (
          <span key={f.name} className="inline-flex items-center gap-1">
            <SymbolIcon shape={f.shape} style={NEUTRAL} />
            {f.name}
          </span>
        ))}
      </div>
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <span className="font-semibold text-ink">Colour and outline: voice</span>
        {VOICE_ORDER.map((v) => (
          <span key={v} className="inline-flex items-center gap-1">
            <SymbolIcon shape="circle" style={VOICE_STYLES[v]} />
            {VOICE_STYLES[v].name}
            <span className="text-ink-faint">({VOICE_STYLES[v].outline})</span>
          </span>
        ))}
        <span className="inline-flex items-center gap-1">
          <span aria-hidden="true" className="inline-block h-3 w-3 rounded-full bg-[#D55E00]/20 ring-4 ring-[#D55E00]/15" />
          Halo: louder at the listening point
        </span>
      </div>
    </div>
  );
}
