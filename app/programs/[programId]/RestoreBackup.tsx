"use client";
// Restoring a show's backup: choose the file, read what it would create (nothing is written), then restore it as a new show.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/Button";
import { apiErrorFrom } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";

type Preview = { name: string; fieldRules: string; conditions: { temperatureC: number; relativeHumidityPct: number }; performers: number; sets: { number: string }[]; movements: string[]; phrases: string[]; listeningPoints: string[] };

async function sendFile(url: string, file: File) {
  const form = new FormData();
  form.set("file", file);
  const res = await fetch(url, { method: "POST", body: form, credentials: "same-origin" });
  if (!res.ok) throw await apiErrorFrom(res);
  return res.json();
}

export function RestoreBackup({ programId, onRestored }: { programId: string; onRestored(): void }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const base = `/api/programs/${encodeURIComponent(programId)}/shows/import`;
  const run = async (fn: () => Promise<void>) => {
    setBusy(true);
    setError(null);
    try {
      await fn();
    } catch (err) {
      setError(err instanceof Error ? err.message : "That did not work.");
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="mt-6 border-t border-ink/10 pt-4">
      <h3 className="font-semibold">Restore a backup</h3>
      <p className="text-sm text-ink-soft">A show&apos;s backup file (Settings → Download the backup) becomes a new show. You see what it holds before anything is written.</p>
      <input
        type="file"
        accept=".json,application/json"
        aria-label="Backup file"
        className="mt-2 block text-sm"
        onChange={(e) => {
          const f = e.target.files?.[0] ?? null;
          setFile(f);
          setPreview(null);
          if (f) void run(async () => setPreview((await sendFile(`${base}/preview`, f)).preview));
        }}
      />
      {preview ? (
        <div className="mt-3 rounded-lg border border-ink/15 bg-paper p-3 text-sm" data-testid="backup-preview">
          <p className="font-semibold">{preview.name}</p>
          <p>
            {preview.performers} performers · {preview.sets.length} sets · {preview.phrases.length} phrases · {preview.movements.length} movements · listening points: {preview.listeningPoints.join(", ")}
          </p>
          <p className="text-ink-soft">
            {preview.fieldRules} rules, {preview.conditions.temperatureC} °C, {preview.conditions.relativeHumidityPct} % humidity
          </p>
          <div className="mt-2 flex gap-2">
            <Button
              disabled={busy}
              onClick={() =>
                run(async () => {
                  const r = await sendFile(base, file!);
                  onRestored();
                  router.push(`/shows/${r.show.id}`);
                })
              }
            >
              Restore as a new show
            </Button>
            <Button variant="secondary" onClick={() => setPreview(null)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      <FormMessage id="restore-message" tone="bad">
        {error}
      </FormMessage>
    </div>
  );
}
