"use client";
// A program: its shows (links to their overviews) and its members with their roles.
import Link from "next/link";
import type { ProgramResponse, ShowsResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { EmptyState } from "@/components/EmptyState";
import { can } from "@/lib/auth/permissions";
import { NewShowForm } from "./NewShowForm";
import { RestoreBackup } from "./RestoreBackup";
import { DeletedShows } from "./DeletedShows";
import { ErrorState } from "@/components/ErrorState";
import { PageTitle } from "@/components/PageTitle";
import { RoleBadge, ROLE_WORDS } from "@/components/RoleBadge";
import { SkeletonBar, SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi, type ApiState } from "@/components/use-api";

export function ProgramOverview({ programId }: { programId: string }) {
  const program = useApi<ProgramResponse>(apiKeys.program(programId));
  const shows = useApi<ShowsResponse>(apiKeys.programShows(programId));

  if (program.error) {
    return (
      <>
        <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: "Program" }]} />
        <ErrorState error={program.error} what="program" onRetry={() => program.mutate()} />
      </>
    );
  }
  const name = program.data?.program.name;
  return (
    <>
      <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: name ?? "Program" }]} />
      {program.data ? (
        <PageTitle
          sub={
            <span className="flex items-center gap-2">
              Your role <RoleBadge role={program.data.role} />
            </span>
          }
        >
          {name}
        </PageTitle>
      ) : (
        <div className="mb-6" role="status">
          <span className="sr-only">Loading the program…</span>
          <SkeletonBar className="h-9 w-2/3" />
        </div>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-[3fr_2fr]">
        <ShowsCard shows={shows} programId={programId} canCreate={!!program.data && can(program.data.role, "manage-show")} canRestore={!!program.data && can(program.data.role, "retire-show")} />
        <MembersCard program={program} />
      </div>
    </>
  );
}

function ShowsCard({ shows, programId, canCreate, canRestore }: { shows: ApiState<ShowsResponse>; programId: string; canCreate: boolean; canRestore: boolean }) {
  if (shows.error) return <ErrorState error={shows.error} what="program" onRetry={() => shows.mutate()} />;
  if (!shows.data) return <SkeletonCard rows={2} label="Loading shows…" />;
  const current = shows.data.shows.filter((s) => !s.archivedAt);
  const archived = shows.data.shows.filter((s) => s.archivedAt);
  return (
    <Card title="Shows" titleId="shows-title">
      {current.length === 0 ? (
        <EmptyState title="No shows yet">
          {canCreate ? "Start one below, or restore a backup. Then add the roster, place the sets, write the music and set the listening points." : "A show appears here once a director or designer creates it."}
        </EmptyState>
      ) : (
        <ul className="space-y-3">
          {current.map((s) => (
            <li key={s.id}>
              <Link
                href={`/shows/${s.id}`}
                className="flex min-h-14 items-center justify-between gap-3 rounded-lg border border-ink/15 bg-paper px-4 py-3 text-lg font-semibold text-ink hover:border-turf hover:bg-turf-light/40"
              >
                {s.name}
                <span aria-hidden="true" className="text-turf-dark">
                  →
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {archived.length ? (
        <details className="mt-4">
          <summary className="cursor-pointer font-semibold">Archived ({archived.length})</summary>
          <ul className="mt-2 space-y-1">
            {archived.map((s) => (
              <li key={s.id}>
                <Link href={`/shows/${s.id}`} className="font-semibold text-turf-dark underline underline-offset-4">
                  {s.name}
                </Link>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      {canRestore && shows.data.deletedShows?.length ? <DeletedShows shows={shows.data.deletedShows} onRestored={() => void shows.mutate()} /> : null}
      {canCreate ? <NewShowForm programId={programId} onCreated={() => void shows.mutate()} /> : null}
      {canCreate ? <RestoreBackup programId={programId} onRestored={() => void shows.mutate()} /> : null}
    </Card>
  );
}

function MembersCard({ program }: { program: ApiState<ProgramResponse> }) {
  if (!program.data) return <SkeletonCard rows={3} label="Loading members…" />;
  const { members } = program.data;
  return (
    <Card
      title={`Members (${members.length})`}
      titleId="members-title"
      action={
        <Link href={`/programs/${program.data.program.id}/members`} className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">
          {program.data.role === "director" ? "Invite and manage" : "All members"}
        </Link>
      }
    >
      <ul className="divide-y divide-ink/10">
        {members.map((m) => (
          <li key={m.userId} className="flex min-h-14 flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <span className="block font-semibold text-ink">{m.name}</span>
              <span className="block break-all text-sm text-ink-soft">{m.email}</span>
            </span>
            <RoleBadge role={m.role} />
          </li>
        ))}
      </ul>
      <p className="mt-3 text-sm text-ink-soft">
        {ROLE_WORDS.director}s manage members; {ROLE_WORDS.designer.toLowerCase()}s build the drill; {ROLE_WORDS.staff.toLowerCase()} read every screen and change no drill.
      </p>
    </Card>
  );
}
