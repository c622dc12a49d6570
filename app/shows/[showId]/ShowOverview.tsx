"use client";
// A show at a glance: its sets, roster, listening points and conditions, read from GET /api/shows/{id}.
import type { ProgramResponse, ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { plural } from "@/components/format";
import { PageTitle } from "@/components/PageTitle";
import { RoleBadge } from "@/components/RoleBadge";
import { ShowNav } from "@/components/ShowNav";
import { SkeletonBar, SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";
import { can } from "@/lib/auth/permissions";
import { ConditionsList } from "./ConditionsList";
import { ListeningPoints } from "./ListeningPoints";
import { RosterTable } from "./RosterTable";
import { SetsStrip } from "./SetsStrip";

export function ShowOverview({ showId }: { showId: string }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const programId = show.data?.show.programId ?? null;
  const program = useApi<ProgramResponse>(programId ? apiKeys.program(programId) : null);

  const crumbs = [
    { label: "Programs", href: "/programs" },
    ...(programId ? [{ label: program.data?.program.name ?? "Program", href: `/programs/${programId}` }] : []),
    { label: show.data?.show.name ?? "Show" },
  ];

  if (show.error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={show.error} what="show" onRetry={() => show.mutate()} />
      </>
    );
  }
  if (!show.data) return <ShowSkeleton />;

  const { show: s, role, performers, sets, listeningPoints } = show.data;
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={s.id} />
      <PageTitle
        sub={`${plural(performers.length, "performer")} · ${plural(sets.length, "set")} · ${plural(listeningPoints.length, "listening point")}`}
        aside={
          <span className="flex items-center gap-2 text-ink-soft">
            Your role <RoleBadge role={role} />
            {!can(role, "edit-drill") ? <span className="text-sm">(read only)</span> : null}
          </span>
        }
      >
        {s.name}
      </PageTitle>
      <div className="space-y-6">
        <Card title="Sets" titleId="sets-title">
          <SetsStrip showId={s.id} sets={sets} movements={show.data.movements} />
        </Card>
        <div className="grid items-start gap-6 md:grid-cols-2">
          <Card title="Listening points" titleId="points-title">
            <ListeningPoints points={listeningPoints} rules={s.fieldRules} />
          </Card>
          <Card title="Conditions" titleId="conditions-title">
            <ConditionsList conditions={s.conditions} fieldRules={s.fieldRules} />
          </Card>
        </div>
        <Card title={`Roster (${performers.length})`} titleId="roster-title">
          <RosterTable showId={s.id} performers={performers} editable={can(role, "edit-drill")} />
        </Card>
      </div>
    </>
  );
}

function ShowSkeleton() {
  return (
    <div className="space-y-6">
      <div role="status">
        <span className="sr-only">Loading the show…</span>
        <SkeletonBar className="mb-4 h-6 w-1/3" />
        <SkeletonBar className="h-9 w-2/3" />
      </div>
      <SkeletonCard rows={1} label="Loading sets…" />
      <div className="grid items-start gap-6 md:grid-cols-2">
        <SkeletonCard rows={2} label="Loading listening points…" />
        <SkeletonCard rows={4} label="Loading conditions…" />
      </div>
      <SkeletonCard rows={6} label="Loading the roster…" />
    </div>
  );
}
