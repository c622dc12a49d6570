"use client";
// The preview of one upload: what will be created or changed, and every row that cannot be imported.
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";

type Field = { field: string; from: string | number | null; to: string | number | null };
export type Preview = {
  kind: "roster-csv" | "drill-csv";
  rows: number;
  writable: boolean;
  errors: { line: number; reason: string }[];
  roster?: { creates: { line: number; label: string; instrument: string; section: string; part: string; strengthDb: number; name: string | null }[]; changes: { label: string; line: number; fields: Field[] }[]; unchanged: number };
  drill?: { sets: { number: string; counts: number; setId: string | null; countsBefore: number | null; creates: number; changes: number; unchanged: number }[]; dotCount: number; dots: { line: number; set: string; label: string; words: string; facingDeg: number }[] };
};

const show = (v: string | number | null) => (v === null || v === "" ? "—" : String(v));

export function PreviewPanel({ preview, fileName, busy, onConfirm, onCancel }: { preview: Preview; fileName: string; busy: boolean; onConfirm: () => void; onCancel: () => void; sets: { id: string; number: string }[]; showId: string }) {
  return (
    <Card title={`Preview of ${fileName}`} titleId="preview-title">
      <div data-testid="import-preview" data-writable={preview.writable} className="space-y-4">
        <p className="text-ink-soft">{preview.rows} rows read.</p>
        {preview.errors.length ? (
          <div role="alert" className="rounded-lg border border-signal-bad/40 bg-[#fdecea] p-3">
            <p className="font-semibold text-signal-bad">
              {preview.errors.length} {preview.errors.length === 1 ? "row" : "rows"} cannot be imported. Fix the file and upload it again; nothing is written.
            </p>
            <ul className="mt-2 space-y-1 text-sm" data-testid="import-errors">
              {preview.errors.map((e, i) => (
                <li key={i}>
                  <span className="font-semibold">Line {e.line}:</span> {e.reason}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {preview.drill ? (
          <>
            <table className="w-full text-left text-sm" data-testid="preview-sets">
              <thead>
                <tr className="border-b border-ink/15 text-ink-soft">
                  <th className="py-1 pr-2">Set</th>
                  <th className="py-1 pr-2">Counts</th>
                  <th className="py-1 pr-2">What happens</th>
                </tr>
              </thead>
              <tbody>
                {preview.drill.sets.map((s) => (
                  <tr key={s.number} className="border-b border-ink/10">
                    <td className="py-1 pr-2 font-semibold">{s.number}</td>
                    <td className="py-1 pr-2">{s.countsBefore !== null ? `${s.countsBefore} → ${s.counts}` : s.counts}</td>
                    <td className="py-1 pr-2">
                      {s.setId ? "existing set" : "new set"}: {s.creates} placed, {s.changes} moved, {s.unchanged} unchanged
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            <details>
              <summary className="cursor-pointer font-semibold">Every position ({preview.drill.dotCount})</summary>
              <ul className="mt-2 max-h-72 overflow-auto text-sm">
                {preview.drill.dots.map((d) => (
                  <li key={`${d.set}-${d.label}`}>
                    Set {d.set}, <span className="font-semibold">{d.label}</span>: {d.words}
                  </li>
                ))}
              </ul>
            </details>
          </>
        ) : null}
        {preview.roster ? (
          <div className="space-y-2 text-sm" data-testid="preview-roster">
            <p>
              {preview.roster.creates.length} to add, {preview.roster.changes.length} to change, {preview.roster.unchanged} unchanged.
            </p>
            {preview.roster.creates.length ? (
              <ul>
                {preview.roster.creates.map((c) => (
                  <li key={c.label}>
                    Add <span className="font-semibold">{c.label}</span>: {c.instrument}, {c.section}
                    {c.part ? ` (${c.part})` : ""}
                    {c.name ? `, ${c.name}` : ""}
                  </li>
                ))}
              </ul>
            ) : null}
            {preview.roster.changes.length ? (
              <ul>
                {preview.roster.changes.map((c) => (
                  <li key={c.label}>
                    Change <span className="font-semibold">{c.label}</span>: {c.fields.map((f) => `${f.field} ${show(f.from)} → ${show(f.to)}`).join("; ")}
                  </li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : null}
        <div className="flex gap-3">
          <Button onClick={onConfirm} disabled={busy || !preview.writable}>
            Confirm the import
          </Button>
          <Button variant="secondary" onClick={onCancel} disabled={busy}>
            Cancel
          </Button>
        </div>
      </div>
    </Card>
  );
}
