"use client";
// One phrase's sections: voice, written dynamic and the adopted played dynamic; select rows to change them together.
import { useState } from "react";
import { useSWRConfig } from "swr";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { sendJson } from "@/components/fetcher";
import type { MusicPhrase, MusicResponse } from "./music-types";
import { DYNAMIC_ORDER, VOICE_COLORS, VOICE_LABELS, VOICE_ORDER } from "./voices";

const select = "min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2";

export function PhraseTable({ showId, music, phrase }: { showId: string; music: MusicResponse; phrase: MusicPhrase }) {
  const { mutate } = useSWRConfig();
  const key = `/api/shows/${encodeURIComponent(showId)}/music`;
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [bulkVoice, setBulkVoice] = useState("");
  const [bulkDynamic, setBulkDynamic] = useState("");
  const [status, setStatus] = useState("");
  const rows = music.sections.map((s) => {
    const a = music.assignments.find((x) => x.phraseId === phrase.id && x.section === s.name);
    return { ...s, voice: a?.voice ?? "tacet", writtenDynamic: a?.writtenDynamic ?? "—", playedDynamic: a?.playedDynamic ?? null };
  });

  async function change(sections: string[], body: { voice?: string; writtenDynamic?: string }) {
    setStatus("Saving…");
    try {
      await sendJson(`${key}/assignments`, "PATCH", { rows: sections.map((section) => ({ phraseId: phrase.id, section })), ...body });
      await mutate(key);
      setStatus(`Saved ${sections.length === 1 ? sections[0] : `${sections.length} sections`}.`);
    } catch (e) {
      setStatus(e instanceof Error ? e.message : "Could not save.");
    }
  }

  const toggle = (name: string) => setSelected((s) => { const n = new Set(s); if (n.has(name)) n.delete(name); else n.add(name); return n; });
  return (
    <Card title={`${phrase.name}: voices and dynamics`} titleId="voicing-title">
      {music.canEdit ? (
        <div className="mb-4 flex flex-wrap items-end gap-3 rounded-lg bg-paper-sunk p-3" role="group" aria-label="Change the selected rows">
          <span className="font-semibold">{selected.size} selected</span>
          <label className="flex flex-col text-sm">
            Voice
            <select className={select} value={bulkVoice} onChange={(e) => setBulkVoice(e.target.value)}>
              <option value="">(keep)</option>
              {VOICE_ORDER.map((v) => <option key={v} value={v}>{VOICE_LABELS[v]}</option>)}
            </select>
          </label>
          <label className="flex flex-col text-sm">
            Written dynamic
            <select className={select} value={bulkDynamic} onChange={(e) => setBulkDynamic(e.target.value)}>
              <option value="">(keep)</option>
              {DYNAMIC_ORDER.map((d) => <option key={d} value={d}>{d}</option>)}
            </select>
          </label>
          <Button
            disabled={selected.size === 0 || (!bulkVoice && !bulkDynamic)}
            onClick={() => change([...selected], { ...(bulkVoice ? { voice: bulkVoice } : {}), ...(bulkDynamic ? { writtenDynamic: bulkDynamic } : {}) })}
          >
            Apply to selected
          </Button>
        </div>
      ) : null}
      <p aria-live="polite" className="mb-2 min-h-6 text-sm text-ink-soft">{status}</p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left">
          <thead>
            <tr className="border-b border-ink/15 text-sm text-ink-soft">
              {music.canEdit ? (
                <th scope="col" className="w-10 py-2">
                  <input
                    type="checkbox"
                    aria-label="Select all sections"
                    className="h-5 w-5"
                    checked={selected.size === rows.length && rows.length > 0}
                    onChange={(e) => setSelected(e.target.checked ? new Set(rows.map((r) => r.name)) : new Set())}
                  />
                </th>
              ) : null}
              <th scope="col" className="py-2 pr-3">Section</th>
              <th scope="col" className="py-2 pr-3">Players</th>
              <th scope="col" className="py-2 pr-3">Voice</th>
              <th scope="col" className="py-2 pr-3">Written</th>
              <th scope="col" className="py-2 pr-3">Played (adopted plan)</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.name} className="border-b border-ink/5">
                {music.canEdit ? (
                  <td className="py-1 pr-3">
                    <input type="checkbox" className="h-5 w-5" aria-label={`Select ${r.name}`} checked={selected.has(r.name)} onChange={() => toggle(r.name)} />
                  </td>
                ) : null}
                <th scope="row" className="py-1 pr-3 font-medium">{r.name}</th>
                <td className="py-1 pr-3 tabular-nums">{r.players}</td>
                <td className="py-1 pr-3">
                  {music.canEdit ? (
                    <select aria-label={`Voice of ${r.name}`} className={select} value={r.voice} onChange={(e) => change([r.name], { voice: e.target.value })}>
                      {VOICE_ORDER.map((v) => <option key={v} value={v}>{VOICE_LABELS[v]}</option>)}
                    </select>
                  ) : (
                    <span className="inline-flex items-center gap-2"><span aria-hidden className="inline-block h-3 w-3 rounded-full" style={{ background: VOICE_COLORS[r.voice] }} />{VOICE_LABELS[r.voice]}</span>
                  )}
                </td>
                <td className="py-1 pr-3">
                  {music.canEdit ? (
                    <select aria-label={`Written dynamic of ${r.name}`} className={select} value={r.writtenDynamic} onChange={(e) => change([r.name], { writtenDynamic: e.target.value })}>
                      {r.writtenDynamic === "—" ? <option value="—">—</option> : null}
                      {DYNAMIC_ORDER.map((d) => <option key={d} value={d}>{d}</option>)}
                    </select>
                  ) : (
                    <span className="font-semibold">{r.writtenDynamic}</span>
                  )}
                </td>
                <td className="py-1 pr-3">{r.playedDynamic ? <span className="font-semibold text-turf-dark">{r.playedDynamic}</span> : <span className="text-ink-faint">as written</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Card>
  );
}
