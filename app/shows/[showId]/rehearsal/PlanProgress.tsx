"use client";
// While a rehearsal plan is worked out: how many of its phrases' balance plans are done (each can
// take a second on a large band).
import { plural } from "@/components/format";
import { useWorkProgress } from "@/components/use-work-progress";

export function PlanProgress({ showId }: { showId: string }) {
  const p = useWorkProgress(showId, "plans");
  return (
    <div id="plan-status" role="status" aria-live="polite" data-testid="plan-progress" className="min-h-6 font-medium text-ink-soft">
      <p>{p && p.total > 0 ? `Working out the plan… ${p.done} of ${plural(p.total, "phrase")} planned.` : "Working out the plan…"}</p>
      {p && p.total > 0 ? <progress className="mt-1 h-3 w-full accent-turf" value={p.done} max={p.total} aria-label="Phrases planned" /> : null}
    </div>
  );
}
