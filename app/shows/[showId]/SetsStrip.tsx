// The show's sets in order, each a link to its page in the field editor, with its counts. A movement's
// name heads its first set, so the sets read as the show's movements.
import Link from "next/link";
import { Fragment } from "react";
import type { Movement, SetSummary } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { plural } from "@/components/format";

export function SetsStrip({ showId, sets, movements = [] }: { showId: string; sets: SetSummary[]; movements?: Movement[] }) {
  if (sets.length === 0) return <EmptyState title="No sets yet">The drill designer adds sets in the field editor.</EmptyState>;
  const movementName = new Map(movements.map((m) => [m.id, m.name]));
  // The count at which each set is reached, from the start of the show.
  const rows = sets.reduce<(SetSummary & { at: number })[]>((acc, s) => [...acc, { ...s, at: (acc.at(-1)?.at ?? 0) + s.counts }], []);
  return (
    <div>
      <ol className="mb-3 grid grid-cols-[repeat(auto-fill,minmax(6.25rem,1fr))] gap-3" aria-label="Sets in order">
        {rows.map((s, i) => {
          const movement = s.movementId ? movementName.get(s.movementId) : undefined;
          const starts = movement !== undefined && rows[i - 1]?.movementId !== s.movementId;
          return (
            <Fragment key={s.id}>
              {starts ? (
                <li className="col-span-full -mb-1 mt-1 text-sm font-semibold text-ink first:mt-0" data-testid="movement-heading">
                  {movement}
                </li>
              ) : null}
              <li>
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
            </Fragment>
          );
        })}
      </ol>
      <p className="text-sm text-ink-soft">
        {plural(sets.length, "set")}, {plural(rows.at(-1)?.at ?? 0, "count")} in all. Counts are from the previous set. Open a set to place performers and hear its box mix.
      </p>
    </div>
  );
}
