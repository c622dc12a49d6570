"use client";
// The placeholder of a page waiting on the show's transition sweeps (the timeline): how many of the
// transitions that changed are worked out so far, asked twice a second while the page waits.
import { plural } from "./format";
import { SkeletonBar, SkeletonCard } from "./Skeleton";
import { useWorkProgress } from "./use-work-progress";

export function SweepProgress({ showId, label }: { showId: string; label: string }) {
  const p = useWorkProgress(showId, "sweeps");
  if (!p || p.total === 0) return <SkeletonCard rows={8} label={label} />;
  return (
    <div role="status" aria-live="polite" className="rounded-xl border border-ink/10 bg-paper-raised p-5 shadow-sm" data-testid="sweep-progress">
      <p className="mb-3 text-ink">
        {label} {p.done} of {plural(p.total, "changed transition")} worked out.
      </p>
      <progress className="mb-5 h-3 w-full accent-turf" value={p.done} max={p.total} aria-label="Transitions worked out" />
      <div className="space-y-3">
        {Array.from({ length: 6 }, (_, i) => (
          <SkeletonBar key={i} className="h-11 w-full" />
        ))}
      </div>
    </div>
  );
}
