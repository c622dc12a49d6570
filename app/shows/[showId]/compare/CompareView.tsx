"use client";
// Set compare: two sets' fields and box mixes side by side, what changed per voice and section, and who changed most.
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { apiKeys, useApi } from "@/components/use-api";
import { ShowNav } from "@/components/ShowNav";
import { CHECK_LABELS, VOICE_LABELS, VOICE_ORDER, formatDb, formatSone } from "../music/voices";
import { LoudnessBars, type LoudnessRow } from "./LoudnessBars";
import { MiniField } from "@/components/MiniField";
import { SpreadLegend } from "@/components/field/Legend";
import { instrumentSpreadDeg } from "@/lib/field/marks";
import { showKeys } from "@/components/api-keys";
import { comparedSets, firstListeningPointId } from "@/lib/show/first-choices";

type Loud = { sone: number; phon: number; shareSone: number; heard: boolean };
type Side = {
  set: { id: string; number: string };
  mix: { totalDbA: number | null };
  loudness?: { totalSone: number; voices: Record<string, Loud>; sections?: Record<string, Loud> };
  checks: { id: string; passed: boolean; status?: string }[];
};
type CompareResponse = {
  a: Side;
  b: Side;
  changes: {
    totalChangeDb: number | null;
    setChangeDb: number;
    voices: { voice: string; aDbA: number | null; bDbA: number | null; changeDb: number | null; flagged: boolean }[];
    sections: { section: string; aDbA: number | null; bDbA: number | null; changeDb: number | null }[];
    performers: { performerId: string; label: string; section: string; aDbA: number | null; bDbA: number | null; changeDb: number | null }[];
  };
};
type SetResponse = { positions: { performerId: string; x: number; y: number; facingDeg: number }[] };
const sel = "min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2";

export function CompareView({ showId, initialA, initialB }: { showId: string; initialA: string | null; initialB: string | null }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const sets = show.data?.sets ?? [];
  const [a, setA] = useState<string | null>(initialA);
  const [b, setB] = useState<string | null>(initialB);
  const [point, setPoint] = useState<string | null>(null);
  const { aId, bId } = comparedSets(sets, a, b);
  const lp = point ?? firstListeningPointId(show.data?.listeningPoints ?? []);
  const cmp = useApi<CompareResponse>(aId && bId && lp ? showKeys.compare(showId, aId, bId, lp) : null);
  const fieldA = useApi<SetResponse>(aId ? showKeys.set(showId, aId) : null);
  const fieldB = useApi<SetResponse>(bId ? showKeys.set(showId, bId) : null);
  const crumbs = [{ label: "Programs", href: "/programs" }, { label: show.data?.show.name ?? "Show", href: `/shows/${showId}` }, { label: "Set compare" }];
  const error = show.error ?? cmp.error;
  if (error) return (<><Breadcrumbs items={crumbs} /><ErrorState error={error} what="set" onRetry={() => cmp.mutate()} /></>);
  if (!show.data) return <SkeletonCard rows={6} label="Loading the show…" />;
  const c = cmp.data;
  const changed = new Set((c?.changes.performers ?? []).slice(0, 5).map((p) => p.performerId));
  const instrumentOf = new Map(show.data.performers.map((p) => [p.id, p.instrument]));
  const marks = (positions: SetResponse["positions"]) => positions.map((p) => ({ ...p, spreadDeg: instrumentSpreadDeg(instrumentOf.get(p.performerId) ?? "") }));
  // Loudness rows of the two sets: every voice or section sounding in either.
  const rowsOf = (pick: (s: Side) => Record<string, Loud> | undefined, names: string[], label: (k: string) => string): LoudnessRow[] =>
    !c ? [] : names.filter((k) => pick(c.a)?.[k] || pick(c.b)?.[k]).map((k) => ({ key: k, name: label(k), a: pick(c.a)?.[k]?.sone ?? null, b: pick(c.b)?.[k]?.sone ?? null, heardA: pick(c.a)?.[k]?.heard ?? null, heardB: pick(c.b)?.[k]?.heard ?? null }));
  const voiceRows = rowsOf((s) => s.loudness?.voices, [...VOICE_ORDER], (v) => VOICE_LABELS[v] ?? v);
  const sectionRows = rowsOf((s) => s.loudness?.sections, c ? [...new Set([...Object.keys(c.a.loudness?.sections ?? {}), ...Object.keys(c.b.loudness?.sections ?? {})])] : [], (s) => s);
  return (
    <>
      <Breadcrumbs items={crumbs} />
      <ShowNav showId={showId} />
      <PageTitle sub="Two sets' predicted box mixes side by side. Predictions are estimates, not measurements.">Set compare</PageTitle>
      <NextStepNotice showId={showId} need="drill" />
      <div className="mb-6 flex flex-wrap items-end gap-4">
        <label className="flex flex-col text-sm">From set<select className={sel} value={aId ?? ""} onChange={(e) => { setA(e.target.value); setB(null); }}>{sets.map((s) => <option key={s.id} value={s.id}>{s.number}</option>)}</select></label>
        <label className="flex flex-col text-sm">To set<select className={sel} value={bId ?? ""} onChange={(e) => setB(e.target.value)}>{sets.map((s) => <option key={s.id} value={s.id}>{s.number}</option>)}</select></label>
        <label className="flex flex-col text-sm">Listening point<select className={sel} value={lp ?? ""} onChange={(e) => setPoint(e.target.value)}>{show.data.listeningPoints.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}</select></label>
      </div>
      {!c ? <SkeletonCard rows={6} label="Comparing…" /> : (
        <div className="space-y-6">
          <SpreadLegend />
          <div className="grid gap-6 md:grid-cols-2">
            {([c.a, c.b] as Side[]).map((side, i) => (
              <Card key={side.set.id} title={`Set ${side.set.number}: ${formatDb(side.mix.totalDbA)} dBA, ${formatSone(side.loudness?.totalSone)} sones`} titleId={`side-${i}`}>
                <MiniField dots={marks((i === 0 ? fieldA : fieldB).data?.positions ?? [])} highlight={changed} title={`Field at set ${side.set.number}; the players whose contribution changed most are larger and orange`} />
                <ul className="mt-3 flex flex-wrap gap-2 text-sm">
                  {side.checks.map((k) => k.status === "not-applicable" ? (
                    <li key={k.id} className="rounded bg-paper-sunk px-2 py-1 text-ink-soft">– {CHECK_LABELS[k.id]}: not applicable</li>
                  ) : (
                    <li key={k.id} className={`rounded px-2 py-1 ${k.passed ? "bg-turf-light text-signal-ok" : "bg-signal-bad text-white"}`}>{k.passed ? "✓" : "✗"} {CHECK_LABELS[k.id]}</li>
                  ))}
                </ul>
              </Card>
            ))}
          </div>
          <div className="grid items-start gap-6 lg:grid-cols-2">
            <Card title="Loudness per voice (sones)" titleId="voice-loudness-title">
              <LoudnessBars rows={voiceRows} setA={c.a.set.number} setB={c.b.set.number} caption="Loudness of each voice at the listening point, in sones" />
            </Card>
            <Card title="Loudness per section (sones)" titleId="section-loudness-title">
              <LoudnessBars rows={sectionRows} setA={c.a.set.number} setB={c.b.set.number} caption="Loudness of each section at the listening point, in sones" />
            </Card>
          </div>
          <p className="text-sm text-ink-soft">Loudness as people hear it (ISO 532-1): twice the sones sounds twice as loud. A voice or section marked “masked” is covered by the rest of the band and the background.</p>
          <Card title="Voices" titleId="voices-title">
            <table className="w-full text-left">
              <thead><tr className="border-b border-ink/15 text-sm text-ink-soft"><th className="py-2 pr-3">Voice</th><th className="py-2 pr-3">Set {c.a.set.number}</th><th className="py-2 pr-3">Set {c.b.set.number}</th><th className="py-2 pr-3">Change</th><th className="py-2">Flag</th></tr></thead>
              <tbody>
                {c.changes.voices.map((v) => (
                  <tr key={v.voice} className="border-b border-ink/5">
                    <th scope="row" className="py-1 pr-3 font-medium">{VOICE_LABELS[v.voice]}</th>
                    <td className="py-1 pr-3 tabular-nums">{formatDb(v.aDbA)} dBA</td>
                    <td className="py-1 pr-3 tabular-nums">{formatDb(v.bDbA)} dBA</td>
                    <td className="py-1 pr-3 tabular-nums">{v.changeDb === null ? (v.aDbA === null ? "enters" : "leaves") : `${formatDb(v.changeDb, true)} dB`}</td>
                    <td className="py-1">{v.flagged ? <span className="font-semibold text-signal-warn">Moves more than {c.changes.setChangeDb} dB</span> : "steady"}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </Card>
          <div className="grid items-start gap-6 md:grid-cols-2">
            <Card title="Sections" titleId="sections-title">
              <ul className="space-y-1 text-sm">{c.changes.sections.map((s) => <li key={s.section} className="flex justify-between gap-3"><span>{s.section}</span><span className="tabular-nums">{formatDb(s.changeDb, true)} dB</span></li>)}</ul>
            </Card>
            <Card title="Players whose contribution changed most" titleId="players-title">
              <ul className="space-y-1 text-sm">{c.changes.performers.map((p) => <li key={p.performerId} className="flex justify-between gap-3"><span><span className="font-semibold">{p.label}</span> {p.section}</span><span className="tabular-nums">{formatDb(p.aDbA)} → {formatDb(p.bDbA)} dBA ({formatDb(p.changeDb, true)} dB)</span></li>)}</ul>
            </Card>
          </div>
        </div>
      )}
    </>
  );
}
