"use client";
// The preview of a score import: which section each part plays in and where sets meet the music (both editable),
// then each set's written dynamics, the phrases it makes and what it replaces; nothing is written until confirmed.
import { useState } from "react";
import { Button } from "@/components/Button";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import type { ScoreAnchorDto, ScorePreviewDto } from "./score-types";

const input = "min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2";
const LEAVE_OUT = "";

export function ScorePreview({ showId, uploadId, initial, onDone }: { showId: string; uploadId: string; initial: ScorePreviewDto; onDone: (message: string) => void }) {
  const [preview, setPreview] = useState(initial);
  const [mapping, setMapping] = useState<Record<string, string | null>>(initial.mapping);
  const [anchors, setAnchors] = useState<ScoreAnchorDto[]>(initial.anchors);
  const [status, setStatus] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [stale, setStale] = useState(false);
  const base = `/api/shows/${showId}/score/${uploadId}`;
  const choices = () => ({ mapping, anchors: anchors.map((a) => ({ ...a, beat: Number(a.beat) })) });

  async function send(what: "preview" | "confirm") {
    setBusy(true);
    setStatus({ tone: "info", text: what === "preview" ? "Working out the preview…" : "Writing the phrases…" });
    try {
      if (what === "preview") {
        const res = await sendJson<{ preview: ScorePreviewDto }>(`${base}/preview`, "POST", choices());
        setPreview(res!.preview);
        setStale(false);
        setStatus({ tone: "info", text: "Preview updated. Nothing has changed yet." });
      } else {
        const res = await sendJson<{ summary: { phrases: number; sets: number } }>(`${base}/confirm`, "POST", choices());
        onDone(`Imported: ${res!.summary.phrases} phrases with written dynamics for ${res!.summary.sets} sets.`);
      }
    } catch (err) {
      setStatus({ tone: "bad", text: err instanceof ApiError ? err.message : "That did not work; nothing was written." });
    } finally {
      setBusy(false);
    }
  }
  const changed = <T,>(set: (v: T) => void) => (v: T) => (set(v), setStale(true));
  const setMap = changed(setMapping);
  const setAnchorList = changed(setAnchors);
  const mappedSections = preview.sections.filter((s) => preview.written.some((w) => s in w.written));
  const r = preview.replaces;

  return (
    <div className="mt-4 space-y-6" data-testid="score-preview">
      <section aria-labelledby="score-parts-title">
        <h3 id="score-parts-title" className="font-semibold">Parts and sections</h3>
        <p className="text-sm text-ink-soft">
          {preview.score.title ? `${preview.score.title}: ` : ""}
          {preview.score.measures} measures ({preview.score.firstMeasure}–{preview.score.lastMeasure}). Parts in one section merge: the loudest marking is the section&rsquo;s.
        </p>
        <table className="mt-2 border-collapse text-left">
          <thead>
            <tr className="border-b border-ink/15 text-sm text-ink-soft">
              <th scope="col" className="py-1 pr-4">Part</th>
              <th scope="col" className="py-1 pr-4">Notes</th>
              <th scope="col" className="py-1 pr-4">Plays in</th>
            </tr>
          </thead>
          <tbody>
            {preview.score.parts.map((p) => (
              <tr key={p.id} className="border-b border-ink/5">
                <th scope="row" className="py-1 pr-4 font-medium">
                  {p.name}
                  {p.hasDynamics ? null : <span className="ml-2 text-sm font-normal text-ink-soft">(no dynamics)</span>}
                </th>
                <td className="py-1 pr-4 tabular-nums">{p.notes}</td>
                <td className="py-1 pr-4">
                  <select aria-label={`Section for ${p.name}`} className={input} value={mapping[p.id] ?? LEAVE_OUT} onChange={(e) => setMap({ ...mapping, [p.id]: e.target.value || null })}>
                    <option value={LEAVE_OUT}>Leave out</option>
                    {preview.sections.map((s) => <option key={s} value={s}>{s}</option>)}
                  </select>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="score-anchors-title">
        <h3 id="score-anchors-title" className="font-semibold">Where the drill meets the music</h3>
        <p className="text-sm text-ink-soft">The first anchor is needed; add one where the music holds (a fermata), changes tempo or is cut. Between anchors one drill count is one beat.</p>
        <ul className="mt-2 space-y-2">
          {anchors.map((a, i) => (
            <li key={i} className="flex flex-wrap items-end gap-2" aria-label={`Anchor ${i + 1}`}>
              <label className="flex flex-col text-sm">
                Set
                <select aria-label={`Set of anchor ${i + 1}`} className={input} value={a.setId} onChange={(e) => setAnchorList(anchors.map((x, k) => (k === i ? { ...x, setId: e.target.value } : x)))}>
                  {preview.sets.map((s) => <option key={s.id} value={s.id}>Set {s.number}</option>)}
                </select>
              </label>
              <label className="flex flex-col text-sm">
                Measure
                <input aria-label={`Measure of anchor ${i + 1}`} className={`${input} w-24`} value={a.measure} onChange={(e) => setAnchorList(anchors.map((x, k) => (k === i ? { ...x, measure: e.target.value } : x)))} />
              </label>
              <label className="flex flex-col text-sm">
                Beat
                <input aria-label={`Beat of anchor ${i + 1}`} type="number" min={1} step="any" className={`${input} w-20`} value={a.beat} onChange={(e) => setAnchorList(anchors.map((x, k) => (k === i ? { ...x, beat: Number(e.target.value) } : x)))} />
              </label>
              {anchors.length > 1 ? <Button variant="quiet" onClick={() => setAnchorList(anchors.filter((_, k) => k !== i))}>Remove</Button> : null}
            </li>
          ))}
        </ul>
        <Button variant="quiet" className="mt-2" onClick={() => setAnchorList([...anchors, { setId: preview.sets[preview.sets.length - 1]!.id, measure: preview.score.lastMeasure, beat: 1 }])}>
          Add an anchor
        </Button>
      </section>

      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" disabled={busy} onClick={() => send("preview")}>Preview with these choices</Button>
        <Button disabled={busy || stale} onClick={() => send("confirm")}>Confirm the import</Button>
      </div>
      {stale ? <p className="text-sm text-ink-soft">You changed the choices: preview them before you confirm.</p> : null}
      {status ? <FormMessage id="score-preview-status" tone={status.tone}>{status.text}</FormMessage> : null}

      {preview.notes.length || preview.hints.length ? (
        <section aria-labelledby="score-notes-title">
          <h3 id="score-notes-title" className="font-semibold">Worth knowing</h3>
          <ul className="list-disc pl-5">
            {preview.notes.map((n) => <li key={n}>{n}</li>)}
            {preview.hints.map((h, i) => (
              <li key={`h${i}`}>
                &ldquo;{h.text}&rdquo; in {h.part}, measure {h.measure}{h.section ? ` (${h.section})` : ""}: set a solo or a split on the phrase if it needs one.
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="score-sets-title">
        <h3 id="score-sets-title" className="font-semibold">Written dynamics it will write, set by set</h3>
        <div className="overflow-x-auto">
          <table className="border-collapse text-left text-sm" data-testid="score-preview-sets">
            <thead>
              <tr className="border-b border-ink/15 text-ink-soft">
                <th scope="col" className="py-1 pr-3">Set</th>
                <th scope="col" className="py-1 pr-3">In the music</th>
                {mappedSections.map((s) => <th key={s} scope="col" className="py-1 pr-3">{s}</th>)}
              </tr>
            </thead>
            <tbody>
              {preview.written.map((w) => (
                <tr key={w.setId} className="border-b border-ink/5">
                  <th scope="row" className="py-1 pr-3">{w.number}</th>
                  <td className="py-1 pr-3 whitespace-nowrap">{w.at ? `m. ${w.at.measure}, beat ${w.at.beat}` : "outside the music"}</td>
                  {mappedSections.map((s) => <td key={s} className="py-1 pr-3 font-semibold">{w.written[s] ?? <span className="font-normal text-ink-faint">keeps</span>}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="score-phrases-title">
        <h3 id="score-phrases-title" className="font-semibold">Phrases it makes</h3>
        <ol className="list-decimal pl-5" data-testid="score-preview-phrases">
          {preview.phrases.map((p) => (
            <li key={p.name}>
              {p.name}: {p.firstSetNumber === p.lastSetNumber ? `set ${p.firstSetNumber}` : `sets ${p.firstSetNumber}–${p.lastSetNumber}`}
              {p.keepsOwnSettings ? <span className="text-ink-soft"> (keeps its phrase&rsquo;s limits, solos and lay-outs)</span> : null}
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="score-replaces-title">
        <h3 id="score-replaces-title" className="font-semibold">What it replaces</h3>
        <p>
          {r.phrases.length
            ? `The show's ${r.phrases.length} phrases (${r.phrases.map((p) => p.name).join(", ")}) are replaced by these. Voices stay as they are set by set; sections no part plays in keep their voices and dynamics.`
            : "The show has no phrases yet; these are new."}
        </p>
        <ul className="list-disc pl-5">
          {r.limitsLost.length ? <li>Musical limits set on {r.limitsLost.join(", ")} will be lost.</li> : null}
          {r.overridesLost.map((o) => <li key={o.phrase}>{o.count} solo or lay-out setting{o.count === 1 ? "" : "s"} of {o.phrase} will be lost.</li>)}
          {r.plansCleared ? <li>{r.plansCleared} adopted plan dynamic{r.plansCleared === 1 ? "" : "s"} will be cleared where the written dynamic under {r.plansCleared === 1 ? "it" : "them"} changes.</li> : null}
          {!r.limitsLost.length && !r.overridesLost.length && !r.plansCleared && r.phrases.length ? <li>No musical limits, solos, lay-outs or adopted plans are lost.</li> : null}
        </ul>
      </section>
    </div>
  );
}
