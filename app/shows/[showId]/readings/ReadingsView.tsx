"use client";
// Box readings of a show: record one (form or CSV), see predicted against measured before and
// after the fit, and (directors) adopt the fit into the program's catalog or restore a version.
import type { ProgramResponse, ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { SkeletonCard } from "@/components/Skeleton";
import { PageTitle } from "@/components/PageTitle";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import { can } from "@/lib/auth/permissions";
import { CatalogHistory } from "./CatalogHistory";
import { CsvUpload } from "./CsvUpload";
import { FitPanel } from "./FitPanel";
import { ReadingForm } from "./ReadingForm";
import { readingKeys, type CatalogResponse, type FitResponse, type ReadingsResponse } from "./readings-types";

export function ReadingsView({ showId }: { showId: string }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const programId = show.data?.show.programId ?? null;
  const program = useApi<ProgramResponse>(programId ? apiKeys.program(programId) : null);
  const readings = useApi<ReadingsResponse>(show.data ? readingKeys.readings(showId) : null);
  const fit = useApi<FitResponse>(programId ? readingKeys.fit(programId, showId) : null);
  const catalog = useApi<CatalogResponse>(programId ? readingKeys.catalog(programId) : null);

  const crumbs = [
    { label: "Programs", href: "/programs" },
    ...(programId ? [{ label: program.data?.program.name ?? "Program", href: `/programs/${programId}` }] : []),
    { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Box readings" },
  ];
  const error = show.error ?? readings.error;
  if (error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={error} what="show" onRetry={() => (show.error ? show.mutate() : readings.mutate())} />
      </>
    );
  }
  if (!show.data || !readings.data) {
    return (
      <div className="space-y-6" role="status">
        <span className="sr-only">Loading the readings…</span>
        <SkeletonCard />
        <SkeletonCard />
      </div>
    );
  }
  const role = show.data.role;
  const refresh = () => Promise.all([readings.mutate(), fit.mutate(), catalog.mutate()]);

  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub="Sound level meter readings at a listening point, with a section (or a few) playing at a known dynamic. Farfield fits each instrument's outdoor carry to them.">
        Box readings
      </PageTitle>
      <div className="space-y-6">
        <Card title="Predicted against measured" titleId="fit-title">
          <FitPanel
            showId={showId}
            programId={programId!}
            readings={readings.data.readings}
            fit={fit}
            canAdopt={can(role, "adopt-plan")}
            onChanged={refresh}
          />
        </Card>
        {can(role, "comment") ? (
          <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
            <Card title="Record a reading" titleId="record-title">
              <ReadingForm show={show.data} onSaved={refresh} />
            </Card>
            <Card title="Upload readings (CSV)" titleId="upload-title">
              <CsvUpload showId={showId} onStored={refresh} />
            </Card>
          </div>
        ) : null}
        <Card title="Catalog history" titleId="history-title">
          <CatalogHistory programId={programId!} catalog={catalog} canRestore={can(role, "adopt-plan")} onChanged={refresh} />
        </Card>
      </div>
    </>
  );
}
