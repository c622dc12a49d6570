// Placeholders shown while data loads, announced once to screen readers.
export function SkeletonBar({ className = "" }: { className?: string }) {
  return <div aria-hidden="true" className={`animate-pulse rounded-md bg-paper-sunk ${className}`} />;
}

export function SkeletonCard({ rows = 3, label = "Loading…" }: { rows?: number; label?: string }) {
  return (
    <div role="status" aria-live="polite" className="rounded-xl border border-ink/10 bg-paper-raised p-5 shadow-sm">
      <span className="sr-only">{label}</span>
      <SkeletonBar className="mb-5 h-6 w-1/3" />
      <div className="space-y-3">
        {Array.from({ length: rows }, (_, i) => (
          <SkeletonBar key={i} className="h-11 w-full" />
        ))}
      </div>
    </div>
  );
}
