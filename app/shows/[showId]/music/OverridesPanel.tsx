"use client";
// Per-performer overrides within a phrase: a solo, a player laying out.
import { useState } from "react";
import { useSWRConfig } from "swr";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { sendJson } from "@/components/fetcher";
import type { MusicPhrase, MusicResponse } from "./music-types";
import { DYNAMIC_ORDER, VOICE_LABELS, VOICE_ORDER } from "./voices";

const select = "min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2";

export function OverridesPanel({ showId, music, phrase }: { showId: string; music: MusicResponse; phrase: MusicPhrase }) {
  const { mutate } = useSWRConfig();
  const key = `/api/shows/${encodeURIComponent(showId)}/music`;
  const [performerId, setPerformerId] = useState("");
  const [voice, setVoice] = useState("tacet");
  const [dynamic, setDynamic] = useState("mf");
  const [note, setNote] = useState("");
  const [status, setStatus] = useState("");
  const labelOf = new Map(music.performers.map((p) => [p.id, `${p.label} (${p.section})`]));
  const list = music.overrides.filter((o) => o.phraseId === phrase.id);

  async function send(method: "PUT" | "DELETE", body: unknown, done: string) {
    setStatus("Saving…");
    try {
      await sendJson(`${key}/overrides`, method, body);
      await mutate(key);
      setStatus(done);
    } catch (e) {
      setStatus(e instanceof Error ? e.message : "Could not save.");
    }
  }

  return (
    <Card title="Solos and players laying out" titleId="overrides-title">
      {list.length === 0 ? <p className="text-ink-soft">Every player follows their section in this phrase.</p> : (
        <ul className="space-y-2">
          {list.map((o) => (
            <li key={o.performerId} className="flex flex-wrap items-center gap-3">
              <span className="font-semibold">{labelOf.get(o.performerId) ?? "A player"}</span>
              <span>{VOICE_LABELS[o.voice]}{o.voice !== "tacet" ? ` at ${o.playedDynamic ?? o.writtenDynamic}` : ""}</span>
              {o.note ? <span className="text-ink-soft">— {o.note}</span> : null}
              {music.canEdit ? (
                <Button variant="quiet" onClick={() => send("DELETE", { phraseId: phrase.id, performerId: o.performerId }, "Override removed.")}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {music.canEdit ? (
        <form
          className="mt-4 flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (performerId) void send("PUT", { overrides: [{ phraseId: phrase.id, performerId, voice, writtenDynamic: dynamic, note }] }, "Override saved.");
          }}
        >
          <label className="flex flex-col text-sm">
            Player
            <select className={select} value={performerId} onChange={(e) => setPerformerId(e.target.value)} required>
              <option value="">Choose…</option>
              {music.performers.map((p) => <option key={p.id} value={p.id}>{p.label} ({p.section})</option>)}
            </select>
          </label>
          <label className="flex flex-col text-sm">
            Voice
            <select className={select} value={voice} onChange={(e) => setVoice(e.target.value)}>
              {VOICE_ORDER.map((v) => <option key={v} value={v}>{VOICE_LABELS[v]}</option>)}
            </select>
          </label>
          <label className="flex flex-col text-sm">
            Written dynamic
            <select className={select} value={dynamic} onChange={(e) => setDynamic(e.target.value)}>
              {DYNAMIC_ORDER.map((d) => <option key={d} value={d}>{d}</option>)}
            </select>
          </label>
          <label className="flex flex-col text-sm">
            Note
            <input className="min-h-11 rounded-lg border border-ink-soft/40 px-2" value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} />
          </label>
          <Button type="submit">Save override</Button>
        </form>
      ) : null}
      <p aria-live="polite" className="mt-2 min-h-6 text-sm text-ink-soft">{status}</p>
    </Card>
  );
}
