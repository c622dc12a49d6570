"use client";
// The form for one box reading: where and when, the air, who played at which dynamic, what the meter read.
import { useState, type FormEvent } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { TextField } from "@/components/TextField";
import { DYNAMICS } from "@/lib/acoustics/types";
import { useInBrowser } from "@/components/local-time";

const SELECT = "mt-1 block min-h-12 w-full rounded-lg border border-ink/30 bg-paper-raised px-3 text-lg text-ink";

function localNow(): string {
  const d = new Date();
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
}

export function ReadingForm({ show, onSaved }: { show: ShowResponse; onSaved: () => Promise<unknown> }) {
  const sectionNames = [...new Set(show.performers.map((p) => p.section))];
  const [setId, setSetId] = useState(show.sets[0]?.id ?? "");
  const [pointId, setPointId] = useState(show.listeningPoints[0]?.id ?? "");
  // Now, in the reader's zone, until they change it: known only in the browser (the server renders first).
  const [chosenTakenAt, setTakenAt] = useState<string | null>(null);
  const inBrowser = useInBrowser();
  const takenAt = chosenTakenAt ?? (inBrowser ? localNow() : "");
  const [temperatureC, setTemperature] = useState(String(show.show.conditions.temperatureC));
  const [humidity, setHumidity] = useState(String(show.show.conditions.relativeHumidityPct));
  const [sections, setSections] = useState([{ section: sectionNames[0] ?? "", dynamic: "f" }]);
  const [measured, setMeasured] = useState("");
  const [weighting, setWeighting] = useState<"A" | "C">("A");
  const [response, setResponse] = useState<"slow" | "fast">("slow");
  const [meterHeight, setMeterHeight] = useState(String(show.listeningPoints[0]?.z ?? ""));
  const [note, setNote] = useState("");
  const [issues, setIssues] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const num = (s: string) => (s.trim() === "" ? NaN : Number(s));
  const issuesFor = (prefix: string) => Object.entries(issues).flatMap(([k, v]) => (k === prefix || k.startsWith(`${prefix}.`) ? v : []));

  async function submit(e: FormEvent) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      await sendJson(`/api/shows/${show.show.id}/readings`, "POST", {
        setId,
        listeningPointId: pointId,
        takenAt: new Date(takenAt).toISOString(),
        temperatureC: num(temperatureC),
        relativeHumidityPct: num(humidity),
        sections,
        measuredDb: num(measured),
        weighting,
        response,
        meterHeightM: meterHeight.trim() === "" ? null : num(meterHeight),
        note,
      });
      setIssues({});
      setMeasured("");
      setMessage({ tone: "info", text: "Reading recorded." });
      await onSaved();
    } catch (err) {
      setIssues(err instanceof ApiError ? err.issues : {});
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The reading could not be recorded." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-describedby="reading-status">
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="reading-set" className="block font-semibold">Set played</label>
          <select id="reading-set" className={SELECT} value={setId} onChange={(e) => setSetId(e.target.value)}>
            {show.sets.map((s) => (
              <option key={s.id} value={s.id}>Set {s.number}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="reading-point" className="block font-semibold">Meter at</label>
          <select
            id="reading-point"
            className={SELECT}
            value={pointId}
            onChange={(e) => {
              setPointId(e.target.value);
              const z = show.listeningPoints.find((p) => p.id === e.target.value)?.z;
              if (z !== undefined) setMeterHeight(String(z));
            }}
          >
            {show.listeningPoints.map((p) => (
              <option key={p.id} value={p.id}>{p.name}</option>
            ))}
          </select>
        </div>
        <TextField id="reading-taken" label="Taken at" type="datetime-local" value={takenAt} onChange={(e) => setTakenAt(e.target.value)} errors={issuesFor("takenAt")} />
        <TextField id="reading-height" label="Meter height above the field (m)" inputMode="decimal" value={meterHeight} onChange={(e) => setMeterHeight(e.target.value)} errors={issuesFor("meterHeightM")} />
        <TextField id="reading-temp" label="Temperature (°C)" inputMode="decimal" value={temperatureC} onChange={(e) => setTemperature(e.target.value)} errors={issuesFor("temperatureC")} />
        <TextField id="reading-rh" label="Humidity (%)" inputMode="decimal" value={humidity} onChange={(e) => setHumidity(e.target.value)} errors={issuesFor("relativeHumidityPct")} />
      </div>

      <fieldset className="rounded-lg border border-ink/15 p-3">
        <legend className="px-1 font-semibold">Who played, at which written dynamic</legend>
        <ul className="space-y-2">
          {sections.map((s, i) => (
            <li key={i} className="flex flex-wrap items-end gap-2">
              <div className="min-w-40 flex-1">
                <label htmlFor={`reading-section-${i}`} className="sr-only">Section {i + 1}</label>
                <select id={`reading-section-${i}`} className={SELECT} value={s.section} onChange={(e) => setSections(sections.map((x, j) => (j === i ? { ...x, section: e.target.value } : x)))}>
                  {sectionNames.map((n) => (
                    <option key={n} value={n}>{n}</option>
                  ))}
                </select>
              </div>
              <div className="w-28">
                <label htmlFor={`reading-dynamic-${i}`} className="sr-only">Dynamic of section {i + 1}</label>
                <select id={`reading-dynamic-${i}`} className={SELECT} value={s.dynamic} onChange={(e) => setSections(sections.map((x, j) => (j === i ? { ...x, dynamic: e.target.value } : x)))}>
                  {DYNAMICS.map((d) => (
                    <option key={d} value={d}>{d}</option>
                  ))}
                </select>
              </div>
              {sections.length > 1 ? (
                <Button variant="quiet" onClick={() => setSections(sections.filter((_, j) => j !== i))} aria-label={`Remove ${s.section}`}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
        {issuesFor("sections").length ? <p className="mt-2 text-sm font-medium text-signal-bad">{issuesFor("sections").join(" ")}</p> : null}
        <Button variant="secondary" className="mt-3" onClick={() => setSections([...sections, { section: sectionNames.find((n) => !sections.some((s) => s.section === n)) ?? sectionNames[0] ?? "", dynamic: "f" }])}>
          Add a section
        </Button>
      </fieldset>

      <div className="grid gap-4 sm:grid-cols-3">
        <TextField id="reading-level" label="Meter read (dB)" inputMode="decimal" value={measured} onChange={(e) => setMeasured(e.target.value)} errors={issuesFor("measuredDb")} />
        <div>
          <label htmlFor="reading-weighting" className="block font-semibold">Weighting</label>
          <select id="reading-weighting" className={SELECT} value={weighting} onChange={(e) => setWeighting(e.target.value as "A" | "C")}>
            <option value="A">A (dBA)</option>
            <option value="C">C (dBC)</option>
          </select>
        </div>
        <div>
          <label htmlFor="reading-response" className="block font-semibold">Response</label>
          <select id="reading-response" className={SELECT} value={response} onChange={(e) => setResponse(e.target.value as "slow" | "fast")}>
            <option value="slow">Slow</option>
            <option value="fast">Fast</option>
          </select>
        </div>
      </div>
      <TextField id="reading-note" label="Note (optional)" value={note} onChange={(e) => setNote(e.target.value)} errors={issuesFor("note")} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy}>{busy ? "Recording…" : "Record the reading"}</Button>
        <FormMessage id="reading-status" tone={message?.tone ?? "info"}>{message?.text ?? ""}</FormMessage>
      </div>
    </form>
  );
}
