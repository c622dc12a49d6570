"use client";
// The ground by region (ISO 9613-2 §7.3.1): the field surface and what lies between the field and the stands.
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Button } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { apiKeys } from "@/components/use-api";
import { BETWEEN_SURFACES, choiceOf, FIELD_SURFACES, type GroundChoice } from "./choices";
import { useSave } from "./use-save";

const selectCls = "mt-1 block min-h-12 w-full rounded-lg border border-ink/30 bg-paper-raised px-3 text-lg";

/** A ground choice with a custom G beside it. */
export function GroundPicker(props: { id: string; label: string; hint: string; choices: GroundChoice[]; value: { key: string; g: string }; onChange(v: { key: string; g: string }): void; disabled: boolean }) {
  return (
    <div>
      <label htmlFor={props.id} className="block font-semibold text-ink">
        {props.label}
      </label>
      <p className="text-sm text-ink-soft">{props.hint}</p>
      <select id={props.id} className={selectCls} value={props.value.key} disabled={props.disabled} onChange={(e) => props.onChange({ ...props.value, key: e.target.value })}>
        {props.choices.map((c) => (
          <option key={c.key} value={c.key}>
            {c.label}
          </option>
        ))}
        <option value="custom">Custom G</option>
      </select>
      {props.value.key === "custom" ? (
        <label className="mt-2 block text-sm">
          G (0 hard … 1 porous){" "}
          <input aria-label={`${props.label}: custom G`} type="number" min={0} max={1} step={0.05} className="min-h-10 w-24 rounded-md border border-ink/30 px-2" value={props.value.g} disabled={props.disabled} onChange={(e) => props.onChange({ ...props.value, g: e.target.value })} />
        </label>
      ) : null}
    </div>
  );
}

/** The G a picker gives: the choice's, or the custom number. */
export function groundOf(choices: GroundChoice[], v: { key: string; g: string }): number | null {
  return v.key === "custom" ? Number(v.g) : (choices.find((c) => c.key === v.key)?.g ?? null);
}

export function GroundForm({ data, editable }: { data: ShowResponse; editable: boolean }) {
  const c = data.show.conditions;
  const [field, setField] = useState({ key: choiceOf(FIELD_SURFACES, c.groundFactor), g: String(c.groundFactor ?? 1) });
  const [between, setBetween] = useState({ key: choiceOf(BETWEEN_SURFACES, c.betweenGroundFactor), g: String(c.betweenGroundFactor ?? 0) });
  const save = useSave(data.show.id);
  return (
    <form
      aria-label="Ground"
      className="grid gap-4 sm:grid-cols-2"
      onSubmit={(e) => {
        e.preventDefault();
        void save.run(
          () => sendJson(apiKeys.show(data.show.id), "PATCH", { conditions: { groundFactor: groundOf(FIELD_SURFACES, field), betweenGroundFactor: groundOf(BETWEEN_SURFACES, between) } }),
          "Saved. Each listening point's own surroundings are set with the point below.",
        );
      }}
    >
      <GroundPicker id="field-surface" label="Field surface" hint="Where the band stands." choices={FIELD_SURFACES} value={field} onChange={setField} disabled={!editable} />
      <GroundPicker id="between-surface" label="Between the field and the stands" hint="Track, aprons, sidelines." choices={BETWEEN_SURFACES} value={between} onChange={setBetween} disabled={!editable || field.key === "none"} />
      {editable ? (
        <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
          <Button type="submit" disabled={save.busy}>
            {save.busy ? "Saving…" : "Save ground"}
          </Button>
          <FormMessage id="ground-message" tone={save.message?.tone ?? "info"}>
            {save.message?.text}
          </FormMessage>
        </div>
      ) : null}
    </form>
  );
}
