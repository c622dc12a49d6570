"use client";
// The show's name, field rules and the evening's weather.
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Button } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { apiKeys } from "@/components/use-api";
import { useSave } from "./use-save";

export function DetailsForm({ data, editable }: { data: ShowResponse; editable: boolean }) {
  const s = data.show;
  const [form, setForm] = useState({
    name: s.name,
    fieldRules: s.fieldRules,
    temperatureC: String(s.conditions.temperatureC),
    relativeHumidityPct: String(s.conditions.relativeHumidityPct),
    pressureKPa: String(s.conditions.pressureKPa),
  });
  const save = useSave(s.id);
  const set = (k: keyof typeof form) => (e: { target: { value: string } }) => setForm({ ...form, [k]: e.target.value });
  const issue = (k: string) => save.message?.issues?.[k] ?? [];
  return (
    <form
      className="grid gap-4 sm:grid-cols-2"
      aria-label="Name, field rules and weather"
      onSubmit={(e) => {
        e.preventDefault();
        void save.run(
          () =>
            sendJson(apiKeys.show(s.id), "PATCH", {
              name: form.name,
              fieldRules: form.fieldRules,
              conditions: { temperatureC: Number(form.temperatureC), relativeHumidityPct: Number(form.relativeHumidityPct), pressureKPa: Number(form.pressureKPa) },
            }),
          "Saved. Every analysis now uses this weather.",
        );
      }}
    >
      <TextField id="show-name" label="Show name" value={form.name} onChange={set("name")} disabled={!editable} errors={issue("name")} className="sm:col-span-2" />
      <div>
        <label htmlFor="field-rules" className="block font-semibold text-ink">
          Field rules
        </label>
        <p className="text-sm text-ink-soft">Where the hashes are.</p>
        <select id="field-rules" className="mt-1 block min-h-12 w-full rounded-lg border border-ink/30 bg-paper-raised px-3 text-lg" value={form.fieldRules} onChange={set("fieldRules")} disabled={!editable}>
          <option value="high-school">High school (hashes 53 ft 4 in in)</option>
          <option value="college">College (hashes 60 ft in)</option>
        </select>
      </div>
      <TextField id="temperature" label="Temperature (°C)" hint="The evening of the performance, −20 to 50." type="number" step="0.1" inputMode="decimal" value={form.temperatureC} onChange={set("temperatureC")} disabled={!editable} errors={issue("conditions.temperatureC")} />
      <TextField id="humidity" label="Relative humidity (%)" hint="10 to 100; dry air takes the highs." type="number" step="1" inputMode="decimal" value={form.relativeHumidityPct} onChange={set("relativeHumidityPct")} disabled={!editable} errors={issue("conditions.relativeHumidityPct")} />
      <TextField id="pressure" label="Air pressure (kPa)" hint="101.3 at sea level; about 84 at 1600 m above sea level." type="number" step="0.1" inputMode="decimal" value={form.pressureKPa} onChange={set("pressureKPa")} disabled={!editable} errors={issue("conditions.pressureKPa")} />
      {editable ? (
        <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
          <Button type="submit" disabled={save.busy}>
            {save.busy ? "Saving…" : "Save name and weather"}
          </Button>
          <FormMessage id="details-message" tone={save.message?.tone ?? "info"}>
            {save.message?.text}
          </FormMessage>
        </div>
      ) : null}
    </form>
  );
}
