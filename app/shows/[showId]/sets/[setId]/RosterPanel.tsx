// Performers not yet in this set, to place with a click on the field; and adding new ones by instrument.
import { useState } from "react";
import type { Performer } from "@/components/api-types";
import { INSTRUMENT_OPTIONS, instrumentName } from "../../instrument-options";

export function RosterPanel(props: {
  unplaced: Performer[];
  placingId: string | null;
  editable: boolean;
  onPlace(id: string | null): void;
  onAdd(instrument: string, count: number): Promise<void>;
}) {
  const [instrument, setInstrument] = useState("trumpet");
  const [count, setCount] = useState(1);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  return (
    <section aria-labelledby="roster-title">
      <h2 id="roster-title" className="font-semibold">
        Not in this set <span className="font-normal text-ink-soft">({props.unplaced.length})</span>
      </h2>
      {props.unplaced.length === 0 ? <p className="text-sm text-ink-soft">Every performer on the roster is placed.</p> : null}
      <ul className="mt-1 flex max-h-32 flex-wrap gap-1 overflow-y-auto" data-testid="unplaced">
        {props.unplaced.map((p) => (
          <li key={p.id}>
            <button
              type="button"
              disabled={!props.editable}
              onClick={() => props.onPlace(props.placingId === p.id ? null : p.id)}
              aria-pressed={props.placingId === p.id}
              title={`${instrumentName(p.instrument)}, ${p.section}`}
              className={`min-h-9 rounded-md border px-2 text-sm font-semibold ${props.placingId === p.id ? "border-[#1f6fb5] bg-[#1f6fb5] text-white" : "border-ink/20 bg-paper hover:bg-paper-sunk"}`}
            >
              {p.label}
            </button>
          </li>
        ))}
      </ul>
      {props.placingId ? <p className="mt-1 text-sm text-[#1f6fb5]">Click the field where this performer stands; the next one follows. Esc stops.</p> : null}
      {props.editable ? (
        <form
          className="mt-2 flex flex-wrap items-end gap-2"
          onSubmit={async (e) => {
            e.preventDefault();
            setBusy(true);
            setMessage(null);
            try {
              await props.onAdd(instrument, count);
              setMessage(`Added ${count} to the roster; place them from the list.`);
            } catch (err) {
              setMessage(err instanceof Error ? err.message : "Could not add.");
            } finally {
              setBusy(false);
            }
          }}
        >
          <label className="text-sm">
            <span className="block text-ink-soft">Add by instrument</span>
            <select value={instrument} onChange={(e) => setInstrument(e.target.value)} className="min-h-9 rounded-md border border-ink/20 bg-paper-raised px-2">
              {INSTRUMENT_OPTIONS.map((o) => (
                <option key={o.key} value={o.key}>
                  {o.name}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm">
            <span className="block text-ink-soft">How many</span>
            <input type="number" min={1} max={50} value={count} onChange={(e) => setCount(Math.max(1, Math.min(50, Number(e.target.value) || 1)))} className="min-h-9 w-16 rounded-md border border-ink/20 bg-paper-raised px-2" />
          </label>
          <button type="submit" disabled={busy} className="min-h-9 rounded-md border border-turf-dark bg-turf px-3 text-sm font-semibold text-white disabled:opacity-60">
            Add
          </button>
          <p className="w-full text-sm text-ink-soft" aria-live="polite">
            {message}
          </p>
        </form>
      ) : null}
    </section>
  );
}
