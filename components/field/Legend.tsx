// What the marks mean: the wedge points where the player faces and is as wide as the instrument
// throws its sound (from the catalog); colour and outline of the dot = the voice in this set's
// phrase; the ring of the players a chosen balance check marks.
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { spreadGroups } from "@/lib/field/spread-groups";
import { MarkIcon } from "./MarkIcon";
import { VOICE_ORDER, VOICE_STYLES } from "./palette";

const NEUTRAL = { ...VOICE_STYLES.tacet, colour: "#4a5566", fillAlpha: 0.45, dash: [] };
const GROUPS = spreadGroups(DEFAULT_INSTRUMENTS);

/** The wedges' part of the legend: each kind of spread with instruments that have it. */
export function SpreadLegend() {
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink-soft" data-testid="spread-legend">
      <span className="font-semibold text-ink">Wedge: where the player faces, as wide as the instrument throws its sound</span>
      {GROUPS.map((g) => (
        <span key={g.kind} className="inline-flex items-center gap-1" title={g.names.join(", ")}>
          <MarkIcon style={NEUTRAL} spreadDeg={g.spreadDeg} size={26} />
          <span>
            {g.kind[0]!.toUpperCase() + g.kind.slice(1)} <span className="text-ink-faint">({g.names.slice(0, 3).join(", ")}{g.names.length > 3 ? " …" : ""})</span>
          </span>
        </span>
      ))}
    </div>
  );
}

/** `flaggedBy`: the name of the balance check whose players are marked, if one is chosen. */
export function Legend({ flaggedBy }: { flaggedBy?: string | null } = {}) {
  return (
    <div className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-soft" aria-label="Legend" data-testid="marks-legend">
      <SpreadLegend />
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <span className="font-semibold text-ink">Colour and outline: voice</span>
        {VOICE_ORDER.map((v) => (
          <span key={v} className="inline-flex items-center gap-1">
            <MarkIcon style={VOICE_STYLES[v]} />
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
