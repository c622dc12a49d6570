"use client";
// The show's roster, sortable by label, instrument, section, part or strength, with a count per section.
import type { Performer } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { humanize, signedDb } from "@/components/format";
import { SortableTable, type Column } from "@/components/SortableTable";

function strengthWord(db: number): string {
  if (db <= -1) return "weaker";
  if (db >= 1) return "stronger";
  return "even";
}

const COLUMNS: Column<Performer>[] = [
  { key: "label", header: "Label", sortValue: (p) => p.label, render: (p) => <span className="font-semibold">{p.label}</span> },
  { key: "instrument", header: "Instrument", sortValue: (p) => humanize(p.instrument) },
  { key: "section", header: "Section", sortValue: (p) => p.section },
  { key: "part", header: "Part", sortValue: (p) => p.part, render: (p) => p.part || <span className="text-ink-faint">—</span> },
  {
    key: "strength",
    header: "Strength",
    align: "right",
    sortValue: (p) => p.strengthDb,
    render: (p) => (
      <span>
        {signedDb(p.strengthDb)} <span className="text-sm text-ink-soft">({strengthWord(p.strengthDb)})</span>
      </span>
    ),
  },
];

export function RosterTable({ performers }: { performers: Performer[] }) {
  if (performers.length === 0) return <EmptyState title="No performers yet">The drill designer builds the roster in the field editor.</EmptyState>;
  const sections = new Map<string, number>();
  for (const p of performers) sections.set(p.section, (sections.get(p.section) ?? 0) + 1);
  return (
    <div className="space-y-4">
      <ul className="flex flex-wrap gap-2" aria-label="Performers per section">
        {[...sections].map(([section, n]) => (
          <li key={section} className="rounded-full border border-ink/15 bg-paper px-3 py-1 text-sm">
            <span className="font-semibold">{section}</span> <span className="tabular-nums text-ink-soft">{n}</span>
          </li>
        ))}
      </ul>
      <SortableTable caption="Roster" columns={COLUMNS} rows={performers} rowKey={(p) => p.id} initialSort="section" />
      <p className="text-sm text-ink-soft">Strength is a player&rsquo;s own offset from their instrument&rsquo;s level, from −6 dB (weak) to +6 dB (strong).</p>
    </div>
  );
}
