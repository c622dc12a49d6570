"use client";
// The show's roster, sortable by label, name, instrument, section, part or strength, with a count per section;
// editors add performers, and change or remove one from its row.
import Link from "next/link";
import { useState } from "react";
import { useSWRConfig } from "swr";
import type { Performer } from "@/components/api-types";
import { Button } from "@/components/Button";
import { EmptyState } from "@/components/EmptyState";
import { FormMessage } from "@/components/FormMessage";
import { signedDb } from "@/components/format";
import { SortableTable, type Column } from "@/components/SortableTable";
import { apiKeys } from "@/components/use-api";
import { AddPerformersForm } from "./AddPerformersForm";
import { instrumentName } from "./instrument-options";
import { PerformerForm } from "./PerformerForm";

function strengthWord(db: number): string {
  if (db <= -1) return "weaker";
  if (db >= 1) return "stronger";
  return "even";
}

const none = <span className="text-ink-faint">—</span>;

const columnsFor = (showId: string): Column<Performer>[] => [
  {
    key: "label",
    header: "Label",
    sortValue: (p) => p.label,
    render: (p) => (
      <Link className="font-semibold text-turf-dark underline" href={`/shows/${showId}/performer/${encodeURIComponent(p.label)}`} title={`${p.label}'s dots in every set`}>
        {p.label}
      </Link>
    ),
  },
  { key: "name", header: "Name", sortValue: (p) => p.name ?? "", render: (p) => p.name || none },
  { key: "instrument", header: "Instrument", sortValue: (p) => instrumentName(p.instrument), render: (p) => instrumentName(p.instrument) },
  { key: "section", header: "Section", sortValue: (p) => p.section },
  { key: "part", header: "Part", sortValue: (p) => p.part, render: (p) => p.part || none },
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

export function RosterTable({ showId, performers, editable }: { showId: string; performers: Performer[]; editable: boolean }) {
  const { mutate } = useSWRConfig();
  const [editing, setEditing] = useState<string | null>(null);
  const [status, setStatus] = useState("");
  const refresh = () => mutate(apiKeys.show(showId));
  const sections = new Map<string, number>();
  for (const p of performers) sections.set(p.section, (sections.get(p.section) ?? 0) + 1);
  const chosen = performers.find((p) => p.id === editing) ?? null;
  const columns: Column<Performer>[] = editable
    ? [
        ...columnsFor(showId),
        {
          key: "edit",
          header: "Change",
          sortValue: (p) => p.label,
          render: (p) => (
            <Button variant="quiet" className="min-h-9 px-2 py-0" aria-label={`Edit ${p.label}`} onClick={() => setEditing(p.id)}>
              Edit
            </Button>
          ),
        },
      ]
    : columnsFor(showId);

  return (
    <div className="space-y-4">
      <datalist id="roster-sections">
        {[...sections.keys()].map((s) => <option key={s} value={s} />)}
      </datalist>
      {performers.length === 0 ? (
        <EmptyState title="No performers yet">
          {editable ? "Add the band by instrument below; then place them on the field in the set editor." : "The drill designer or the director builds the roster."}
        </EmptyState>
      ) : (
        <>
          <ul className="flex flex-wrap gap-2" aria-label="Performers per section">
            {[...sections].map(([section, n]) => (
              <li key={section} className="rounded-full border border-ink/15 bg-paper px-3 py-1 text-sm">
                <span className="font-semibold">{section}</span> <span className="tabular-nums text-ink-soft">{n}</span>
              </li>
            ))}
          </ul>
          {chosen ? (
            <PerformerForm
              key={chosen.id}
              showId={showId}
              performer={chosen}
              onCancel={() => setEditing(null)}
              onDone={async (message) => {
                await refresh();
                setEditing(null);
                setStatus(message);
              }}
            />
          ) : null}
          <FormMessage id="roster-status" tone="info">{status}</FormMessage>
          <SortableTable caption="Roster" columns={columns} rows={performers} rowKey={(p) => p.id} initialSort="section" />
          <p className="text-sm text-ink-soft">Strength is a player&rsquo;s own offset from their instrument&rsquo;s level, from −6 dB (weak) to +6 dB (strong).</p>
        </>
      )}
      {editable ? <AddPerformersForm showId={showId} onAdded={refresh} /> : null}
    </div>
  );
}
