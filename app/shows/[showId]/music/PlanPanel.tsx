"use client";
// The balance plan of a phrase at a listening point: what each section should play, what it changes at the box, and adoption (directors).
import { useState } from "react";
import { useSWRConfig } from "swr";
import type { ListeningPoint } from "@/components/api-types";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { sendJson } from "@/components/fetcher";
import { useApi } from "@/components/use-api";
import { checksLeftByPlan } from "@/lib/music/plan-scope";
import { LimitsForm } from "./LimitsForm";
import type { MusicPhrase, PhrasePlanResponse } from "./music-types";
import { CHECK_LABELS, formatDb, formatSone } from "./voices";

export function PlanPanel({ showId, phrase, canAdopt, listeningPoints }: { showId: string; phrase: MusicPhrase; canAdopt: boolean; listeningPoints: ListeningPoint[] }) {
  const [pointId, setPointId] = useState(listeningPoints[0]?.id ?? "");
  const [status, setStatus] = useState("");
  const { mutate } = useSWRConfig();
  const base = `/api/shows/${encodeURIComponent(showId)}`;
  const key = pointId ? `${base}/phrases/${phrase.id}/plan?listeningPointId=${pointId}` : null;
  const plan = useApi<PhrasePlanResponse>(key);

  async function run(method: "POST" | "DELETE") {
    if (!plan.data) return;
    setStatus(method === "POST" ? "Adopting…" : "Going back to the written dynamics…");
    try {
      const body = method === "POST" ? { listeningPointId: pointId, entries: plan.data.entries.map((e) => ({ section: e.section, playedDynamic: e.playedDynamic })) } : undefined;
      await sendJson(`${base}/phrases/${phrase.id}/plan`, method, body);
      // The plan's own "as played now" lines read the adopted dynamics: reload it with the rest.
      await Promise.all([mutate(`${base}/music`), mutate((k) => typeof k === "string" && (k.includes("/timeline") || k.includes("/analysis") || k.includes("/plan")))]);
      setStatus(method === "POST" ? "Plan adopted: every analysis now uses these played dynamics. The written ones are kept." : "Back to the written dynamics.");
    } catch (e) {
      setStatus(e instanceof Error ? e.message : "That did not work.");
    }
  }

  return (
    <Card
      title="Balance plan"
      titleId="plan-title"
      action={
        <label className="flex items-center gap-2 text-sm">
          At
          <select className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2" value={pointId} onChange={(e) => setPointId(e.target.value)}>
            {listeningPoints.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
          </select>
        </label>
      }
    >
      <p className="mb-3 text-sm text-ink-soft">
        Suggested played dynamics that best meet the balance targets at this listening point over the whole phrase, within the musical limits below and as close to what is written as they can. Predictions are estimates, not measurements.
      </p>
      {plan.data?.nothingToChange ? <p className="mb-3 font-semibold text-signal-ok">Every balance check passes as written: nothing to change.</p> : null}
      {plan.error ? <p role="alert" className="text-signal-bad">{plan.error.message}</p> : null}
      {!plan.data ? <p>Working out the plan…</p> : (
        <>
          <div className="overflow-x-auto">
            <table className="w-full border-collapse text-left">
              <thead>
                <tr className="border-b border-ink/15 text-sm text-ink-soft">
                  <th scope="col" className="py-2 pr-3">Section</th>
                  <th scope="col" className="py-2 pr-3">Voice</th>
                  <th scope="col" className="py-2 pr-3">Written</th>
                  <th scope="col" className="py-2 pr-3">Play</th>
                  <th scope="col" className="py-2 pr-3">Change at the box</th>
                  <th scope="col" className="py-2 pr-3">Why</th>
                </tr>
              </thead>
              <tbody>
                {plan.data.entries.map((e) => (
                  <tr key={e.section} className="border-b border-ink/5 align-top">
                    <th scope="row" className="py-1 pr-3 font-medium">{e.who}</th>
                    <td className="py-1 pr-3">{e.voice}</td>
                    <td className="py-1 pr-3">{e.writtenDynamic}</td>
                    <td className={`py-1 pr-3 font-semibold ${e.playedDynamic !== e.writtenDynamic ? "text-turf-dark" : ""}`}>{e.playedDynamic}</td>
                    <td className="py-1 pr-3 tabular-nums">{formatDb(e.changeDb, true)} dB</td>
                    <td className={`py-1 pr-3 text-sm ${e.atLimit ? "text-signal-warn" : ""}`}>{e.why || "As written."}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {plan.data.unmet.length ? (
            <div className="mt-3 rounded-lg border border-signal-warn/40 bg-paper-sunk p-3 text-sm">
              <p className="font-semibold">Targets the plan cannot fully meet</p>
              <ul className="list-disc pl-5">{plan.data.unmet.map((u) => <li key={u.detail}>{u.detail}</li>)}</ul>
            </div>
          ) : null}
          <LeftByPlan sets={plan.data.sets} />
          <h3 className="mt-4 font-semibold">Melody forward, set by set</h3>
          <ul className="mt-1 space-y-1">
            {plan.data.sets.map((s) => {
              const b = s.before.checks.find((c) => c.id === "melody-forward")!;
              const a = s.after.checks.find((c) => c.id === "melody-forward")!;
              return (
                <li key={s.setId} className="text-sm">
                  <span className="font-semibold">Set {s.number}:</span> as played now{" "}
                  <Verdict check={b} /> melody <MelodyLoudness mix={s.before} /> → with the plan <Verdict check={a} /> melody <MelodyLoudness mix={s.after} />
                </li>
              );
            })}
          </ul>
          <LimitsForm showId={showId} phraseId={phrase.id} canEdit={canAdopt} inForce={plan.data.limits} />
          {canAdopt ? (
            <div className="mt-4 flex flex-wrap gap-3">
              <Button onClick={() => run("POST")}>Adopt this plan</Button>
              <Button variant="secondary" onClick={() => run("DELETE")}>Back to written dynamics</Button>
            </div>
          ) : (
            <p className="mt-4 text-sm text-ink-soft">Only the director can adopt a plan.</p>
          )}
          <p aria-live="polite" className="mt-2 min-h-6 text-sm">{status}</p>
        </>
      )}
    </Card>
  );
}

/** Checks that still fail with the plan and that no section's dynamic aims at: where to look instead. */
function LeftByPlan({ sets }: { sets: PhrasePlanResponse["sets"] }) {
  const left = checksLeftByPlan(sets);
  if (!left.length) return null;
  return (
    <div className="mt-3 rounded-lg border border-ink/15 bg-paper-sunk p-3 text-sm" data-testid="left-by-plan">
      <p className="font-semibold">Still failing with the plan, and not a matter of section dynamics</p>
      <ul className="list-disc pl-5">
        {left.map((l) => (
          <li key={l.id}>
            {l.label} ({l.sets.length === 1 ? "set" : "sets"} {l.sets.join(", ")}): {l.where}.
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The melody's loudness in a set (sones and phons, ISO 532-1), and whether it is heard at all. */
function MelodyLoudness({ mix }: { mix: { loudness?: { voices: Record<string, { sone: number; phon: number; heard: boolean }> } | null } }) {
  const m = mix.loudness?.voices.melody;
  if (!m) return <span className="text-ink-soft">not playing</span>;
  return (
    <span className="tabular-nums">
      {formatSone(m.sone)} sones ({m.phon.toFixed(0)} phon){m.heard ? "" : ", masked"}
    </span>
  );
}

function Verdict({ check }: { check: { passed: boolean; status?: string } }) {
  if (check.status === "not-applicable") return <span className="text-ink-soft">– no melody to judge</span>;
  return check.passed ? <span className="font-semibold text-signal-ok">✓ {CHECK_LABELS["melody-forward"]}</span> : <span className="font-semibold text-signal-bad">✗ not forward</span>;
}
