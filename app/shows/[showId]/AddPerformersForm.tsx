"use client";
// Adds performers to the roster by instrument: several at once (labels continue the roster's), or one with its own label and name.
import { useState } from "react";
import { Button } from "@/components/Button";
import { errorText } from "@/components/error-text";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { FIELD_INPUT } from "@/components/form-styles";
import { plural } from "@/components/format";
import { INSTRUMENT_OPTIONS } from "./instrument-options";

const EMPTY = { instrument: "trumpet", count: "1", section: "", part: "", strengthDb: "0", label: "", name: "" };

export function AddPerformersForm({ showId, onAdded }: { showId: string; onAdded(): Promise<unknown> }) {
  const [draft, setDraft] = useState(EMPTY);
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const set = (key: keyof typeof EMPTY) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: e.target.value }));
  const count = Number(draft.count);
  const one = count === 1;

  async function add() {
    if (!Number.isInteger(count) || count < 1 || count > 50) return setMessage({ tone: "bad", text: "Add 1 to 50 performers at a time." });
    const strengthDb = Number(draft.strengthDb);
    if (!Number.isFinite(strengthDb)) return setMessage({ tone: "bad", text: "Strength must be a number of dB, from −6 (weak) to +6 (strong)." });
    const body = {
      instrument: draft.instrument,
      count,
      part: draft.part,
      strengthDb,
      ...(draft.section.trim() ? { section: draft.section } : {}),
      ...(one && draft.label.trim() ? { label: draft.label } : {}),
      ...(one && draft.name.trim() ? { name: draft.name } : {}),
    };
    setMessage({ tone: "info", text: "Adding…" });
    try {
      const res = await sendJson<{ performers: { label: string }[] }>(`/api/shows/${encodeURIComponent(showId)}/performers`, "POST", body);
      await onAdded();
      const labels = res?.performers.map((p) => p.label).join(", ") ?? "";
      setMessage({ tone: "info", text: `Added ${plural(count, "performer")} (${labels}). Place them on the field from the set editor.` });
      setDraft((d) => ({ ...d, label: "", name: "" }));
    } catch (e) {
      setMessage({ tone: "bad", text: errorText(e, "Could not add. Try again.") });
    }
  }

  return (
    <form
      aria-label="Add performers"
      className="space-y-3 rounded-lg border border-ink/15 p-4"
      onSubmit={(e) => {
        e.preventDefault();
        void add();
      }}
    >
      <h3 className="font-semibold">Add performers</h3>
      <div className="grid gap-3 sm:grid-cols-4">
        <label className="text-sm font-semibold sm:col-span-2">
          Instrument
          <select className={FIELD_INPUT} value={draft.instrument} onChange={set("instrument")}>
            {INSTRUMENT_OPTIONS.map((o) => <option key={o.key} value={o.key}>{o.name}</option>)}
          </select>
        </label>
        <label className="text-sm font-semibold">
          How many
          <input className={FIELD_INPUT} type="number" min={1} max={50} value={draft.count} onChange={set("count")} />
        </label>
        <label className="text-sm font-semibold">
          Strength in dB
          <input className={FIELD_INPUT} type="number" min={-6} max={6} step={0.5} value={draft.strengthDb} onChange={set("strengthDb")} />
        </label>
        <label className="text-sm font-semibold sm:col-span-2">
          Section <span className="font-normal text-ink-soft">(blank: the roster&rsquo;s section for this instrument)</span>
          <input className={FIELD_INPUT} value={draft.section} onChange={set("section")} list="roster-sections" maxLength={60} />
        </label>
        <label className="text-sm font-semibold sm:col-span-2">
          Part <span className="font-normal text-ink-soft">(optional)</span>
          <input className={FIELD_INPUT} value={draft.part} onChange={set("part")} maxLength={40} placeholder="e.g. 2nd" />
        </label>
        {one ? (
          <>
            <label className="text-sm font-semibold sm:col-span-2">
              Label <span className="font-normal text-ink-soft">(blank: the next free one, e.g. T5)</span>
              <input className={FIELD_INPUT} value={draft.label} onChange={set("label")} maxLength={16} />
            </label>
            <label className="text-sm font-semibold sm:col-span-2">
              Name <span className="font-normal text-ink-soft">(optional)</span>
              <input className={FIELD_INPUT} value={draft.name} onChange={set("name")} maxLength={120} autoComplete="off" />
            </label>
          </>
        ) : null}
      </div>
      <Button type="submit">Add to the roster</Button>
      <FormMessage id="add-performers-message" tone={message?.tone ?? "info"}>{message?.text}</FormMessage>
    </form>
  );
}
