"use client";
// A kept rehearsal plan at the stadium, made for a phone: each item with its minutes, what to listen
// for, the build-up and the dynamics, and one large button to mark it done (every member may; the
// marks are shared, so the whole staff sees where the rehearsal stands).
import { useState } from "react";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { errorText } from "@/components/error-text";
import { ErrorState } from "@/components/ErrorState";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { PageTitle } from "@/components/PageTitle";
import { SkeletonCard } from "@/components/Skeleton";
import { useApi } from "@/components/use-api";
import type { RehearsalItem } from "@/lib/rehearsal/plan";
import { setListWords } from "@/lib/show/set-words";
import { BuildUpList } from "../../BuildUpList";
import { useLocalTimes } from "@/components/local-time";
import { showKeys } from "@/components/api-keys";

type Kept = {
  plan: { id: string; name: string; budgetMinutes: number; listenFrom: { name: string; words: string }; items: (RehearsalItem & { key: string; minutes: number })[] };
  done: { itemKey: string; doneAt: string; doneBy: string | null }[];
};


export function KeptPlanView({ showId, planId }: { showId: string; planId: string }) {
  const key = showKeys.keptPlan(showId, planId);
  const kept = useApi<Kept>(key);
  const [busy, setBusy] = useState<string | null>(null);
  const format = useLocalTimes();
  const time = (iso: string) => format(iso, { hour: "numeric", minute: "2-digit" });
  const [error, setError] = useState<string | null>(null);
  const crumbs = [{ label: "Stadium rehearsal", href: `/shows/${showId}/rehearsal` }, { label: kept.data?.plan.name ?? "Plan" }];
  if (kept.error) return (<><Breadcrumbs items={crumbs} /><ErrorState error={kept.error} what="rehearsal plan" onRetry={() => kept.mutate()} /></>);
  if (!kept.data) return <SkeletonCard rows={4} label="Loading the plan…" />;
  const { plan, done } = kept.data;
  const doneOf = new Map(done.map((d) => [d.itemKey, d]));
  const left = plan.items.filter((it) => !doneOf.has(it.key)).reduce((sum, it) => sum + it.minutes, 0);

  async function mark(itemKey: string, on: boolean) {
    setBusy(itemKey);
    setError(null);
    try {
      await sendJson(`${key}/items/${encodeURIComponent(itemKey)}`, "PUT", { done: on });
      await kept.mutate();
    } catch (err) {
      setError(errorText(err, "Not saved: check the connection and tap again."));
    } finally {
      setBusy(null);
    }
  }

  return (
    <>
      <Breadcrumbs items={crumbs} />
      <PageTitle sub={`${plan.budgetMinutes} minutes of stadium time · ${done.length} of ${plan.items.length} done · about ${left} ${left === 1 ? "minute" : "minutes"} of work left`}>{plan.name}</PageTitle>
      <p className="mb-4 rounded-lg bg-paper-sunk p-3 text-sm">
        Listen from the <strong>{plan.listenFrom.name}</strong>: {plan.listenFrom.words}. Levels are predictions, not measurements; musicians near loud sections should wear hearing protection.
      </p>
      <FormMessage id="kept-status" tone="bad">
        {error ?? ""}
      </FormMessage>
      <ol className="space-y-4" data-testid="kept-plan">
        {plan.items.map((it, i) => {
          const mark_ = doneOf.get(it.key);
          return (
            <li key={it.key} className={`rounded-xl border p-4 ${mark_ ? "border-turf-dark/40 bg-turf-light/40" : "border-ink/10 bg-paper-raised"}`} data-item={it.key} data-done={mark_ ? "yes" : "no"}>
              <h2 className="text-xl font-bold text-ink">
                {i + 1}. {it.name}
              </h2>
              <p className="text-ink-soft">
                {it.minutes} {it.minutes === 1 ? "minute" : "minutes"} · {setListWords(it.sets)}
              </p>
              {it.failing.length ? (
                <ul className="mt-2 list-disc space-y-1 pl-5">
                  {it.failing.map((f) => (
                    <li key={f.id}>
                      At {setListWords(f.sets)}: {f.detail}
                    </li>
                  ))}
                </ul>
              ) : (
                <p className="mt-2">The balance already works here: run it once as a check.</p>
              )}
              <BuildUpList steps={it.buildUp} className="mt-2" />
              {it.dynamics.some((d) => d.play !== d.written) ? (
                <p className="mt-2 text-sm">
                  Play:{" "}
                  {it.dynamics
                    .filter((d) => d.play !== d.written)
                    .map((d) => `${d.who} ${d.play} (written ${d.written})`)
                    .join("; ")}
                </p>
              ) : null}
              <button
                type="button"
                aria-pressed={Boolean(mark_)}
                disabled={busy === it.key}
                onClick={() => void mark(it.key, !mark_)}
                className={`mt-3 min-h-12 w-full rounded-lg px-4 text-lg font-semibold ${mark_ ? "border border-turf-dark bg-paper-raised text-turf-dark" : "bg-turf-dark text-white"}`}
              >
                {busy === it.key ? "Saving…" : mark_ ? `Done${mark_.doneBy ? ` (${mark_.doneBy}, ${time(mark_.doneAt)})` : ""}: tap to undo` : "Mark done"}
              </button>
            </li>
          );
        })}
      </ol>
    </>
  );
}
