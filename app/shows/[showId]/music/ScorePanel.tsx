"use client";
// The arrangement behind the music: the score imported (file, parts, anchors) and, for editors, importing one:
// upload a MusicXML file, check the preview, confirm.
import { useState, type FormEvent } from "react";
import { useSWRConfig } from "swr";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { apiErrorFrom, ApiError } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { showKeys } from "@/components/api-keys";
import { useApi } from "@/components/use-api";
import { ScorePreview } from "./ScorePreview";
import type { ScorePreviewDto, ShowScoreDto } from "./score-types";

const SAMPLE = "/examples/lanterns-on-the-water.musicxml";

export function ScorePanel({ showId, canEdit }: { showId: string; canEdit: boolean }) {
  const current = useApi<ShowScoreDto>(showKeys.score(showId));
  const { mutate } = useSWRConfig();
  const [pending, setPending] = useState<{ uploadId: string; preview: ScorePreviewDto } | null>(null);
  const [status, setStatus] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setPending(null);
    setStatus({ tone: "info", text: "Reading the score…" });
    try {
      const res = await fetch(`/api/shows/${showId}/score`, { method: "POST", body: form, credentials: "same-origin" });
      if (!res.ok) throw await apiErrorFrom(res);
      const body = (await res.json()) as { upload: { id: string }; preview: ScorePreviewDto };
      setPending({ uploadId: body.upload.id, preview: body.preview });
      setStatus({ tone: "info", text: "Check the parts, the anchors and what will be written, then confirm. Nothing has changed yet." });
    } catch (err) {
      setStatus({ tone: "bad", text: err instanceof ApiError ? err.message : "The upload failed." });
    } finally {
      setBusy(false);
    }
  }

  const s = current.data?.score;
  return (
    <Card title="The score" titleId="score-title">
      {s ? (
        <div className="space-y-1" data-testid="score-summary">
          <p>
            Imported from <span className="font-semibold">{s.fileName}</span>
            {s.title ? <> ({s.title})</> : null}: {s.measures} measures, {Math.round(s.counts)} counts, starting at {s.tempo[0]?.bpm ?? "—"} counts a minute.
          </p>
          <p className="text-sm text-ink-soft">
            {s.anchors.map((a) => `Set ${a.setNumber ?? "(deleted)"} at measure ${a.measure}, beat ${a.beat}`).join("; ")}.{" "}
            {s.parts.filter((p) => p.section).length} of {s.parts.length} parts play in the show&rsquo;s sections.
          </p>
        </div>
      ) : current.data ? (
        <p className="text-ink-soft">No score imported yet. {canEdit ? "Import the arrangement to fill in each section\u2019s written dynamics set by set." : ""}</p>
      ) : null}
      {canEdit ? (
        <details className="mt-3" open={!s || pending !== null}>
          <summary className="cursor-pointer font-semibold">Import the score</summary>
          <form onSubmit={upload} className="mt-3 flex flex-wrap items-end gap-3">
            <label className="flex flex-col text-sm">
              MusicXML file (.musicxml, .xml or .mxl)
              <input name="file" type="file" required accept=".musicxml,.xml,.mxl,application/vnd.recordare.musicxml+xml,application/vnd.recordare.musicxml" className="min-h-11" />
            </label>
            <Button type="submit" disabled={busy}>Upload and preview</Button>
            <a className="text-sm underline" href={SAMPLE} download>
              The demo arrangement (MusicXML)
            </a>
          </form>
          <p className="mt-2 text-sm text-ink-soft">
            Export the arrangement from the notation program as MusicXML. Repeats are played out; D.C., D.S. and coda jumps must be written out first. At most 4 MB.
          </p>
        </details>
      ) : null}
      {status ? <FormMessage id="score-status" tone={status.tone}>{status.text}</FormMessage> : null}
      {pending ? (
        <ScorePreview
          key={pending.uploadId}
          showId={showId}
          uploadId={pending.uploadId}
          initial={pending.preview}
          onDone={async (text) => {
            setPending(null);
            setStatus({ tone: "info", text });
            await Promise.all([mutate(showKeys.music(showId)), current.mutate()]);
          }}
        />
      ) : null}
    </Card>
  );
}
