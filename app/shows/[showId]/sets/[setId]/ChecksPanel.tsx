// The stored analysis's balance checks (pass or fail, in words and an icon, never colour alone) and
// the suggested played dynamics. Choosing a failed check marks and selects its players on the field.
import Link from "next/link";
import { CHECK_MEANINGS } from "@/lib/music/check-labels";
import { CHECK_LABELS, formatDb } from "../../music/voices";
import type { AnalysisResponse } from "./editor-api";

function Verdict({ passed }: { passed: boolean }) {
  return passed ? (
    <span className="inline-flex shrink-0 items-center gap-1 font-semibold text-turf-dark">
      <svg aria-hidden="true" viewBox="0 0 16 16" className="h-4 w-4">
        <path d="M3 8.5l3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
      Passes
    </span>
  ) : (
    <span className="inline-flex shrink-0 items-center gap-1 font-semibold text-signal-bad">
      <svg aria-hidden="true" viewBox="0 0 16 16" className="h-4 w-4">
        <path d="M8 1.5l7 13H1z" fill="currentColor" />
        <path d="M8 6v4M8 12v.5" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
      Fails
    </span>
  );
}

/** Whether the verdict holds across the catalog's uncertainty (model version 4; absent on older answers). */
function Certainty({ check }: { check: AnalysisResponse["checks"][number] }) {
  if (!check.confidence) return null;
  const clear = check.confidence === "clear";
  const turned = (check.turnedBy ?? []).map((t) => `${t.name} ${Math.abs(t.shiftDb).toFixed(0)} dB ${t.shiftDb > 0 ? "louder" : "softer"}`);
  return (
    <span className="block text-xs" data-testid={`certainty-${check.id}`} data-confidence={check.confidence}>
      <span className={`font-semibold ${clear ? "text-ink" : "text-signal-warn"}`}>{clear ? "Clear" : "Borderline"}</span>
      <span className="text-ink-soft">
        {clear
          ? ` — ${check.passed ? "passes" : "fails"} in all ${check.cases} likely cases of the catalog's uncertainty.`
          : ` — ${check.passed ? "would fail" : "would pass"} with ${turned.slice(0, 3).join(" or ")}${turned.length > 3 ? ` (and ${turned.length - 3} more)` : ""}.`}
      </span>
    </span>
  );
}

export function ChecksPanel({
  showId,
  analysis,
  pointName,
  chosen,
  stale,
  onChoose,
}: {
  showId: string;
  analysis: Pick<AnalysisResponse, "checks" | "plan"> | null;
  pointName: string;
  chosen: string | null;
  /** The field shows something other than the saved set (a drag, an unsaved change, a count of the transition). */
  stale: boolean;
  onChoose(id: string | null): void;
}) {
  const changes = analysis?.plan.filter((e) => e.playedDynamic !== e.writtenDynamic || e.atLimit || e.unreachable?.length) ?? [];
  return (
    <section aria-labelledby="checks-title" className="rounded-xl border border-ink/10 bg-paper-raised p-4 shadow-sm" data-testid="checks-panel">
      <h2 id="checks-title" className="text-lg font-semibold">
        Balance checks <span className="font-normal text-ink-soft">at {pointName}</span>
      </h2>
      {stale ? <p className="text-xs text-ink-soft">As the set was last saved.</p> : null}
      {!analysis ? (
        <p className="mt-2 text-ink-soft">Checking the balance…</p>
      ) : (
        <ul className="mt-2 space-y-1.5" aria-label="Balance checks">
          {analysis.checks.map((c) => {
            const label = CHECK_LABELS[c.id] ?? c.id;
            const on = chosen === c.id;
            const meaning = CHECK_MEANINGS[c.id];
            return (
              <li key={c.id} data-testid={`check-${c.id}`} data-passed={String(c.passed)} data-status={c.status ?? (c.passed ? "pass" : "fail")}>
                {c.status === "not-applicable" ? (
                  <div className="px-2 py-1 text-ink-soft">
                    <div className="flex items-baseline justify-between gap-2 text-sm">
                      <span className="font-semibold">{label}</span>
                      <span className="shrink-0 font-semibold">Not applicable</span>
                    </div>
                    {meaning ? <p className="text-xs">{meaning}</p> : null}
                    <p className="text-xs">{c.detail}</p>
                  </div>
                ) : c.passed ? (
                  <div className="px-2 py-1">
                    <div className="flex items-baseline justify-between gap-2 text-sm">
                      <span className="font-semibold">{label}</span>
                      <Verdict passed />
                    </div>
                    {meaning ? <p className="text-xs text-ink-soft">{meaning}</p> : null}
                    <p className="text-xs text-ink-soft">{c.detail}</p>
                    <Certainty check={c} />
                  </div>
                ) : (
                  <button
                    type="button"
                    aria-pressed={on}
                    onClick={() => onChoose(on ? null : c.id)}
                    className={`block min-h-11 w-full rounded-lg border px-2 py-1 text-left ${on ? "border-ink bg-paper-sunk" : "border-signal-bad/40 hover:border-ink"}`}
                  >
                    <span className="flex items-baseline justify-between gap-2 text-sm">
                      <span className="font-semibold">{label}</span>
                      <Verdict passed={false} />
                    </span>
                    {meaning ? <span className="block text-xs text-ink-soft">{meaning}</span> : null}
                    <span className="block text-xs">{c.detail}</span>
                    <Certainty check={c} />
                    <span className="mt-0.5 block text-xs font-semibold text-turf-dark">
                      {c.performerIds.length === 0 ? "No single players to mark." : on ? `${c.performerIds.length} marked on the field · choose again to clear` : `Mark the ${c.performerIds.length} players on the field`}
                    </span>
                  </button>
                )}
              </li>
            );
          })}
        </ul>
      )}
      <h3 className="mt-4 font-semibold">Suggested dynamics</h3>
      {!analysis ? null : changes.length === 0 ? (
        <p className="text-sm text-ink-soft">Every section can play as written here.</p>
      ) : (
        <ul className="mt-1 space-y-0.5 text-sm" aria-label="Suggested dynamics" data-testid="plan-list">
          {changes.map((e) => (
            <li key={e.section} className="grid grid-cols-[minmax(0,1fr)_auto_auto] items-baseline gap-2">
              <span className="truncate">{e.section}</span>
              <span className="font-semibold">
                {e.writtenDynamic} → {e.playedDynamic}
              </span>
              <span className="text-right tabular-nums text-ink-soft">{formatDb(e.changeDb, true)} dB</span>
              {e.atLimit || e.unreachable?.length ? (
                <span className="col-span-3 text-xs text-signal-warn">
                  {e.atLimit ? `Stops at ${e.atLimit} (the end of its range or the musical limits). ` : null}
                  {e.unreachable?.join(" ")}
                </span>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-2 text-sm">
        <Link href={`/shows/${encodeURIComponent(showId)}/music`} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline">
          Plans are adopted per phrase on the music page
        </Link>
      </p>
      <p className="text-xs text-ink-soft">Predicted levels from the acoustic model, not measurements.</p>
    </section>
  );
}
