"use client";
// The show's music: phrases over the sets; per phrase, each section's voice and dynamics, overrides and the balance plan.
import { useState } from "react";
import { Button } from "@/components/Button";
import type { ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { FormMessage } from "@/components/FormMessage";
import { plural } from "@/components/format";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import type { MusicResponse } from "./music-types";
import { OverridesPanel } from "./OverridesPanel";
import { PhraseForm } from "./PhraseForm";
import { PhraseTable } from "./PhraseTable";
import { PlanPanel } from "./PlanPanel";
import { ScorePanel } from "./ScorePanel";
import { WrittenBySet } from "./WrittenBySet";
import { showKeys } from "@/components/api-keys";
import { MusicListen } from "@/components/listen/MusicListen";

export const musicKey = showKeys.music;

export function MusicView({ showId, initialPhraseId }: { showId: string; initialPhraseId: string | null }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const music = useApi<MusicResponse>(musicKey(showId));
  const [picked, setPicked] = useState<string | null>(initialPhraseId);
  const [form, setForm] = useState<"new" | "edit" | null>(null);
  const [status, setStatus] = useState("");
  const crumbs = [
    { label: "Programs", href: "/programs" },
    { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Music" },
  ];
  const error = show.error ?? music.error;
  if (error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={error} what="show" onRetry={() => (show.mutate(), music.mutate())} />
      </>
    );
  }
  if (!show.data || !music.data) return <SkeletonCard rows={8} label="Loading the music…" />;
  const m = music.data;
  const phrase = m.phrases.find((p) => p.id === picked) ?? m.phrases[0] ?? null;
  const setOrder = new Map(m.sets.map((s) => [s.id, s.order]));
  const lastEnd = Math.max(-1, ...m.phrases.map((p) => setOrder.get(p.lastSetId) ?? -1));
  const nextFirst = [...m.sets].sort((a, b) => a.order - b.order).find((s) => s.order > lastEnd)?.id;
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub={`${plural(m.phrases.length, "phrase")} over ${plural(m.sets.length, "set")}${m.canEdit ? "" : " · read only"}`}>Music</PageTitle>
      <Card title="Phrases" titleId="phrases-title">
        <ul className="flex flex-wrap gap-2" aria-label="Phrases">
          {m.phrases.map((p) => (
            <li key={p.id}>
              <button
                type="button"
                aria-pressed={p.id === phrase?.id}
                onClick={() => setPicked(p.id)}
                className={`min-h-11 rounded-lg border px-3 py-1 text-left ${p.id === phrase?.id ? "border-turf-dark bg-turf-light font-semibold" : "border-ink/15 bg-paper-raised hover:border-ink/40"}`}
              >
                <span className="block">{p.name}</span>
                <span className="block text-sm text-ink-soft">
                  {p.lastSetNumber !== p.firstSetNumber ? `Sets ${p.firstSetNumber}–${p.lastSetNumber}` : `Set ${p.firstSetNumber}`}
                </span>
              </button>
            </li>
          ))}
        </ul>
        {m.canEdit ? (
          <div className="mt-3 flex flex-wrap gap-2">
            <Button variant="secondary" onClick={() => setForm("new")}>New phrase</Button>
            {phrase ? <Button variant="quiet" onClick={() => setForm("edit")}>Rename, re-span or delete {phrase.name}</Button> : null}
          </div>
        ) : null}
        {form ? (
          <PhraseForm
            key={form === "edit" ? phrase?.id : "new"}
            showId={showId}
            sets={m.sets}
            phrase={form === "edit" ? phrase : null}
            suggestedFirstSetId={nextFirst}
            onCancel={() => setForm(null)}
            onDone={async (id, message) => {
              await music.mutate();
              if (id) setPicked(id);
              setForm(null);
              setStatus(message);
            }}
          />
        ) : null}
        <FormMessage id="phrases-status" tone="info">{status}</FormMessage>
      </Card>
      <div className="mt-6 space-y-6">
        <ScorePanel showId={showId} canEdit={m.canEdit} />
        {m.phrases.length ? <WrittenBySet music={m} /> : null}
      </div>
      {phrase ? (
        <div className="mt-6 space-y-6">
          <PhraseTable showId={showId} music={m} phrase={phrase} />
          <PlanPanel showId={showId} phrase={phrase} canAdopt={m.canAdopt} listeningPoints={show.data.listeningPoints} />
          <Card title="Listen" titleId="listen-card-title">
            <MusicListen key={phrase.id} showId={showId} show={show.data} firstSetId={phrase.firstSetId} />
          </Card>
          <OverridesPanel showId={showId} music={m} phrase={phrase} />
        </div>
      ) : (
        <p className="mt-6 text-ink-soft">
          {m.canEdit
            ? m.sections.length
              ? "No phrases yet. Make the first one with \u201cNew phrase\u201d: name it and choose the sets it spans; then give each section its voice and written dynamic."
              : "No phrases yet. Add the band on the show\u2019s overview first; then make phrases here and give each section its voice and written dynamic."
            : "No phrases yet. The director or the drill designer writes the music here."}
        </p>
      )}
    </>
  );
}
