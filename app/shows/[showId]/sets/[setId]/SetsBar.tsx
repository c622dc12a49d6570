// The show's sets in order with their counts: open one, add (from this set's positions, or empty), renumber, change counts, delete (with confirmation).
import Link from "next/link";
import { useState } from "react";
import type { SetSummary } from "@/components/api-types";

export function SetsBar(props: {
  showId: string;
  sets: SetSummary[];
  currentId: string;
  editable: boolean;
  /** fromHere: the new set starts from this set's positions (else empty). */
  onAdd(fromHere: boolean): Promise<void>;
  onRenumber(number: string): Promise<void>;
  onCounts(counts: number): Promise<void>;
  onDelete(): Promise<void>;
}) {
  const current = props.sets.find((s) => s.id === props.currentId);
  const [editing, setEditing] = useState<{ number: string; counts: string } | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const act = (fn: () => Promise<void>) => async () => {
    setMessage(null);
    try {
      await fn();
    } catch (err) {
      setMessage(err instanceof Error ? err.message : "That did not work.");
    }
  };
  const btn = "min-h-9 rounded-md border border-ink/20 bg-paper-raised px-3 text-sm font-semibold hover:bg-paper-sunk disabled:opacity-50";
  return (
    <section aria-label="Sets" className="flex flex-wrap items-center gap-2 rounded-xl border border-ink/10 bg-paper-raised p-2 shadow-sm xl:flex-nowrap">
      <ol className="relative flex min-w-0 flex-1 basis-96 gap-1.5 overflow-x-auto pb-1" data-testid="sets-strip">
        {props.sets.map((s) => (
          <li key={s.id}>
            <Link
              href={`/shows/${props.showId}/sets/${s.id}`}
              aria-current={s.id === props.currentId ? "page" : undefined}
              className={`flex min-h-11 min-w-14 flex-col items-center justify-center rounded-md border px-2 leading-tight ${s.id === props.currentId ? "border-turf-dark bg-turf text-white" : "border-ink/15 bg-paper hover:border-turf"}`}
            >
              <span className="text-base font-bold">
                <span className="sr-only">Set </span>
                {s.number}
              </span>
              <span className={`text-xs ${s.id === props.currentId ? "text-white/85" : "text-ink-soft"}`}>{s.counts} ct</span>
            </Link>
          </li>
        ))}
      </ol>
      {props.editable && current ? (
        <div className="flex shrink-0 flex-wrap items-center gap-1.5">
          <button type="button" className={btn} onClick={act(() => props.onAdd(true))} title={`A new set after ${current.number}, starting from its positions`}>
            Add set
          </button>
          <button type="button" className={btn} onClick={act(() => props.onAdd(false))}>
            Add empty set
          </button>
          {editing ? (
            <form
              className="flex flex-wrap items-center gap-1.5"
              onSubmit={async (e) => {
                e.preventDefault();
                await act(async () => {
                  if (editing.number.trim() !== current.number) await props.onRenumber(editing.number.trim());
                  if (Number(editing.counts) !== current.counts) await props.onCounts(Number(editing.counts));
                  setEditing(null);
                })();
              }}
            >
              <label className="text-sm">
                Number <input className="min-h-9 w-16 rounded-md border border-ink/20 px-2" value={editing.number} onChange={(e) => setEditing({ ...editing, number: e.target.value })} />
              </label>
              <label className="text-sm">
                Counts <input type="number" min={0} max={999} className="min-h-9 w-16 rounded-md border border-ink/20 px-2" value={editing.counts} onChange={(e) => setEditing({ ...editing, counts: e.target.value })} />
              </label>
              <button type="submit" className={btn}>
                Save
              </button>
              <button type="button" className={btn} onClick={() => setEditing(null)}>
                Cancel
              </button>
            </form>
          ) : (
            <button type="button" className={btn} onClick={() => setEditing({ number: current.number, counts: String(current.counts) })}>
              Number and counts…
            </button>
          )}
          {confirming ? (
            <span className="flex items-center gap-1.5 rounded-md bg-[#fbe9ea] px-2 py-1 text-sm" role="alertdialog" aria-label="Confirm delete">
              Delete set {current.number} and its positions?
              <button type="button" className={`${btn} border-signal-bad text-signal-bad`} onClick={act(async () => { setConfirming(false); await props.onDelete(); })}>
                Delete
              </button>
              <button type="button" className={btn} onClick={() => setConfirming(false)}>
                Keep
              </button>
            </span>
          ) : (
            <button type="button" className={btn} onClick={() => setConfirming(true)}>
              Delete set…
            </button>
          )}
          <span className="text-sm text-signal-bad" aria-live="polite">
            {message}
          </span>
        </div>
      ) : null}
    </section>
  );
}
