"use client";
// The show timeline: each voice's level at the listening point across the whole show, the balance
// checks set by set (a failing one links to its set in the editor), and one transition's sweep.
import Link from "next/link";
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import { CHECK_LABELS, VOICE_LABELS, formatDb, formatSone } from "../music/voices";
import type { Measure, TimelineResponse, TimelineSample } from "./timeline-types";
import { showKeys } from "@/components/api-keys";
import { firstListeningPointId } from "@/lib/show/first-choices";
import { SweepProgress } from "@/components/SweepProgress";
import dynamic from "next/dynamic";
import { ChartLoading } from "@/components/ChartLoading";

const VoiceChart = dynamic(() => import("./VoiceChart").then((m) => m.VoiceChart), { ssr: false, loading: () => <ChartLoading /> });

const CHECKS = Object.keys(CHECK_LABELS);

export function TimelineView({ showId }: { showId: string }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const [pointId, setPointId] = useState<string | null>(null);
  const lp = pointId ?? firstListeningPointId(show.data?.listeningPoints ?? []);
  const timeline = useApi<TimelineResponse>(lp ? showKeys.timeline(showId, lp) : null);
  const [shade, setShade] = useState<string>("melody-forward");
  const [measure, setMeasure] = useState<Measure>("dba");
  const [sweepSetId, setSweepSetId] = useState<string | null>(null);
  const [picked, setPicked] = useState<TimelineSample | null>(null);
  const crumbs = [
    { label: "Programs", href: "/programs" },
    { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` },
    { label: "Timeline" },
  ];
  const error = show.error ?? timeline.error;
  if (error) {
    return (
      <>
        <Breadcrumbs items={crumbs} />
        <ErrorState error={error} what="show" onRetry={() => (show.mutate(), timeline.mutate())} />
      </>
    );
  }
  if (!show.data || !timeline.data) return <SweepProgress showId={showId} label="Computing the show timeline…" />;
  const t = timeline.data;
  const setHref = (setId: string, count?: number) => `/shows/${showId}/sets/${setId}${count !== undefined ? `?count=${count}` : ""}`;
  const sweepSet = t.sets.find((s) => s.setId === sweepSetId) ?? t.sets.find((s) => s.counts > 0 && s.startCount < s.showCount) ?? t.sets[0]!;
  const sweepSamples = t.samples.filter((s) => s.setId === sweepSet.setId);
  const failingSets = t.sets.filter((s) => s.failing.length > 0);

  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle
        sub="Each voice's predicted level (dBA) or loudness (sones, as people hear it) at the listening point, count by count. Predictions are estimates, not measurements."
        aside={
          <label className="flex items-center gap-2">
            Listening point
            <select className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2" value={lp ?? ""} onChange={(e) => setPointId(e.target.value)}>
              {show.data.listeningPoints.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
            </select>
          </label>
        }
      >
        Show timeline
      </PageTitle>
      <NextStepNotice showId={showId} need="music" />
      <div className="space-y-6">
        <Card
          title="Voices at the listening point"
          titleId="voices-title"
          action={
            <div className="flex flex-wrap items-center gap-3">
            <label className="flex items-center gap-2 text-sm">
              Show
              <select className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2" value={measure} onChange={(e) => setMeasure(e.target.value as Measure)}>
                <option value="dba">Level (dBA)</option>
                <option value="sone">Loudness (sones)</option>
              </select>
            </label>
            <label className="flex items-center gap-2 text-sm">
              Shade where this check fails
              <select className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2" value={shade} onChange={(e) => setShade(e.target.value)}>
                {CHECKS.map((c) => <option key={c} value={c}>{CHECK_LABELS[c]}</option>)}
              </select>
            </label>
            </div>
          }
        >
          <VoiceChart samples={t.samples} sets={t.sets} failingCheck={shade} measure={measure} onPick={(s) => { setPicked(s); setSweepSetId(s.setId); }} />
          <p className="mt-2 text-sm text-ink-soft">
            {measure === "sone" ? "Loudness in sones (ISO 532-1): twice the sones sounds twice as loud. " : "A-weighted levels in dBA. "}
            Dashed lines mark the sets; shaded counts fail “{CHECK_LABELS[shade]}”. Click the chart to pick a count.
          </p>
          {picked ? (
            <p className="mt-2" aria-live="polite">
              Count {picked.count} into set {picked.setNumber}:{" "}
              {measure === "sone"
                ? `melody ${formatSone(picked.voicesSone?.melody)} sones, band ${formatSone(picked.totalSone)} sones.`
                : `melody ${formatDb(picked.voices.melody)} dBA, band ${formatDb(picked.totalDbA)} dBA.`}{" "}
              <Link className="font-semibold text-turf-dark underline" href={setHref(picked.setId, picked.count)}>See the field at this count</Link>
            </p>
          ) : null}
        </Card>

        <Card title="Balance checks, set by set" titleId="checks-title">
          <div className="overflow-x-auto">
            <table className="border-collapse text-center text-sm">
              <thead>
                <tr>
                  <th scope="col" className="sticky left-0 bg-paper-raised px-2 py-1 text-left">Check</th>
                  {t.sets.map((s) => <th key={s.setId} scope="col" className="px-1 py-1 font-semibold">{s.number}</th>)}
                </tr>
              </thead>
              <tbody>
                {CHECKS.map((c) => (
                  <tr key={c}>
                    <th scope="row" className="sticky left-0 bg-paper-raised px-2 py-1 text-left font-medium whitespace-nowrap">{CHECK_LABELS[c]}</th>
                    {t.sets.map((s) => {
                      const fails = s.failing.includes(c);
                      const idle = !fails && (s.notApplicable ?? []).includes(c);
                      return (
                        <td key={s.setId} className="p-0.5">
                          <Link
                            href={setHref(s.setId)}
                            aria-label={`Set ${s.number}: ${CHECK_LABELS[c]} ${fails ? "fails" : idle ? "not applicable (nothing to judge)" : "passes"}`}
                            className={`flex h-9 w-9 items-center justify-center rounded font-bold ${fails ? "bg-signal-bad text-white" : idle ? "bg-paper-sunk text-ink-faint" : "bg-turf-light text-signal-ok"}`}
                          >
                            {fails ? "✗" : idle ? "–" : "✓"}
                          </Link>
                        </td>
                      );
                    })}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <h3 className="mt-4 font-semibold">Where the balance breaks</h3>
          {failingSets.length === 0 ? (
            t.sets.every((s) => (s.notApplicable ?? []).length === CHECKS.length) ? (
              <p className="text-ink-soft">Nothing to judge yet: no set has players sounding at this listening point.</p>
            ) : (
              <p className="text-signal-ok">No check fails at any set{t.sets.some((s) => (s.notApplicable ?? []).length) ? " (a dash: nothing to judge there)" : ""}.</p>
            )
          ) : (
            <ul className="mt-1 space-y-1" aria-label="Failing checks by set">
              {failingSets.map((s) => (
                <li key={s.setId}>
                  <Link className="font-semibold text-turf-dark underline" href={setHref(s.setId)}>
                    Set {s.number}: {s.failing.map((c) => CHECK_LABELS[c]).join(", ")}
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>

        <Card
          title={`Transition sweep into set ${sweepSet.number}`}
          titleId="sweep-title"
          action={
            <label className="flex items-center gap-2 text-sm">
              Into set
              <select className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2" value={sweepSet.setId} onChange={(e) => setSweepSetId(e.target.value)}>
                {t.sets.map((s) => <option key={s.setId} value={s.setId}>{s.number}</option>)}
              </select>
            </label>
          }
        >
          <VoiceChart samples={sweepSamples.map((s) => ({ ...s, showCount: s.count }))} sets={[]} failingCheck={shade} measure={measure} height={260} onPick={(s) => setPicked(s)} />
          <div className="mt-2 flex flex-wrap gap-1" aria-label="Counts of the transition">
            {sweepSamples.map((s) => (
              <Link
                key={s.count}
                href={setHref(s.setId, s.count)}
                title={s.failing.length ? s.failing.map((c) => CHECK_LABELS[c]).join(", ") : "All checks pass"}
                className={`flex h-9 min-w-9 items-center justify-center rounded px-1 text-sm ${s.failing.includes(shade) ? "bg-signal-bad text-white" : "bg-paper-sunk"}`}
              >
                {s.count}
              </Link>
            ))}
          </div>
          <p className="mt-2 text-sm text-ink-soft">Counts in red fail “{CHECK_LABELS[shade]}”; each opens the field at that count. {VOICE_LABELS.melody} in the thick line.</p>
        </Card>
      </div>
    </>
  );
}
