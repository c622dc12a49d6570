"use client";
// The show's listening points on the field drawing and in a list: add one, move it (in words, by numbers
// or with a click on the field), change its ground and background, remove it (a show keeps one).
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { Button } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import { FieldCanvas } from "@/components/field/FieldCanvas";
import { apiKeys } from "@/components/use-api";
import { describeListeningPoint } from "@/lib/field/point-words";
import { BACKGROUND_CHOICES } from "./choices";
import { bodyOf, draftOf, PointForm, type PointDraft } from "./PointForm";
import { useSave } from "./use-save";

const NONE = new Set<string>();
const noop = () => {};

export function PointsEditor({ data, editable }: { data: ShowResponse; editable: boolean }) {
  const showId = data.show.id;
  const points = data.listeningPoints;
  const [editing, setEditing] = useState<{ id: string | null; draft: PointDraft } | null>(null);
  const [placing, setPlacing] = useState(false);
  const save = useSave(showId);
  const base = `${apiKeys.show(showId)}/listening-points`;

  // The drawing shows the point being edited where the form says it is.
  const drawn = points.map((p) => (editing?.id === p.id ? { ...p, x: Number(editing.draft.x), y: Number(editing.draft.y) } : p));
  if (editing && editing.id === null && Number.isFinite(Number(editing.draft.x))) drawn.push({ id: "new", name: editing.draft.name || "New point", x: Number(editing.draft.x), y: Number(editing.draft.y), z: Number(editing.draft.z) });

  const open = (id: string | null) => {
    save.clear();
    setPlacing(false);
    setEditing({ id, draft: draftOf(points.find((p) => p.id === id) ?? null) });
  };
  const bgLabel = (p: (typeof points)[number]) => {
    const bg = p.background;
    if (!bg) return "no background";
    return "preset" in bg ? BACKGROUND_CHOICES.find((c) => c.key === bg.preset)!.label : "custom background";
  };

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="h-[min(50vh,420px)] min-h-[260px]" data-testid="points-field">
        <FieldCanvas
          rules={data.show.fieldRules}
          dots={[]}
          ghosts={[]}
          selected={NONE}
          relDb={{}}
          listeningPoints={drawn}
          selectedPointId={editing ? (editing.id ?? "new") : null}
          editable={false}
          showGrid={false}
          snap={false}
          placing={placing}
          onSelect={noop}
          onDragFrame={noop}
          onDragEnd={noop}
          onPlace={(x, y) => {
            if (!editing) return;
            setEditing({ ...editing, draft: { ...editing.draft, x: String(Math.round(x * 10) / 10), y: String(Math.round(y * 10) / 10) } });
            setPlacing(false);
          }}
        />
      </div>
      <div className="space-y-3">
        {editing ? (
          <PointForm
            draft={editing.draft}
            rules={data.show.fieldRules}
            isNew={editing.id === null}
            editable={editable}
            placing={placing}
            busy={save.busy}
            message={save.message}
            onChange={(draft) => setEditing({ ...editing, draft })}
            onPlace={setPlacing}
            onCancel={() => {
              setEditing(null);
              setPlacing(false);
            }}
            onSave={async () => {
              let created: string | null = null;
              const ok = await save.run(async () => {
                if (editing.id) await sendJson(`${base}/${editing.id}`, "PATCH", bodyOf(editing.draft));
                else created = (await sendJson<{ listeningPoint: { id: string } }>(base, "POST", bodyOf(editing.draft)))!.listeningPoint.id;
              }, `Saved. Choose "${editing.draft.name}" as the listening point in the field editor to read the box mix there.`);
              if (ok && created) setEditing({ id: created, draft: editing.draft });
            }}
            onRemove={async () => {
              if (await save.run(() => sendJson(`${base}/${editing.id}`, "DELETE"), "Removed.")) setEditing(null);
            }}
          />
        ) : (
          <>
            <ul className="space-y-2" aria-label="Listening points">
              {points.map((p) => (
                <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-ink/15 bg-paper px-3 py-2">
                  <span>
                    <span className="block font-semibold">{p.name}</span>
                    <span className="block text-sm text-ink-soft">{describeListeningPoint(p.x, p.y, p.z, data.show.fieldRules)}</span>
                    <span className="block text-sm text-ink-soft">{bgLabel(p)}</span>
                  </span>
                  <Button variant="secondary" onClick={() => open(p.id)}>
                    {editable ? "Edit" : "Details"}
                  </Button>
                </li>
              ))}
            </ul>
            {editable ? (
              <Button onClick={() => open(null)}>Add a listening point</Button>
            ) : null}
            {points.length === 1 ? <p className="text-sm text-ink-soft">Add a judge on the field or a seat in the stands to hear the drill from there as well.</p> : null}
            {save.message ? <p className="text-sm" aria-live="polite">{save.message.text}</p> : null}
          </>
        )}
      </div>
    </div>
  );
}
