"use client";
// A CSV of readings: preview every row first, then store them all at once.
import { useState } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { CSV_COLUMNS } from "@/lib/validation/readings";

type Preview = { token: string; rows: { line: number; reading: unknown; errors: string[] }[]; valid: number; invalid: number; headerErrors: string[] };

export function CsvUpload({ showId, onStored }: { showId: string; onStored: () => Promise<unknown> }) {
  const [csv, setCsv] = useState<string | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const url = `/api/shows/${showId}/readings/upload`;

  async function choose(file: File | undefined) {
    setPreview(null);
    setMessage(null);
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    setBusy(true);
    try {
      const res = await sendJson<{ preview: Preview }>(url, "POST", { csv: text });
      setPreview(res!.preview);
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The file could not be read." });
    } finally {
      setBusy(false);
    }
  }

  async function confirm() {
    if (!csv || !preview) return;
    setBusy(true);
    try {
      const res = await sendJson<{ stored: number }>(url, "POST", { csv, confirm: preview.token });
      setMessage({ tone: "info", text: `${res!.stored} reading${res!.stored === 1 ? "" : "s"} stored.` });
      setPreview(null);
      setCsv(null);
      await onStored();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "The readings could not be stored." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="space-y-3">
      <p className="text-ink-soft">
        One reading a row with the columns <code className="text-sm">{CSV_COLUMNS.join(", ")}</code>. Sets by number, points by name, sections as <code className="text-sm">Trumpets: f; Tubas: ff</code>.
      </p>
      <label htmlFor="readings-file" className="block font-semibold">CSV file</label>
      <input id="readings-file" type="file" accept=".csv,text/csv" className="block min-h-11 w-full text-ink file:mr-3 file:min-h-11 file:rounded-lg file:border file:border-ink/30 file:bg-paper-raised file:px-4 file:font-semibold hover:file:bg-paper-sunk" onChange={(e) => choose(e.target.files?.[0])} />
      {preview ? (
        <div className="space-y-2">
          <p>
            <strong>{preview.valid}</strong> row{preview.valid === 1 ? "" : "s"} ready
            {preview.invalid ? <>, <strong className="text-signal-bad">{preview.invalid}</strong> with problems (fix the file; nothing is stored until every row is right)</> : null}.
          </p>
          {[...preview.headerErrors, ...preview.rows.flatMap((r) => r.errors.map((e) => `Line ${r.line}: ${e}`))].length ? (
            <ul className="max-h-48 overflow-y-auto rounded-lg border border-signal-bad/30 bg-paper px-3 py-2 text-sm text-signal-bad">
              {[...preview.headerErrors, ...preview.rows.flatMap((r) => r.errors.map((e) => `Line ${r.line}: ${e}`))].map((e, i) => (
                <li key={i}>{e}</li>
              ))}
            </ul>
          ) : null}
          <Button onClick={confirm} disabled={busy || preview.invalid > 0 || preview.valid === 0 || preview.headerErrors.length > 0}>
            Store {preview.valid} reading{preview.valid === 1 ? "" : "s"}
          </Button>
        </div>
      ) : null}
      <FormMessage id="upload-status" tone={message?.tone ?? "info"}>{busy ? "Working…" : (message?.text ?? "")}</FormMessage>
    </div>
  );
}
