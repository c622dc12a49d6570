// The selected performer (or group): who, where in the trade's words, and what reaches the box.
import type { Performer } from "@/components/api-types";
import { signedDb } from "@/components/format";
import { VOICE_STYLES } from "@/components/field/palette";
import type { VoiceOrTacet } from "@/lib/acoustics/types";
import type { Spot } from "@/lib/editor/layout";
import type { FieldRules } from "@/lib/field/geometry";
import { facingInWords } from "@/lib/field/facing-words";
import { describePosition } from "@/lib/field/words";
import { instrumentName } from "../../instrument-options";
import { useLiveMix, type LiveMix } from "./live-mix";


export function SelectionPanel(props: {
  /** A drag's live mix: the contribution follows it while dragging. */
  live: LiveMix;
  performers: Performer[];
  spot: Spot | null;
  voice: VoiceOrTacet | null;
  contributionDbA: number | undefined;
  pointName: string;
  rules: FieldRules;
  count: number;
}) {
  const { performers, spot, count } = props;
  const dragging = useLiveMix(props.live);
  if (count === 0) {
    return <p className="text-sm text-ink-soft">Select a performer on the field to see where they stand and what they add at the box. Drag on empty field to select a group.</p>;
  }
  if (count > 1) return <p className="font-semibold" data-testid="selection-count">{count} performers selected</p>;
  const p = performers[0];
  if (!p) return null;
  const words = spot ? describePosition(spot.x, spot.y, props.rules) : null;
  const contribution = dragging?.performers[p.id] ?? props.contributionDbA;
  return (
    <div data-testid="selection" data-performer={p.id}>
      <h3 className="text-lg font-semibold">
        {p.label} <span className="font-normal text-ink-soft">{instrumentName(p.instrument)}</span>
      </h3>
      <dl className="mt-1 grid grid-cols-[6.5rem_1fr] gap-x-2 gap-y-0.5 text-sm">
        <dt className="text-ink-soft">Section</dt>
        <dd>
          {p.section}
          {p.part ? ` · ${p.part}` : ""}
        </dd>
        <dt className="text-ink-soft">Voice</dt>
        <dd>{props.voice ? VOICE_STYLES[props.voice].name : "—"}</dd>
        <dt className="text-ink-soft">Strength</dt>
        <dd>{signedDb(p.strengthDb)}</dd>
        {spot && words ? (
          <>
            <dt className="text-ink-soft">Facing</dt>
            <dd>{facingInWords(spot.facingDeg)}</dd>
            <dt className="text-ink-soft">Position</dt>
            <dd data-testid="selection-words" data-x={spot.x} data-y={spot.y}>
              {words.text}
            </dd>
            <dt className="text-ink-soft">At {props.pointName}</dt>
            <dd className="font-semibold tabular-nums" data-testid="selection-contribution" data-db={contribution ?? ""}>
              {contribution !== undefined && Number.isFinite(contribution) ? `${contribution.toFixed(1)} dBA` : "not sounding"}
            </dd>
          </>
        ) : (
          <>
            <dt className="text-ink-soft">Position</dt>
            <dd>Not placed in this set</dd>
          </>
        )}
      </dl>
    </div>
  );
}
