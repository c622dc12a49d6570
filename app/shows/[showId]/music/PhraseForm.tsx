"use client";
// A phrase's name and the sets it spans: a new phrase, or the chosen one renamed, re-spanned or deleted.
import { useState } from "react";
import { Button } from "@/components/Button";
import { errorText } from "@/components/error-text";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { FIELD_INPUT } from "@/components/form-styles";
import type { MusicPhrase, MusicResponse } from "./music-types";


type Props = {
  showId: string;
  sets: MusicResponse["sets"];
  /** The phrase to change; none for a new one. */
  phrase: MusicPhrase | null;
  /** Where a new phrase starts: the set after the last phrase's end. */
  suggestedFirstSetId?: string;
  onDone(phraseId: string | null, message: string): void;
  onCancel(): void;
};

export function PhraseForm({ showId, sets, phrase, suggestedFirstSetId, onDone, onCancel }: Props) {
  const ordered = [...sets].sort((a, b) => a.order - b.order);
  const first = phrase?.firstSetId ?? suggestedFirstSetId ?? ordered[0]?.id ?? "";
  const [draft, setDraft] = useState({ name: phrase?.name ?? "", firstSetId: first, lastSetId: phrase?.lastSetId ?? first });
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const base = `/api/shows/${encodeURIComponent(showId)}/music/phrases`;
  const orderOf = (id: string) => ordered.find((s) => s.id === id)?.order ?? 0;

  async function save() {
    if (!draft.name.trim()) return setMessage({ tone: "bad", text: "Name the phrase, e.g. \u201cOpener hit\u201d." });
    if (orderOf(draft.lastSetId) < orderOf(draft.firstSetId)) return setMessage({ tone: "bad", text: "The last set comes before the first one: choose a last set at or after the first." });
    setMessage({ tone: "info", text: "Saving…" });
    try {
      const res = phrase
        ? await sendJson<{ phrase: { id: string } }>(`${base}/${encodeURIComponent(phrase.id)}`, "PATCH", draft)
        : await sendJson<{ phrase: { id: string } }>(base, "POST", draft);
      onDone(res?.phrase.id ?? null, phrase ? `Saved ${draft.name.trim()}.` : `Made ${draft.name.trim()}. Now give each section its voice and written dynamic.`);
    } catch (e) {
      setMessage({ tone: "bad", text: errorText(e) });
    }
  }

  async function remove() {
    if (!phrase) return;
    setMessage({ tone: "info", text: "Deleting…" });
    try {
      await sendJson(`${base}/${encodeURIComponent(phrase.id)}`, "DELETE");
      onDone(null, `Deleted ${phrase.name}.`);
    } catch (e) {
      setMessage({ tone: "bad", text: errorText(e) });
    }
  }

  const setOptions = ordered.map((s) => <option key={s.id} value={s.id}>Set {s.number}</option>);
  return (
    <form
      aria-label={phrase ? `Change ${phrase.name}` : "New phrase"}
      className="mt-4 space-y-3 rounded-lg border border-ink/15 bg-paper-sunk p-4"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
    >
      <h3 className="font-semibold">{phrase ? `Change ${phrase.name}` : "New phrase"}</h3>
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="text-sm font-semibold">
          Name
          <input className={FIELD_INPUT} value={draft.name} maxLength={120} placeholder="e.g. Opener hit" onChange={(e) => setDraft((d) => ({ ...d, name: e.target.value }))} />
        </label>
        <label className="text-sm font-semibold">
          From
          <select
            className={FIELD_INPUT}
            value={draft.firstSetId}
            onChange={(e) => {
              const firstSetId = e.target.value;
              setDraft((d) => ({ ...d, firstSetId, lastSetId: orderOf(d.lastSetId) < orderOf(firstSetId) ? firstSetId : d.lastSetId }));
            }}
          >
            {setOptions}
          </select>
        </label>
        <label className="text-sm font-semibold">
          To
          <select className={FIELD_INPUT} value={draft.lastSetId} onChange={(e) => setDraft((d) => ({ ...d, lastSetId: e.target.value }))}>
            {setOptions}
          </select>
        </label>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <Button type="submit">{phrase ? "Save the phrase" : "Make the phrase"}</Button>
        <Button variant="secondary" onClick={onCancel}>Cancel</Button>
        {phrase ? (
          confirmDelete ? (
            <span className="flex flex-wrap items-center gap-2 rounded-lg border border-signal-bad/40 px-3 py-1">
              Delete {phrase.name}, its voices, dynamics and solos?
              <Button variant="secondary" onClick={() => void remove()}>Yes, delete</Button>
              <Button variant="quiet" onClick={() => setConfirmDelete(false)}>Keep</Button>
            </span>
          ) : (
            <Button variant="quiet" onClick={() => setConfirmDelete(true)}>Delete the phrase…</Button>
          )
        ) : null}
      </div>
      <FormMessage id="phrase-form-message" tone={message?.tone ?? "info"}>{message?.text}</FormMessage>
    </form>
  );
}
