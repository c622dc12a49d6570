"use client";
// One listening point: its name, its place (in words, by numbers or on the field), its surroundings and its background.
import Link from "next/link";
import { useState } from "react";
import type { Background, FieldRules, ListeningPoint } from "@/components/api-types";
import { Button } from "@/components/Button";
import { FormMessage } from "@/components/FormMessage";
import { YARD_M } from "@/lib/field/geometry";
import { describeListeningPoint, listeningPointFromWords } from "@/lib/field/point-words";
import { BACKGROUND_CHOICES, choiceOf, OCTAVE_LABELS, POINT_SURROUNDINGS } from "./choices";
import { GroundPicker, groundOf } from "./GroundForm";

export type PointDraft = { name: string; x: string; y: string; z: string; surroundings: { key: string; g: string }; surroundingsM: string; background: string; octaves: string[] };

export function draftOf(p: ListeningPoint | null): PointDraft {
  const bg = p?.background ?? null;
  return {
    name: p?.name ?? "",
    x: String(p?.x ?? 0),
    y: String(p?.y ?? 20),
    z: String(p?.z ?? 1.7),
    surroundings: { key: choiceOf(POINT_SURROUNDINGS, p?.groundFactor), g: String(p?.groundFactor ?? 0) },
    // Shown in yards (field lengths are in yards or steps), stored in metres.
    surroundingsM: String(Math.round(((p?.surroundingsM ?? 0) / YARD_M) * 10) / 10),
    background: !bg ? "none" : "preset" in bg ? bg.preset : "custom",
    octaves: bg && "octaveDb" in bg ? bg.octaveDb.map(String) : ["60", "58", "56", "54", "50", "46", "40", "34"],
  };
}

/** The API body of a draft. */
export function bodyOf(d: PointDraft) {
  const background: Background | null = d.background === "none" ? null : d.background === "custom" ? { octaveDb: d.octaves.map(Number) } : ({ preset: d.background } as Background);
  return { name: d.name, x: Number(d.x), y: Number(d.y), z: Number(d.z), groundFactor: groundOf(POINT_SURROUNDINGS, d.surroundings), surroundingsM: Number(d.surroundingsM) * YARD_M, background };
}

const input = "min-h-11 w-24 rounded-md border border-ink/30 px-2 tabular-nums";

export function PointForm(props: {
  draft: PointDraft;
  rules: FieldRules;
  isNew: boolean;
  editable: boolean;
  placing: boolean;
  busy: boolean;
  message: { tone: "info" | "bad"; text: string } | null;
  onChange(d: PointDraft): void;
  onPlace(on: boolean): void;
  onSave(): void;
  onRemove(): void;
  onCancel(): void;
}) {
  const d = props.draft;
  const [words, setWords] = useState("");
  const [wordsError, setWordsError] = useState<string | null>(null);
  const set = (patch: Partial<PointDraft>) => props.onChange({ ...d, ...patch });
  const finite = [d.x, d.y, d.z].every((v) => v.trim() !== "" && Number.isFinite(Number(v)));
  const dis = !props.editable;
  return (
    <form
      aria-label={props.isNew ? "New listening point" : `Listening point ${d.name}`}
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        props.onSave();
      }}
    >
      <label className="block">
        <span className="block font-semibold">Name</span>
        <input className="min-h-11 w-full rounded-md border border-ink/30 px-2" value={d.name} disabled={dis} placeholder="Judge on the field" onChange={(e) => set({ name: e.target.value })} />
      </label>
      <fieldset className="space-y-2">
        <legend className="font-semibold">Where</legend>
        {finite ? <p className="text-sm text-ink-soft" data-testid="point-words">{describeListeningPoint(Number(d.x), Number(d.y), Number(d.z), props.rules)}</p> : null}
        {props.editable ? (
          <div className="flex flex-wrap items-end gap-2">
            <label className="min-w-64 flex-1 text-sm">
              <span className="block">In words</span>
              <input className="min-h-11 w-full rounded-md border border-ink/30 px-2" value={words} placeholder="on the 50, 27 yards behind the front sideline, 18 m up" onChange={(e) => setWords(e.target.value)} />
            </label>
            <Button
              variant="secondary"
              onClick={() => {
                const r = listeningPointFromWords(words);
                if (!r.ok) return setWordsError(r.error);
                setWordsError(null);
                set({ x: String(Math.round(r.x * 100) / 100), y: String(Math.round(r.y * 100) / 100), z: String(r.z) });
              }}
            >
              Use these words
            </Button>
            <Button variant={props.placing ? "primary" : "secondary"} onClick={() => props.onPlace(!props.placing)}>
              {props.placing ? "Click the field…" : "Place on the field"}
            </Button>
          </div>
        ) : null}
        {wordsError ? <p className="text-sm font-medium text-signal-bad" role="alert">{wordsError}</p> : null}
        <div className="flex flex-wrap gap-3 text-sm">
          <label>
            <span className="block">Height (m)</span>
            <input className={input} type="number" step="0.1" min={0} value={d.z} disabled={dis} onChange={(e) => set({ z: e.target.value })} />
          </label>
        </div>
      </fieldset>
      <div className="grid gap-3">
        <GroundPicker id={`surroundings-${props.isNew ? "new" : "edit"}`} label="Ground around the point" hint="For a box above the stands: concrete." choices={POINT_SURROUNDINGS} value={d.surroundings} onChange={(v) => set({ surroundings: v })} disabled={dis} />
        <label className="text-sm">
          <span className="block font-semibold">How far it reaches toward the field (yards)</span>
          <input className={input} type="number" min={0} step="1" value={d.surroundingsM} disabled={dis || d.surroundings.key === "between"} onChange={(e) => set({ surroundingsM: e.target.value })} />
        </label>
      </div>
      <div>
        <label className="block">
          <span className="block font-semibold">Background noise</span>
          <span className="block text-sm text-ink-soft">What this listener hears besides the band; a voice under it reads &quot;masked&quot; in the box mix.</span>
          <select className="mt-1 min-h-11 w-full rounded-md border border-ink/30 bg-paper-raised px-2" value={d.background} disabled={dis} onChange={(e) => set({ background: e.target.value })}>
            {BACKGROUND_CHOICES.map((c) => (
              <option key={c.key} value={c.key}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
        <p className="mt-1 text-sm text-ink-soft">
          Where the ground and background values come from: <Link className="text-turf-dark underline" href="/sources#background">Where the numbers come from</Link>.
        </p>
        {d.background === "custom" ? (
          <fieldset className="mt-2 flex flex-wrap gap-2">
            <legend className="text-sm">Octave-band levels, dB SPL (Hz)</legend>
            {OCTAVE_LABELS.map((label, i) => (
              <label key={label} className="text-sm">
                <span className="block text-center">{label}</span>
                <input className="min-h-10 w-16 rounded-md border border-ink/30 px-1 tabular-nums" type="number" value={d.octaves[i]} disabled={dis} aria-label={`${label} Hz level`} onChange={(e) => set({ octaves: d.octaves.map((o, j) => (j === i ? e.target.value : o)) })} />
              </label>
            ))}
          </fieldset>
        ) : null}
      </div>
      {props.editable ? (
        <div className="flex flex-wrap items-center gap-2">
          <Button type="submit" disabled={props.busy}>
            {props.busy ? "Saving…" : props.isNew ? "Add this listening point" : "Save this point"}
          </Button>
          <Button variant="secondary" onClick={props.onCancel}>
            {props.isNew ? "Cancel" : "Close"}
          </Button>
          {!props.isNew ? (
            <Button variant="quiet" className="text-signal-bad" onClick={props.onRemove}>
              Remove this point
            </Button>
          ) : null}
        </div>
      ) : null}
      <FormMessage id="point-message" tone={props.message?.tone ?? "info"}>
        {props.message?.text}
      </FormMessage>
    </form>
  );
}
