"use client";
// The program's catalog versions, newest (in force) first; a director may put an earlier one back.
import { useState } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import type { ApiState } from "@/components/use-api";
import { plainSource } from "@/lib/sources/plain-source";
import { instrumentName } from "../instrument-options";
import type { CatalogResponse } from "./readings-types";
import { useLocalTimes } from "@/components/local-time";


export function CatalogHistory({ programId, catalog, canRestore, onChanged }: { programId: string; catalog: ApiState<CatalogResponse>; canRestore: boolean; onChanged: () => Promise<unknown> }) {
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const format = useLocalTimes();
  const when = (iso: string) => format(iso, { dateStyle: "medium", timeStyle: "short" });
  if (catalog.error) return <p className="text-signal-bad">{catalog.error.message}</p>;
  if (!catalog.data) return <p className="text-ink-soft">Loading the catalog history…</p>;
  const { currentVersion, versions } = catalog.data;

  async function restore(version: number) {
    try {
      const res = await sendJson<{ version: number }>(`/api/programs/${programId}/catalog/restore`, "POST", { version, baseVersion: currentVersion });
      setMessage({ tone: "info", text: `Version ${version} is back in force as version ${res!.version}.` });
      await onChanged();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The version could not be restored." });
    }
  }

  return (
    <div className="space-y-3">
      <p className="text-ink-soft">The catalog holds each instrument&apos;s sound power and outdoor carry. Every change is a new version; nothing is overwritten.</p>
      <ol className="divide-y divide-ink/10 rounded-lg border border-ink/10">
        {versions.map((v) => (
          <li key={v.version} className="flex flex-wrap items-center justify-between gap-3 px-3 py-2">
            <div>
              <span className="font-semibold">Version {v.version}</span>
              {v.version === currentVersion ? <span className="ml-2 rounded bg-turf-light px-2 py-0.5 text-sm font-semibold text-turf-dark">in force</span> : null}
              <div className="text-ink-soft">{v.note || "No note"}</div>
              <div className="text-sm text-ink-soft">
                {when(v.createdAt)}
                {v.createdBy ? ` · ${v.createdBy}` : ""}
              </div>
            </div>
            {canRestore && v.version !== currentVersion ? (
              <Button variant="secondary" onClick={() => restore(v.version)}>
                Restore version {v.version}
              </Button>
            ) : null}
          </li>
        ))}
      </ol>
      {versions[0]?.provenance ? (
        <details data-testid="catalog-provenance">
          <summary className="cursor-pointer font-semibold">Where each instrument&apos;s values come from (version in force)</summary>
          <table className="mt-2 w-full border-collapse text-left text-sm">
            <thead>
              <tr>
                <th scope="col" className="py-1 pr-3">Instrument</th>
                <th scope="col" className="py-1 pr-3">Provenance</th>
                <th scope="col" className="py-1 text-right">± dB</th>
              </tr>
            </thead>
            <tbody>
              {Object.entries(versions[0].provenance).map(([key, p]) => (
                <tr key={key} className="border-t border-ink/10">
                  <td className="py-1 pr-3">{instrumentName(key)}</td>
                  <td className="py-1 pr-3">{plainSource(p.text)}</td>
                  <td className="py-1 text-right tabular-nums">{p.uncertaintyDb < 1 ? p.uncertaintyDb.toFixed(1) : p.uncertaintyDb.toFixed(0)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      ) : null}
      <FormMessage id="history-status" tone={message?.tone ?? "info"}>{message?.text ?? ""}</FormMessage>
    </div>
  );
}
