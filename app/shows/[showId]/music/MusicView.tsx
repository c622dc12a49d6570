"use client";
// The show's music: phrases over the sets; per phrase, each section's voice and dynamics, overrides and the balance plan.
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import type { MusicResponse } from "./music-types";
import { OverridesPanel } from "./OverridesPanel";
import { PhraseTable } from "./PhraseTable";
import { PlanPanel } from "./PlanPanel";

export const musicKey = (showId: string) => `/api/shows/${encodeURIComponent(showId)}/music`;

export function MusicView({ showId, initialPhraseId }: { showId: string; initialPhraseId: string | null }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const music = useApi<MusicResponse>(musicKey(showId));
  const [picked, setPicked] = useState<string | null>(initialPhraseId);
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
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub={`${m.phrases.length} phrases over ${m.sets.length} sets${m.canEdit ? "" : " · read only"}`}>Music</PageTitle>
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
                  Sets {p.firstSetNumber}
                  {p.lastSetNumber !== p.firstSetNumber ? `–${p.lastSetNumber}` : ""}
                </span>
              </button>
            </li>
          ))}
        </ul>
      </Card>
      {phrase ? (
        <div className="mt-6 space-y-6">
          <PhraseTable showId={showId} music={m} phrase={phrase} />
          <PlanPanel showId={showId} phrase={phrase} canAdopt={m.canAdopt} listeningPoints={show.data.listeningPoints} />
          <OverridesPanel showId={showId} music={m} phrase={phrase} />
        </div>
      ) : (
        <p className="mt-6 text-ink-soft">No phrases yet.</p>
      )}
    </>
  );
}
