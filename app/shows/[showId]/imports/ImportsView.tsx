"use client";
// Roster and drill CSV uploads: pick a file, read the preview (creates, changes, every bad row), then confirm.
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { apiErrorFrom, ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { PageTitle } from "@/components/PageTitle";
import { useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import { CsvFormat } from "./CsvFormat";
import { PreviewPanel, type Preview } from "./PreviewPanel";
import { apiKeys, showKeys } from "@/components/api-keys";
import { useLocalTimes } from "@/components/local-time";

type Upload = { id: string; kind: string; fileName: string; sizeBytes: number; uploadedAt: string; uploadedBy: string | null; confirmedAt: string | null };
type ShowInfo = { show: { id: string; name: string; programId: string }; role: string; sets: { id: string; number: string }[] };

export function ImportsView({ showId }: { showId: string }) {
  const show = useApi<ShowInfo>(apiKeys.show(showId));
  const history = useApi<{ uploads: Upload[] }>(showKeys.imports(showId));
  const [current, setCurrent] = useState<{ upload: Upload; preview: Preview } | null>(null);
  const [status, setStatus] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const format = useLocalTimes();
  const [busy, setBusy] = useState(false);
  const [written, setWritten] = useState<string | null>(null);

  async function upload(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setStatus({ tone: "info", text: "Reading the file…" });
    setCurrent(null);
    setWritten(null);
    try {
      const res = await fetch(`/api/shows/${showId}/imports`, { method: "POST", body: form, credentials: "same-origin" });
      if (!res.ok) throw await apiErrorFrom(res);
      const body = (await res.json()) as { upload: Upload; preview: Preview };
      setCurrent(body);
      setStatus(body.preview.writable ? { tone: "info", text: "Check the preview, then confirm." } : { tone: "bad", text: "Some rows cannot be imported; nothing will be written until the file is fixed." });
      await history.mutate();
    } catch (err) {
      setStatus({ tone: "bad", text: err instanceof ApiError ? err.message : "The upload failed." });
    } finally {
      setBusy(false);
    }
  }

  async function confirm() {
    if (!current) return;
    setBusy(true);
    try {
      const res = await sendJson<{ summary: Record<string, number> }>(`/api/shows/${showId}/imports/${current.upload.id}/confirm`, "POST");
      const s = res!.summary;
      const text = current.preview.kind === "roster-csv" ? `Imported: ${s.created} performers added, ${s.changed} changed.` : `Imported: ${s.positions} positions in ${s.setsCreated + s.setsChanged} sets (${s.setsCreated} new).`;
      setStatus({ tone: "info", text });
      setWritten(current.preview.kind);
      setCurrent(null);
      await Promise.all([history.mutate(), show.mutate()]);
    } catch (err) {
      setStatus({ tone: "bad", text: err instanceof ApiError ? err.message : "The import failed; nothing was written." });
    } finally {
      setBusy(false);
    }
  }

  const name = show.data?.show.name ?? "Show";
  const canUpload = show.data && show.data.role !== "staff";
  const firstSet = show.data?.sets[0];
  return (
    <>
      <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: name, href: `/shows/${showId}` }, { label: "Imports" }]} />
      <ShowNav showId={showId} />
      <PageTitle sub="Bring a roster or a drill in from a spreadsheet. Nothing changes until you confirm.">Imports</PageTitle>
      <div className="grid items-start gap-6 lg:grid-cols-[2fr_3fr]">
        <Card title="Upload a CSV file" titleId="upload-title">
          {canUpload ? (
            <form onSubmit={upload} className="space-y-4">
              <fieldset>
                <legend className="font-semibold text-ink">The file holds</legend>
                <label className="mt-2 flex min-h-11 items-center gap-3">
                  <input type="radio" name="kind" value="drill" defaultChecked className="h-5 w-5" /> a drill (set, counts, label, position, facing)
                </label>
                <label className="flex min-h-11 items-center gap-3">
                  <input type="radio" name="kind" value="roster" className="h-5 w-5" /> a roster (label, instrument, section, part, strength, name)
                </label>
              </fieldset>
              <div>
                <label htmlFor="file" className="block font-semibold text-ink">
                  CSV file
                </label>
                <input id="file" name="file" type="file" accept=".csv,text/csv" required className="mt-1 block w-full min-h-11" />
                <p className="mt-1 text-sm text-ink-soft">
                  At most 1 MB. Examples: <a className="underline" href="/examples/drill.csv">drill.csv</a>, <a className="underline" href="/examples/roster.csv">roster.csv</a>. The columns are described below.
                </p>
                <CsvFormat />
              </div>
              <Button type="submit" disabled={busy}>
                Preview the import
              </Button>
            </form>
          ) : (
            <p className="text-ink-soft">Staff can read the upload history; designers and directors bring files in.</p>
          )}
          <FormMessage id="import-status" tone={status?.tone ?? "info"}>
            {status?.text ?? ""}
          </FormMessage>
          {written === "drill-csv" && firstSet ? (
            <p>
              <Link className="font-semibold text-turf-dark underline" href={`/shows/${showId}/sets/${firstSet.id}`}>
                See the sets on the field
              </Link>
            </p>
          ) : null}
        </Card>
        <div className="space-y-6">
          {current ? <PreviewPanel preview={current.preview} fileName={current.upload.fileName} busy={busy} onConfirm={confirm} onCancel={() => setCurrent(null)} sets={show.data?.sets ?? []} showId={showId} /> : null}
          <Card title="Uploaded files" titleId="history-title">
            {!history.data?.uploads.length ? (
              <p className="text-ink-soft">No files uploaded yet.</p>
            ) : (
              <table className="w-full text-left text-sm">
                <thead>
                  <tr className="border-b border-ink/15 text-ink-soft">
                    <th className="py-2 pr-2">File</th>
                    <th className="py-2 pr-2">By</th>
                    <th className="py-2 pr-2">When</th>
                    <th className="py-2">Imported</th>
                  </tr>
                </thead>
                <tbody>
                  {history.data.uploads.map((u) => (
                    <tr key={u.id} className="border-b border-ink/10">
                      <td className="py-2 pr-2">
                        <a className="underline" href={`/api/shows/${showId}/imports/${u.id}/file`}>
                          {u.fileName}
                        </a>{" "}
                        <span className="text-ink-soft">({u.kind.replace("-csv", "").replace("show-json", "show file").replace("musicxml", "score")})</span>
                      </td>
                      <td className="py-2 pr-2">{u.uploadedBy ?? "—"}</td>
                      <td className="py-2 pr-2">{format(u.uploadedAt, { dateStyle: "medium", timeStyle: "short" })}</td>
                      <td className="py-2">{u.confirmedAt ? "yes" : "no"}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </Card>
        </div>
      </div>
    </>
  );
}
