"use client";
// The stadium rehearsal plan: choose phrases or sets and the minutes of stadium time, read them worst
// balance first with each item's minutes, the build-up, failing checks, dynamics to play and where to
// listen from; print it, e-mail it to staff, or keep it (kept plans are listed and reopened, and staff
// mark items done on a phone at the rehearsal).
import Link from "next/link";
import { useEffect, useState } from "react";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { errorText } from "@/components/error-text";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { NextStepNotice } from "@/components/NextStepNotice";
import { PageTitle } from "@/components/PageTitle";
import { ROLE_WORDS } from "@/components/RoleBadge";
import { useApi } from "@/components/use-api";
import { PlanProgress } from "./PlanProgress";
import { ShowNav } from "@/components/ShowNav";
import type { Role } from "@/lib/auth/permissions";
import { CHECK_LABELS } from "@/lib/music/check-labels";
import type { RehearsalItem } from "@/lib/rehearsal/plan";
import { setListWords } from "@/lib/show/set-words";
import { BuildUpList } from "./BuildUpList";
import { showKeys } from "@/components/api-keys";

type Options = {
  show: { id: string; name: string };
  phrases: { id: string; name: string; firstSet: string; lastSet: string }[];
  sets: { id: string; number: string; counts: number }[];
  listeningPoints: { id: string; name: string }[];
  canSend: boolean;
  members: { userId: string; name: string; email: string; role: Role }[];
};
type Plan = { programName: string; budgetMinutes: number; listenFrom: { name: string; words: string }; items: (RehearsalItem & { key: string; minutes: number })[] };
type KeptList = { plans: { id: string; name: string; budgetMinutes: number; createdAt: string; createdBy: string | null; items: number; done: number }[] };

const SOURCE_WORDS = { adopted: "adopted plan", proposed: "proposed", written: "as written" } as const;

export function RehearsalView({ showId, initial }: { showId: string; initial: { phraseIds: string[]; setIds: string[]; pointId: string | null } }) {
  const options = useApi<Options>(showKeys.rehearsalPlan(showId));
  const [phraseIds, setPhraseIds] = useState<string[]>(initial.phraseIds);
  const [setIds, setSetIds] = useState<string[]>(initial.setIds);
  const [pointId, setPointId] = useState<string | null>(initial.pointId);
  const [plan, setPlan] = useState<Plan | null>(null);
  const [status, setStatus] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [building, setBuilding] = useState(false);
  const [recipients, setRecipients] = useState<string[]>([]);
  const [budget, setBudget] = useState("30");
  const [planName, setPlanName] = useState("");
  const kept = useApi<KeptList>(showKeys.rehearsalPlans(showId));

  const choice = () => ({ phraseIds, setIds, listeningPointId: pointId ?? options.data?.listeningPoints[0]?.id, budgetMinutes: Number(budget) });
  async function keep() {
    setBusy(true);
    try {
      await sendJson(`/api/shows/${showId}/rehearsal-plans`, "POST", { name: planName, choice: choice() });
      await kept.mutate();
      setStatus({ tone: "info", text: `Kept as "${planName.trim()}". Staff open it under Kept plans and mark items done on their phones.` });
    } catch (err) {
      setStatus({ tone: "bad", text: errorText(err, "The plan could not be kept. Try again.") });
    } finally {
      setBusy(false);
    }
  }
  async function build() {
    setBusy(true);
    setBuilding(true);
    setStatus(null);
    try {
      setPlan(await sendJson<Plan>(`/api/shows/${showId}/rehearsal-plan`, "POST", choice()));
      setStatus(null);
    } catch (err) {
      setStatus({ tone: "bad", text: errorText(err, "The plan could not be made. Try again.") });
    } finally {
      setBusy(false);
      setBuilding(false);
    }
  }
  async function send() {
    setBusy(true);
    try {
      const res = await sendJson<{ sent: string[]; failed: string[] }>(`/api/shows/${showId}/rehearsal-plan/send`, "POST", { choice: choice(), userIds: recipients });
      setStatus(res!.failed.length ? { tone: "bad", text: `Not sent to ${res!.failed.join(", ")}; try again.` } : { tone: "info", text: `Sent to ${res!.sent.join(", ")}.` });
    } catch (err) {
      setStatus({ tone: "bad", text: err instanceof ApiError ? err.message : "Not sent." });
    } finally {
      setBusy(false);
    }
  }
  // A link from the e-mail carries the choice: build the plan at once.
  useEffect(() => {
    // Building fetches the plan (the outside system) and shows its progress at once.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    if (options.data && (initial.phraseIds.length || initial.setIds.length) && !plan) void build();
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [options.data]);

  if (options.error) return <ErrorState error={options.error} what="show" onRetry={() => options.mutate()} />;
  const o = options.data;
  const toggle = (list: string[], set: (v: string[]) => void, id: string) => set(list.includes(id) ? list.filter((x) => x !== id) : [...list, id]);
  return (
    <>
      <div className="no-print">
        <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: o?.show.name ?? "Show", href: `/shows/${showId}` }, { label: "Stadium rehearsal" }]} />
        <ShowNav showId={showId} />
        <PageTitle sub="Pick what to rehearse with the stadium time you have. The worst balance comes first.">Stadium rehearsal plan</PageTitle>
        <NextStepNotice showId={showId} need="music" />
        {!o ? (
          <p role="status">Loading the show…</p>
        ) : (
          <div className="grid items-start gap-6 lg:grid-cols-[3fr_2fr]">
            <Card title="What to rehearse" titleId="choose-title">
              <fieldset>
                <legend className="font-semibold text-ink">Phrases</legend>
                <div className="mt-2 grid gap-1 sm:grid-cols-2">
                  {o.phrases.map((p) => (
                    <label key={p.id} className="flex min-h-11 items-center gap-3">
                      <input type="checkbox" className="h-5 w-5" checked={phraseIds.includes(p.id)} onChange={() => toggle(phraseIds, setPhraseIds, p.id)} />
                      <span>
                        {p.name} <span className="text-ink-soft">(sets {p.firstSet === p.lastSet ? p.firstSet : `${p.firstSet}–${p.lastSet}`})</span>
                      </span>
                    </label>
                  ))}
                </div>
              </fieldset>
              <details className="mt-3">
                <summary className="cursor-pointer font-semibold">Single sets</summary>
                <div className="mt-2 flex flex-wrap gap-3">
                  {o.sets.map((s) => (
                    <label key={s.id} className="flex min-h-11 items-center gap-2">
                      <input type="checkbox" className="h-5 w-5" checked={setIds.includes(s.id)} onChange={() => toggle(setIds, setSetIds, s.id)} /> {s.number}
                    </label>
                  ))}
                </div>
              </details>
              <label className="mt-4 block font-semibold text-ink" htmlFor="point">
                Listen from
              </label>
              <select id="point" className="mt-1 min-h-11 rounded-lg border border-ink/30 bg-paper-raised px-2" value={pointId ?? o.listeningPoints[0]?.id} onChange={(e) => setPointId(e.target.value)}>
                {o.listeningPoints.map((l) => (
                  <option key={l.id} value={l.id}>
                    {l.name}
                  </option>
                ))}
              </select>
              <label className="mt-4 block font-semibold text-ink" htmlFor="budget">
                Stadium time (minutes)
              </label>
              <input id="budget" type="number" inputMode="numeric" min={1} max={600} step={1} className="mt-1 min-h-11 w-28 rounded-lg border border-ink/30 px-2 tabular-nums" value={budget} onChange={(e) => setBudget(e.target.value)} />
              <p className="text-sm text-ink-soft">Shared among the items by how much each needs: a minute a build-up step, more where the balance is worse.</p>
              <div className="mt-4 flex gap-3">
                <Button onClick={build} disabled={busy || phraseIds.length + setIds.length === 0}>
                  Make the plan
                </Button>
                {plan ? (
                  <Button variant="secondary" onClick={() => window.print()}>
                    Print
                  </Button>
                ) : null}
              </div>
              {building ? (
                <PlanProgress showId={showId} />
              ) : (
                <FormMessage id="plan-status" tone={status?.tone ?? "info"}>
                  {status?.text ?? ""}
                </FormMessage>
              )}
            </Card>
            {o.canSend ? (
              <Card title="Send to staff" titleId="send-title">
                <fieldset>
                  <legend className="text-ink-soft">They get the plan by e-mail with a link to this page.</legend>
                  {o.members.map((m) => (
                    <label key={m.userId} className="mt-1 flex min-h-11 items-center gap-3">
                      <input type="checkbox" className="h-5 w-5" checked={recipients.includes(m.userId)} onChange={() => toggle(recipients, setRecipients, m.userId)} />
                      <span>
                        {m.name} <span className="text-ink-soft">({ROLE_WORDS[m.role].toLowerCase()})</span>
                      </span>
                    </label>
                  ))}
                </fieldset>
                <Button className="mt-3" onClick={send} disabled={busy || !plan || recipients.length === 0}>
                  E-mail the plan
                </Button>
                <div className="mt-5 border-t border-ink/10 pt-4">
                  <label className="block font-semibold text-ink" htmlFor="plan-name">
                    Keep this plan as
                  </label>
                  <input id="plan-name" className="mt-1 min-h-11 w-full rounded-lg border border-ink/30 px-2" placeholder="Thursday at the stadium" value={planName} onChange={(e) => setPlanName(e.target.value)} />
                  <Button className="mt-2" variant="secondary" onClick={keep} disabled={busy || !plan || !planName.trim()}>
                    Keep the plan
                  </Button>
                </div>
              </Card>
            ) : null}
            <Card title="Kept plans" titleId="kept-title">
              {!kept.data ? (
                <p role="status">Loading the kept plans…</p>
              ) : kept.data.plans.length === 0 ? (
                <p className="text-ink-soft">No plan kept yet. A director keeps one after making it; staff then open it here at the rehearsal.</p>
              ) : (
                <ul className="divide-y divide-ink/10" data-testid="kept-plans">
                  {kept.data.plans.map((p) => (
                    <li key={p.id} className="py-2">
                      <Link className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline" href={`/shows/${showId}/rehearsal/plans/${p.id}`}>
                        {p.name}
                      </Link>
                      <span className="block text-sm text-ink-soft">
                        {p.budgetMinutes} minutes · {p.done} of {p.items} done{p.createdBy ? ` · kept by ${p.createdBy}` : ""}
                      </span>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
          </div>
        )}
      </div>
      {plan ? <PlanSheets plan={plan} showName={o?.show.name ?? ""} /> : null}
    </>
  );
}

function PlanSheets({ plan, showName }: { plan: Plan; showName: string }) {
  return (
    <div className="mt-8 space-y-6" data-testid="rehearsal-plan">
      {plan.items.map((it, i) => (
        <section key={`${it.kind}-${it.name}`} className="print-sheet rounded-xl border border-ink/10 bg-paper-raised p-6 print:text-[9pt]" aria-labelledby={`item-${i}`}>
          <p className="text-sm text-ink-soft">
            {plan.programName} · {showName} · stadium rehearsal, {i + 1} of {plan.items.length}
          </p>
          <h2 id={`item-${i}`} className="text-2xl font-bold text-ink">
            {i + 1}. {it.name} <span className="text-lg font-semibold text-ink-soft">· {it.minutes} {it.minutes === 1 ? "minute" : "minutes"}</span>
          </h2>
          <p className="text-ink-soft">
            {setListWords(it.sets)} · balance score {it.severity.toFixed(1)} (higher is worse)
          </p>
          <p className="mt-2 rounded-lg bg-paper-sunk p-2 text-sm">
            Listen from the <strong>{plan.listenFrom.name}</strong>: {plan.listenFrom.words}. Levels are predictions, not measurements; musicians near loud sections should wear hearing protection, and your school&apos;s and venue&apos;s rules come first.
          </p>
          <div className="mt-4 grid gap-6 md:grid-cols-2 print:grid-cols-[5fr_6fr] print:gap-4">
            <div>
              <h3 className="font-semibold text-ink">Build up</h3>
              <BuildUpList steps={it.buildUp} />
              <h3 className="mt-4 font-semibold text-ink">Checks that fail</h3>
              {it.failing.length ? (
                <ul className="mt-1 space-y-2 text-sm">
                  {it.failing.map((f) => (
                    <li key={f.id}>
                      <span className="font-semibold">{CHECK_LABELS[f.id]}</span> ({setListWords(f.sets)}): {f.detail}
                    </li>
                  ))}
                </ul>
              ) : (
                <p className="text-sm">Every balance check passes.</p>
              )}
            </div>
            <div>
              <h3 className="font-semibold text-ink">Dynamics to play</h3>
              <table className="mt-1 w-full text-left text-sm">
                <thead>
                  <tr className="border-b border-ink/20">
                    <th className="py-1 pr-2">Section</th>
                    <th className="py-1 pr-2">Voice</th>
                    <th className="py-1 pr-2">Written</th>
                    <th className="py-1 pr-2">Play</th>
                    <th className="py-1">From</th>
                  </tr>
                </thead>
                <tbody>
                  {it.dynamics.map((d) => (
                    <tr key={d.section} className="border-b border-ink/10">
                      <td className="py-1 pr-2">{d.who}</td>
                      <td className="py-1 pr-2">{d.voice}</td>
                      <td className="py-1 pr-2">{d.written}</td>
                      <td className="py-1 pr-2 font-bold">{d.play}</td>
                      <td className="whitespace-nowrap py-1 text-ink-soft">
                        {SOURCE_WORDS[d.source]}
                        {d.changeDb !== null ? ` ${d.changeDb > 0 ? "+" : ""}${d.changeDb.toFixed(1)} dB` : ""}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
              {it.dynamics.some((d) => d.why) ? (
                <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">{it.dynamics.filter((d) => d.why).map((d) => <li key={d.section}>{d.why}</li>)}</ul>
              ) : null}
              {it.unmet.length ? <p className="mt-2 text-sm text-signal-bad">Not reachable within the limits: {it.unmet.join(" ")}</p> : null}
            </div>
          </div>
        </section>
      ))}
    </div>
  );
}
