"use client";
// The hearing map of a set: the level at each performer's ears from everyone else, on the field
// and in a table, with the dose of a rehearsal of a chosen length and the cautions beside it.
import { useState } from "react";
import type { ProgramResponse, ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { SortableTable, type Column } from "@/components/SortableTable";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import { HearingCautions } from "./HearingCautions";
import { SpreadLegend } from "@/components/field/Legend";
import { HearingField } from "./HearingField";
import { LEVEL_STEPS, type HearingPerformer, type HearingResponse } from "./hearing-types";
import { showKeys } from "@/components/api-keys";
import { FIRST_REHEARSAL_MINUTES } from "@/lib/show/first-choices";

const TOP = 15;
const SELECT = "mt-1 block min-h-12 w-full rounded-lg border border-ink/30 bg-paper-raised px-3 text-lg text-ink";
const pct = (dose: number) => `${Math.round(dose * 100)} %`;
const minutes = (m: number | null) => (m === null ? "no limit" : m >= 600 ? "over 10 h" : m >= 60 ? `${Math.floor(m / 60)} h ${Math.round(m % 60)} min` : `${Math.round(m)} min`);

export function HearingView({ showId }: { showId: string }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const programId = show.data?.show.programId ?? null;
  const program = useApi<ProgramResponse>(programId ? apiKeys.program(programId) : null);
  const [setId, setSetId] = useState<string | null>(null);
  const [length, setLength] = useState(String(FIRST_REHEARSAL_MINUTES));
  const [standard, setStandard] = useState<"niosh" | "osha">("niosh");
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [showAll, setShowAll] = useState(false);
  const chosenSet = setId ?? show.data?.sets[0]?.id ?? null;
  const rehearsal = Number(length) > 0 && Number(length) <= 1440 ? Number(length) : FIRST_REHEARSAL_MINUTES;
  const map = useApi<HearingResponse>(chosenSet ? showKeys.hearing(showId, chosenSet, rehearsal) : null);

  const crumbs = [
    { label: "Programs", href: "/programs" },
    ...(programId ? [{ label: program.data?.program.name ?? "Program", href: `/programs/${programId}` }] : []),
    { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Hearing map" },
  ];
  if (show.error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={show.error} what="show" onRetry={() => show.mutate()} />
      </>
    );
  }
  if (!show.data) return <SkeletonCard label="Loading the show…" />;

  const performers = map.data?.performers ?? [];
  const over = performers.filter((p) => p[standard].dose >= 1);
  const selected = performers.find((p) => p.performerId === selectedId) ?? null;
  const columns: Column<HearingPerformer>[] = [
    { key: "dbA", header: "At the ears", sortValue: (p) => -(p.dbA ?? -999), render: (p) => (p.dbA === null ? "—" : `${p.dbA.toFixed(1)} dBA`), align: "right" },
    { key: "label", header: "Player", sortValue: (p) => p.label },
    { key: "section", header: "Section", sortValue: (p) => p.section },
    { key: "niosh", header: "NIOSH dose", sortValue: (p) => -p.niosh.dose, render: (p) => <span className={p.niosh.dose >= 1 ? "font-semibold text-signal-bad" : ""}>{pct(p.niosh.dose)}</span>, align: "right" },
    { key: "nioshT", header: "NIOSH time allowed", sortValue: (p) => p.niosh.limitMinutes ?? Infinity, render: (p) => minutes(p.niosh.limitMinutes), align: "right" },
    { key: "osha", header: "OSHA dose", sortValue: (p) => -p.osha.dose, render: (p) => <span className={p.osha.dose >= 1 ? "font-semibold text-signal-bad" : ""}>{pct(p.osha.dose)}</span>, align: "right" },
    { key: "loudest", header: "Loudest neighbour", sortValue: (p) => p.loudestSource ?? "" },
  ];

  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub="The estimated level at each performer's ears (1.6 m above the field) from every other player in the set, and the noise dose of a rehearsal at that level.">Hearing map</PageTitle>
      <NextStepNotice showId={showId} need="drill" />
      <div className="space-y-6">
        <HearingCautions criteria={map.data?.criteria ?? { niosh: { levelDbA: 85, hours: 8, exchangeDb: 3, source: "NIOSH 98-126 (1998)" }, osha: { levelDbA: 90, hours: 8, exchangeDb: 5, source: "OSHA 29 CFR 1910.95" } }} anyOver={over.length > 0} />
        <Card title={map.data ? `Set ${map.data.set.number}` : "Set"} titleId="map-title">
          <div className="mb-4 grid gap-4 sm:grid-cols-3">
            <div>
              <label htmlFor="hearing-set" className="block font-semibold">Set</label>
              <select id="hearing-set" className={SELECT} value={chosenSet ?? ""} onChange={(e) => setSetId(e.target.value)}>
                {show.data.sets.map((s) => (
                  <option key={s.id} value={s.id}>Set {s.number}</option>
                ))}
              </select>
            </div>
            <div>
              <label htmlFor="hearing-minutes" className="block font-semibold">Rehearsal at this level (minutes)</label>
              <input id="hearing-minutes" inputMode="numeric" className={SELECT} value={length} onChange={(e) => setLength(e.target.value)} />
            </div>
            <fieldset>
              <legend className="font-semibold">Outline players over the</legend>
              <div className="mt-1 flex min-h-12 items-center gap-4">
                {(["niosh", "osha"] as const).map((s) => (
                  <label key={s} className="flex min-h-11 items-center gap-2">
                    <input type="radio" name="standard" value={s} checked={standard === s} onChange={() => setStandard(s)} />
                    {s === "niosh" ? "NIOSH limit" : "OSHA limit"}
                  </label>
                ))}
              </div>
            </fieldset>
          </div>
          {map.error ? (
            <ErrorState error={map.error} what="set" onRetry={() => map.mutate()} />
          ) : !map.data ? (
            <div className="aspect-[2.3] w-full animate-pulse rounded-lg bg-paper-sunk" role="status" aria-label="Computing the hearing map" />
          ) : (
            <>
              <HearingField performers={performers} rules={show.data.show.fieldRules} standard={standard} selectedId={selectedId} onSelect={setSelectedId} />
              <div className="mt-2">
                <SpreadLegend />
              </div>
              <div className="mt-3 flex flex-wrap items-center gap-x-5 gap-y-2" aria-label="Legend">
                <span className="font-semibold">Level at the ears (dBA, estimated):</span>
                {LEVEL_STEPS.map((s) => (
                  <span key={s.label} className="flex items-center gap-1.5">
                    <span aria-hidden="true" className="inline-block h-4 w-4 rounded-full border border-ink/60" style={{ background: s.fill }} />
                    {s.label}
                  </span>
                ))}
                <span className="flex items-center gap-1.5">
                  <span aria-hidden="true" className="inline-block h-4 w-4 rounded-full border-[3px] border-ink bg-paper" />
                  dark outline: dose over 100 % ({standard === "niosh" ? "NIOSH" : "OSHA"}) in {rehearsal} min
                </span>
              </div>
              <p className="mt-3 text-ink" aria-live="polite">
                {selected
                  ? `${selected.label} (${selected.section}): ${selected.dbA === null ? "no one else sounding" : `${selected.dbA.toFixed(1)} dBA`}, NIOSH dose ${pct(selected.niosh.dose)}, OSHA dose ${pct(selected.osha.dose)}; loudest neighbour ${selected.loudestSource ?? "none"}.`
                  : over.length
                    ? `${over.length} of ${performers.length} players pass the ${standard === "niosh" ? "NIOSH" : "OSHA"} daily limit in ${rehearsal} minutes at this set's level. Select a dot for details.`
                    : `No player passes the ${standard === "niosh" ? "NIOSH" : "OSHA"} daily limit in ${rehearsal} minutes at this set's level.`}
              </p>
            </>
          )}
        </Card>
        {map.data ? (
          <Card title="Most exposed first" titleId="exposed-title">
            <SortableTable
              caption="Players by the estimated level at their ears"
              columns={columns}
              rows={showAll ? performers : [...performers].sort((a, b) => (b.dbA ?? -Infinity) - (a.dbA ?? -Infinity)).slice(0, TOP)}
              rowKey={(p) => p.performerId}
              initialSort="dbA"
            />
            {performers.length > TOP ? (
              <Button variant="secondary" className="mt-3" onClick={() => setShowAll(!showAll)}>
                {showAll ? `Show the ${TOP} most exposed` : `Show all ${performers.length} players`}
              </Button>
            ) : null}
          </Card>
        ) : null}
      </div>
    </>
  );
}
