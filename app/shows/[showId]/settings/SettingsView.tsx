"use client";
// The show's settings: name, field rules and weather; ground; movements; listening points with their
// backgrounds; the show as a whole. Directors and designers edit; staff read.
import type { ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { PageTitle } from "@/components/PageTitle";
import { ShowNav } from "@/components/ShowNav";
import { SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";
import { can } from "@/lib/auth/permissions";
import { DetailsForm } from "./DetailsForm";
import { GroundForm } from "./GroundForm";
import { MovementsForm } from "./MovementsForm";
import { PointsEditor } from "./PointsEditor";
import { ShowActions } from "./ShowActions";

export function SettingsView({ showId }: { showId: string }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const crumbs = [{ label: "Programs", href: "/programs" }, { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` }, { label: "Settings" }];
  if (show.error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={show.error} what="show" onRetry={() => show.mutate()} />
      </>
    );
  }
  if (!show.data) return <SkeletonCard rows={6} label="Loading the settings…" />;
  const data = show.data;
  const editable = can(data.role, "manage-show");
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub={editable ? "Changes apply to every analysis of the show." : "Read only: a director or designer changes these."}>Settings</PageTitle>
      <div className="space-y-6">
        <Card title="Name, field and weather" titleId="details-title">
          <DetailsForm data={data} editable={editable} />
        </Card>
        <Card title="Ground" titleId="ground-title">
          <GroundForm data={data} editable={editable} />
        </Card>
        <Card title="Listening points" titleId="points-title">
          <PointsEditor data={data} editable={editable} />
        </Card>
        <Card title="Movements" titleId="movements-title">
          <MovementsForm data={data} editable={editable} />
        </Card>
        <Card title="The show" titleId="show-title">
          <ShowActions data={data} />
        </Card>
      </div>
    </>
  );
}
