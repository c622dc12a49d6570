// The show's sets in order, each a link to its page in the field editor, with its counts.
import Link from "next/link";
import type { SetSummary } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { plural } from "@/components/format";

export function SetsStrip({ showId, sets }: { showId: string; sets: SetSummary[] }) {
  if (sets.length === 0) return <EmptyState title="No sets yet">The drill designer adds sets in the field editor.</EmptyState>;
  // The count at which each set is reached, from the start of the show.
  const rows = sets.reduce<(SetSummary & { at: number })[]>((acc, s) => [...acc, { ...s, at: (acc.at(-1)?.at ?? 0) + s.counts }], []);
  return (
    <div>
      <ol className="mb-3 grid grid-cols-[repeat(auto-fill,minmax(6.25rem,1fr))] gap-3" aria-label="Sets in order">
        {rows.map((s) => (
          <li key={s.id}>
            <Link
              href={`/shows/${showId}/sets/${s.id}`}
              prefetch={false}
              className="relative flex min-h-20 flex-col justify-between rounded-lg border border-ink/15 bg-paper px-3 py-2 hover:border-turf hover:bg-turf-light/40"
            >
              <span className="text-xl font-bold text-ink">
                <span className="sr-only">Set </span>
                {s.number}
              </span>
              <span className="text-sm text-ink-soft">{s.counts === 0 ? "opening" : plural(s.counts, "count")}</span>
              <span className="text-xs text-ink-faint">at count {s.at}</span>
            </Link>
          </li>
        ))}
      </ol>
      <p className="text-sm text-ink-soft">
        {plural(sets.length, "set")}, {plural(rows.at(-1)?.at ?? 0, "count")} in all. Counts are from the previous set. Open a set to place performers and hear its box mix.
      </p>
    </div>
  );
}
