"use client";
// One performer's own page, made for a phone on the field: every set's position in the trade's words,
// its counts and facing, with a small picture of where they stand among the band.
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { EmptyState } from "@/components/EmptyState";
import { ErrorState } from "@/components/ErrorState";
import { plural } from "@/components/format";
import { MiniField } from "@/components/MiniField";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { useApi } from "@/components/use-api";
import type { BareSet, PerformerSheet } from "@/lib/sheets/coordinates";
import { instrumentName } from "../../instrument-options";
import { showKeys } from "@/components/api-keys";

type Sheets = { show: { id: string; name: string }; performers: PerformerSheet[]; sets: BareSet[] };

export function PerformerDots({ showId, label }: { showId: string; label: string }) {
  const sheets = useApi<Sheets>(showKeys.performerSheet(showId, label));
  const crumbs = [
    { label: "Programs", href: "/programs" },
    { label: sheets.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Coordinate sheets", href: `/shows/${showId}/sheets` },
    { label },
  ];
  if (sheets.error) return <ErrorState error={sheets.error} what="show" onRetry={() => sheets.mutate()} />;
  if (!sheets.data) return <SkeletonCard rows={6} label="Loading the dots…" />;
  const me = sheets.data.performers.find((p) => p.label.toLowerCase() === label.toLowerCase());
  if (!me) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <EmptyState title={`No performer labelled ${label}`}>Check the label on the show&rsquo;s roster, or open the coordinate sheets.</EmptyState>
      </>
    );
  }
  const setsByNumber = new Map(sheets.data.sets.map((s) => [s.number, s]));
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <PageTitle sub={`${me.name ? `${me.name} · ` : ""}${me.section}${me.part ? `, ${me.part}` : ""} · ${instrumentName(me.instrument)} · ${plural(me.rows.length, "set")}`}>{me.label}</PageTitle>
      {me.rows.length === 0 ? <EmptyState title="Not placed in any set yet">The drill designer places performers in the field editor.</EmptyState> : null}
      <ol className="space-y-4">
        {me.rows.map((r) => {
          const set = setsByNumber.get(r.set);
          return (
            <li key={r.set} className="rounded-xl border border-ink/10 bg-paper-raised p-4">
              <h2 className="text-xl font-bold">
                Set {r.set} <span className="text-base font-normal text-ink-soft">· {plural(r.counts, "count")}</span>
              </h2>
              <p className="mt-1 text-lg">{r.sideToSide}</p>
              <p className="text-lg">{r.frontToBack}</p>
              <p className="text-ink-soft">Facing {r.facingWords}</p>
              {set ? (
                <div className="mt-2">
                  <MiniField
                    title={`Set ${r.set}: ${me.label} among the band`}
                    dots={set.dots.map((d) => ({ performerId: d.label, x: d.x, y: d.y }))}
                    highlight={new Set([me.label])}
                  />
                </div>
              ) : null}
            </li>
          );
        })}
      </ol>
    </>
  );
}
