"use client";
// The show's movements: a name and the set each starts at; each runs to the set before the next one.
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Button } from "@/components/Button";
import { EmptyState } from "@/components/EmptyState";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { apiKeys } from "@/components/use-api";
import { useSave } from "./use-save";

export function MovementsForm({ data, editable }: { data: ShowResponse; editable: boolean }) {
  const { sets } = data;
  const [rows, setRows] = useState(() => (data.movements ?? []).map((m) => ({ name: m.name, firstSetId: m.firstSetId ?? sets[0]?.id ?? "" })));
  const save = useSave(data.show.id);
  const numberOf = new Map(sets.map((s, i) => [s.id, { number: s.number, i }]));
  // What each row spans, as the server will number them: by where they start.
  const sorted = [...rows].sort((a, b) => (numberOf.get(a.firstSetId)?.i ?? 0) - (numberOf.get(b.firstSetId)?.i ?? 0));
  const spanOf = (row: (typeof rows)[number]) => {
    const k = sorted.indexOf(row);
    const from = numberOf.get(row.firstSetId)?.i ?? 0;
    const to = k + 1 < sorted.length ? (numberOf.get(sorted[k + 1]!.firstSetId)?.i ?? sets.length) - 1 : sets.length - 1;
    return to < from ? "" : from === to ? `set ${sets[from]?.number}` : `sets ${sets[from]?.number}–${sets[to]?.number}`;
  };
  const update = (i: number, patch: Partial<(typeof rows)[number]>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const unused = sets.find((s) => !rows.some((r) => r.firstSetId === s.id));
  return (
    <form
      aria-label="Movements"
      onSubmit={(e) => {
        e.preventDefault();
        void save.run(() => sendJson(apiKeys.show(data.show.id), "PATCH", { movements: rows }), "Movements saved.");
      }}
    >
      {rows.length === 0 ? (
        <EmptyState title="No movements yet">{editable ? "Add the show's first movement (the opener starts at set 1), then each one after it at the set where it begins." : "A director or designer names the movements here."}</EmptyState>
      ) : (
        <ol className="space-y-2">
          {rows.map((r, i) => (
            <li key={i} className="flex flex-wrap items-end gap-2">
              <label className="text-sm">
                <span className="block font-semibold">Name</span>
                <input className="min-h-11 w-56 rounded-md border border-ink/30 px-2" value={r.name} disabled={!editable} aria-label={`Movement ${i + 1} name`} onChange={(e) => update(i, { name: e.target.value })} />
              </label>
              <label className="text-sm">
                <span className="block font-semibold">Starts at set</span>
                <select className="min-h-11 rounded-md border border-ink/30 bg-paper-raised px-2" value={r.firstSetId} disabled={!editable} aria-label={`Movement ${i + 1} first set`} onChange={(e) => update(i, { firstSetId: e.target.value })}>
                  {sets.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.number}
                    </option>
                  ))}
                </select>
              </label>
              <span className="min-h-11 py-2 text-sm text-ink-soft">{spanOf(r)}</span>
              {editable ? (
                <Button variant="quiet" onClick={() => setRows(rows.filter((_, j) => j !== i))}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ol>
      )}
      {editable ? (
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <Button variant="secondary" disabled={!unused} onClick={() => unused && setRows([...rows, { name: `Movement ${rows.length + 1}`, firstSetId: unused.id }])}>
            Add a movement
          </Button>
          <Button type="submit" disabled={save.busy}>
            {save.busy ? "Saving…" : "Save movements"}
          </Button>
          <FormMessage id="movements-message" tone={save.message?.tone ?? "info"}>
            {save.message?.text}
          </FormMessage>
        </div>
      ) : null}
    </form>
  );
}
