"use client";
// One performer's label, instrument, section, part, strength and name, changed on screen or removed.
import { useState } from "react";
import type { Performer } from "@/components/api-types";
import { Button } from "@/components/Button";
import { errorText } from "@/components/error-text";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { FIELD_INPUT } from "@/components/form-styles";
import { INSTRUMENT_OPTIONS, instrumentName } from "./instrument-options";


export function PerformerForm(props: { showId: string; performer: Performer; onDone(message: string): void; onCancel(): void }) {
  const p = props.performer;
  const [draft, setDraft] = useState({ label: p.label, instrument: p.instrument, section: p.section, part: p.part, strengthDb: String(p.strengthDb), name: p.name ?? "" });
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const url = `/api/shows/${encodeURIComponent(props.showId)}/performers/${encodeURIComponent(p.id)}`;
  const set = (key: keyof typeof draft) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: e.target.value }));

  async function save() {
    const strengthDb = Number(draft.strengthDb);
    if (draft.strengthDb.trim() === "" || !Number.isFinite(strengthDb)) return setMessage({ tone: "bad", text: "Strength must be a number of dB, from −6 (weak) to +6 (strong)." });
    setMessage({ tone: "info", text: "Saving…" });
    try {
      await sendJson(url, "PATCH", { ...draft, strengthDb });
      props.onDone(`Saved ${draft.label.toUpperCase()}.`);
    } catch (e) {
      setMessage({ tone: "bad", text: errorText(e) });
    }
  }

  async function remove() {
    setMessage({ tone: "info", text: "Removing…" });
    try {
      await sendJson(url, "DELETE");
      props.onDone(`Removed ${p.label} from the show.`);
    } catch (e) {
      setMessage({ tone: "bad", text: errorText(e) });
    }
  }

  return (
    <form
      aria-label={`Edit ${p.label}`}
      className="space-y-3 rounded-lg border border-ink/15 bg-paper-sunk p-4"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
    >
      <h3 className="font-semibold">Edit {p.label}</h3>
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="text-sm font-semibold">
          Label
          <input className={FIELD_INPUT} value={draft.label} onChange={set("label")} maxLength={16} required />
        </label>
        <label className="text-sm font-semibold">
          Instrument
          <select className={FIELD_INPUT} value={draft.instrument} onChange={set("instrument")}>
            {INSTRUMENT_OPTIONS.some((o) => o.key === draft.instrument) ? null : <option value={draft.instrument}>{instrumentName(draft.instrument)}</option>}
            {INSTRUMENT_OPTIONS.map((o) => <option key={o.key} value={o.key}>{o.name}</option>)}
          </select>
        </label>
        <label className="text-sm font-semibold">
          Section
          <input className={FIELD_INPUT} value={draft.section} onChange={set("section")} list="roster-sections" maxLength={60} required />
        </label>
        <label className="text-sm font-semibold">
          Part <span className="font-normal text-ink-soft">(optional)</span>
          <input className={FIELD_INPUT} value={draft.part} onChange={set("part")} maxLength={40} placeholder="e.g. 2nd" />
        </label>
        <label className="text-sm font-semibold">
          Strength in dB <span className="font-normal text-ink-soft">(−6 weak to +6 strong)</span>
          <input className={FIELD_INPUT} value={draft.strengthDb} onChange={set("strengthDb")} inputMode="decimal" type="number" min={-6} max={6} step={0.5} />
        </label>
        <label className="text-sm font-semibold">
          Name <span className="font-normal text-ink-soft">(optional)</span>
          <input className={FIELD_INPUT} value={draft.name} onChange={set("name")} maxLength={120} autoComplete="off" />
        </label>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <Button type="submit">Save {p.label}</Button>
        <Button variant="secondary" onClick={props.onCancel}>Cancel</Button>
        {confirmRemove ? (
          <span className="flex flex-wrap items-center gap-2 rounded-lg border border-signal-bad/40 px-3 py-1">
            Remove {p.label} and their dots in every set?
            <Button variant="secondary" onClick={() => void remove()}>Yes, remove</Button>
            <Button variant="quiet" onClick={() => setConfirmRemove(false)}>Keep</Button>
          </span>
        ) : (
          <Button variant="quiet" onClick={() => setConfirmRemove(true)}>Remove from the show…</Button>
        )}
      </div>
      <FormMessage id={`performer-${p.id}-message`} tone={message?.tone ?? "info"}>{message?.text}</FormMessage>
    </form>
  );
}
