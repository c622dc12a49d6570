// What the symbols mean: shape = instrument family, colour and outline = the voice in this set's phrase,
// and the ring of the players a chosen balance check marks.
import { FAMILY_SHAPES, VOICE_ORDER, VOICE_STYLES } from "./palette";
import { SymbolIcon } from "./SymbolIcon";

const NEUTRAL = { ...VOICE_STYLES.tacet, colour: "#4a5566", fillAlpha: 0, dash: [] };

/** `flaggedBy`: the name of the balance check whose players are marked, if one is chosen. */
export function Legend({ flaggedBy }: { flaggedBy?: string | null } = {}) {
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
        {flaggedBy ? (
          <span className="inline-flex items-center gap-1 font-semibold text-ink" data-testid="legend-flagged">
            <span aria-hidden="true" className="inline-block h-4 w-4 rounded-full border-2 border-dashed border-ink bg-white" />
            Dashed ring: marked by “{flaggedBy}”
          </span>
        ) : null}
      </div>
    </div>
  );
}
