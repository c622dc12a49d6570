"use client";
// Each reading's measured level beside the prediction with the catalog in force and after the
// fit, the change per instrument with how well the readings pin it, and the Adopt button.
import { useState } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { signedDb } from "@/components/format";
import type { ApiState } from "@/components/use-api";
import type { FitInstrument, FitResponse, Reading } from "./readings-types";
import { useLocalTimes } from "@/components/local-time";
import dynamic from "next/dynamic";
import { ChartLoading } from "@/components/ChartLoading";

const FitChart = dynamic(() => import("./FitChart").then((m) => m.FitChart), { ssr: false, loading: () => <ChartLoading height={300} /> });

const db1 = (x: number) => (Math.round(x * 10) / 10).toFixed(1);

/** Beyond this a carry change is more likely a recording slip than the instrument (common practice, no source). */
const LARGE_CHANGE_DB = 10;

/** Plain words for a standard error (common practice, no source: about a meter's own ±1 dB is "well"). */
function pinned(i: FitInstrument): string {
  if (i.stdErrorDb <= 1.5) return "well";
  if (i.stdErrorDb <= 3) return "roughly";
  return "poorly";
}

type Props = {
  showId: string;
  programId: string;
  readings: Reading[];
  fit: ApiState<FitResponse>;
  canAdopt: boolean;
  onChanged: () => Promise<unknown>;
};

export function FitPanel({ showId, programId, readings, fit, canAdopt, onChanged }: Props) {
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const format = useLocalTimes();
  const when = (iso: string) => format(iso, { dateStyle: "medium", timeStyle: "short" });
  const [busy, setBusy] = useState(false);
  /** The version just adopted, while it is the one to undo. */
  const [adopted, setAdopted] = useState<number | null>(null);
  const byId = new Map((fit.data?.readings ?? []).map((r) => [r.id, r]));
  const skipped = new Map((fit.data?.skipped ?? []).map((s) => [s.id, s.reason]));

  async function adopt() {
    if (!fit.data) return;
    setBusy(true);
    setMessage(null);
    try {
      const res = await sendJson<{ version: number; affectedShows: { name: string }[] }>(`/api/programs/${programId}/catalog/adopt`, "POST", { baseVersion: fit.data.baseVersion, showId });
      const shows = res!.affectedShows.map((s) => s.name);
      setMessage({ tone: "info", text: `Adopted as catalog version ${res!.version}. ${shows.length ? `Box mixes change in ${shows.join(", ")}.` : "No show plays the changed instruments."}` });
      setAdopted(res!.version);
      await onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The fit could not be adopted." });
    } finally {
      setBusy(false);
    }
  }

  async function undo() {
    if (adopted === null) return;
    setBusy(true);
    try {
      const res = await sendJson<{ version: number }>(`/api/programs/${programId}/catalog/undo`, "POST", { version: adopted });
      setMessage({ tone: "info", text: `Undone: the catalog before version ${adopted} is back in force as version ${res!.version}.` });
      setAdopted(null);
      await onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The adoption could not be undone." });
    } finally {
      setBusy(false);
    }
  }

  async function remove(id: string) {
    try {
      await sendJson(`/api/shows/${showId}/readings/${id}`, "DELETE");
      setMessage({ tone: "info", text: "Reading removed." });
      await onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The reading could not be removed." });
    }
  }

  if (readings.length === 0) {
    return <p className="text-ink-soft">No readings yet. Record one below, or upload a CSV from the evening at the stadium.</p>;
  }
  const f = fit.data;
  // "Pinned" needs readings left over after the fit; with none, the ± rests on the meter alone.
  const checkable = f?.degreesOfFreedom == null || f.degreesOfFreedom > 0;
  return (
    <div className="space-y-5">
      <p className="text-ink-soft">
        Predictions are estimates, not measurements. <strong className="text-ink">Now</strong> uses the catalog in force
        {f ? ` (version ${f.baseVersion})` : ""}; <strong className="text-ink">after fit</strong> uses the carry changes below.
        {f?.rmsBeforeDb != null ? ` Typical gap: ${db1(f.rmsBeforeDb)} dB now, ${db1(f.rmsAfterDb!)} dB after the fit.` : ""}
        {f?.degreesOfFreedom != null && f.degreesOfFreedom <= 0
          ? " Not enough readings to check the fit: with no more readings than carry changes, the fit can match any readings."
          : f?.residualStdDb != null
            ? ` Readings scatter ±${db1(f.residualStdDb)} dB about the fit (${f.degreesOfFreedom} degree${f.degreesOfFreedom === 1 ? "" : "s"} of freedom).`
            : ""}
      </p>
      {f ? <FitChart readings={f.readings} /> : null}
      <div className="overflow-x-auto rounded-lg border border-ink/10">
        <table className="w-full min-w-[52rem] border-collapse text-left">
          <caption className="sr-only">Each reading: measured level, predicted now and after the fit</caption>
          <thead className="bg-paper-sunk">
            <tr>
              {["Taken", "Set", "Where", "Playing", "Meter", "Measured", "Predicted now", "After fit", ""].map((h, i) => (
                <th key={i} scope="col" className={`px-3 py-2 font-semibold ${i >= 5 && i <= 7 ? "text-right" : ""}`}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {readings.map((r) => {
              const p = byId.get(r.id);
              const gap = (x: number) => `${x - r.measuredDb >= 0 ? "+" : "−"}${db1(Math.abs(x - r.measuredDb))}`;
              return (
                <tr key={r.id} className="border-t border-ink/10 odd:bg-paper-raised even:bg-paper">
                  <td className="whitespace-nowrap px-3 py-2">{when(r.takenAt)}</td>
                  <td className="px-3 py-2">{r.setNumber}</td>
                  <td className="px-3 py-2">{r.listeningPointName}</td>
                  <td className="px-3 py-2">{r.sections.map((s) => `${s.section} ${s.dynamic}`).join(", ")}</td>
                  <td className="whitespace-nowrap px-3 py-2">
                    dB{r.weighting}, {r.response}
                  </td>
                  <td className="px-3 py-2 text-right font-semibold tabular-nums">{db1(r.measuredDb)}</td>
                  <td className="px-3 py-2 text-right tabular-nums">
                    {p ? (
                      <>
                        {db1(p.predictedBeforeDb)} <span className="text-sm text-ink-soft">({gap(p.predictedBeforeDb)})</span>
                      </>
                    ) : (
                      <span className="text-sm text-ink-soft">{skipped.get(r.id) ?? "…"}</span>
                    )}
                  </td>
                  <td className="px-3 py-2 text-right tabular-nums">
                    {p ? (
                      <>
                        {db1(p.predictedAfterDb)} <span className="text-sm text-ink-soft">({gap(p.predictedAfterDb)})</span>
                      </>
                    ) : null}
                  </td>
                  <td className="px-3 py-1 text-right">
                    {r.mine || canAdopt ? (
                      <Button variant="quiet" className="text-sm" onClick={() => remove(r.id)} aria-label={`Remove the reading of ${when(r.takenAt)}`}>
                        Remove
                      </Button>
                    ) : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      {f && f.instruments.length ? (
        <div>
          <h3 className="mb-2 font-semibold text-ink">Carry change the readings suggest</h3>
          <ul className="grid gap-2 sm:grid-cols-2">
            {f.instruments.map((i) => (
              <li key={i.key} className="rounded-lg border border-ink/10 bg-paper px-3 py-2">
                <span className="font-semibold">{i.name}</span>: {signedDb(i.offsetDb)}{" "}
                <span className="text-ink-soft">
                  (carry {signedDb(i.carryDb)} → {signedDb(i.carryDb + i.offsetDb)}; ±{db1(i.stdErrorDb)} dB from {i.readings} reading{i.readings === 1 ? "" : "s"}
                  {checkable ? `, pinned ${pinned(i)}` : ", not checked"})
                </span>
                {Math.abs(i.offsetDb) > LARGE_CHANGE_DB ? (
                  <span className="block text-sm text-signal-warn">A change this large often means a mistyped reading, the wrong weighting, or a section playing louder than written: check before adopting.</span>
                ) : null}
              </li>
            ))}
          </ul>
          {f.indistinguishable.length ? (
            <p className="mt-3 rounded-lg border border-signal-warn/40 bg-paper px-3 py-2 text-signal-warn">
              The readings cannot tell {f.indistinguishable.map(([a, b]) => `${f.instruments.find((i) => i.key === a)?.name ?? a} from ${f.instruments.find((i) => i.key === b)?.name ?? b}`).join("; ")}: they were always heard together in the same proportion, so the fit can only split the change between them. A reading with one of them alone, or with the two in a different balance, separates them.
            </p>
          ) : null}
        </div>
      ) : null}

      {canAdopt && f && f.instruments.length ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={adopt} disabled={busy}>
            {busy ? "Adopting…" : "Adopt the fit into the catalog"}
          </Button>
          <span className="text-ink-soft" data-testid="fit-affects">
            Makes a new catalog version; every earlier version stays and can be restored.{" "}
            {f.affectedShows?.length ? `Changes the box mixes of ${f.affectedShows.map((s) => s.name).join(", ")}.` : "No show plays the changed instruments."}
          </span>
        </div>
      ) : null}
      {canAdopt && adopted !== null ? (
        <Button variant="secondary" onClick={undo} disabled={busy}>
          Undo adopting version {adopted}
        </Button>
      ) : null}
      <FormMessage id="fit-status" tone={message?.tone ?? "info"}>
        {message?.text ?? ""}
      </FormMessage>
    </div>
  );
}
