"use client";
// The show's balance thresholds: directors change them (every stored analysis follows), others read them.
import { useState } from "react";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { TextField } from "@/components/TextField";
import { apiKeys, useApi } from "@/components/use-api";
import type { ShowResponse } from "@/components/api-types";
import { ShowNav } from "@/components/ShowNav";
import Link from "next/link";
import { perUnit, TARGET_FIELDS, type TargetKey } from "./target-fields";
import { showKeys } from "@/components/api-keys";

type TargetsResponse = {
  targets: Record<TargetKey, number> & { pyramidVoices: string[] };
  custom: Record<string, unknown> | null;
  defaults: Record<TargetKey, number>;
  ranges: Record<TargetKey, [number, number]>;
  canEdit: boolean;
};

export function TargetsForm({ showId }: { showId: string }) {
  const key = showKeys.targets(showId);
  const targets = useApi<TargetsResponse>(key);
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const [draft, setDraft] = useState<Partial<Record<TargetKey, string>>>({});
  const [status, setStatus] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [issues, setIssues] = useState<Record<string, string[]>>({});
  const [pending, setPending] = useState(false);

  const crumbs = [
    { label: "Programs", href: "/programs" },
    { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Balance targets" },
  ];
  if (targets.error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={targets.error} what="balance targets" onRetry={() => targets.mutate()} />
      </>
    );
  }
  if (!targets.data) return <SkeletonCard rows={6} label="Loading the balance targets…" />;
  const { canEdit, defaults } = targets.data;
  // Shown in the form's unit (yards for a width), rounded to hundredths.
  const shown = (k: TargetKey, stored: number) => Math.round((stored / perUnit(k)) * 100) / 100;
  const value = (k: TargetKey) => draft[k] ?? String(shown(k, targets.data!.targets[k]));

  async function save(body: unknown, done: string) {
    setPending(true);
    setStatus(null);
    setIssues({});
    try {
      await sendJson(key, "PUT", body);
      await targets.mutate();
      setDraft({});
      setStatus({ tone: "info", text: done });
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, "Could not save.");
      setIssues(Object.fromEntries(Object.entries(e.issues).map(([k, v]) => [k.replace(/^targets\./, ""), v])));
      setStatus({ tone: "bad", text: e.message });
    } finally {
      setPending(false);
    }
  }

  function submit(event: React.FormEvent) {
    event.preventDefault();
    // Only the fields the director changed are stored over what was kept; the rest stay at their (unrounded) values.
    const out: Record<string, unknown> = { ...(targets.data!.custom ?? {}) };
    for (const [key, text] of Object.entries(draft)) out[key] = Number(text) * perUnit(key as TargetKey);
    void save({ targets: out }, "Saved. Every set's checks now use these thresholds.");
  }

  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub="The thresholds the balance checks and the balance plan use for this show.">Balance targets</PageTitle>
      <p className="mb-4 text-sm text-ink-soft">
        Where each default comes from: <Link className="text-turf-dark underline" href="/sources#thresholds">Where the numbers come from</Link>.
      </p>
      <Card title="Thresholds" titleId="targets-title">
        <form onSubmit={submit} noValidate className="space-y-5" aria-describedby="targets-status">
          {TARGET_FIELDS.map((f) => (
            <TextField
              key={f.key}
              id={`target-${f.key}`}
              label={`${f.label} (${f.unit})`}
              hint={`Default ${shown(f.key, defaults[f.key])} ${f.unit}.`}
              type="number"
              inputMode="decimal"
              step={f.step}
              min={shown(f.key, targets.data!.ranges[f.key][0])}
              max={shown(f.key, targets.data!.ranges[f.key][1])}
              value={value(f.key)}
              readOnly={!canEdit}
              errors={issues[f.key]}
              onChange={(e) => setDraft((d) => ({ ...d, [f.key]: e.target.value }))}
            />
          ))}
          <div aria-live="polite" id="targets-status">
            {status ? <FormMessage id="targets-message" tone={status.tone}>{status.text}</FormMessage> : null}
          </div>
          {canEdit ? (
            <div className="flex flex-wrap gap-3">
              <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save thresholds"}</Button>
              <Button variant="secondary" disabled={pending} onClick={() => void save({ reset: true }, "Back to the documented defaults.")}>
                Use the defaults
              </Button>
            </div>
          ) : (
            <p className="text-ink-soft">Only a director of the program changes these.</p>
          )}
        </form>
      </Card>
    </>
  );
}
