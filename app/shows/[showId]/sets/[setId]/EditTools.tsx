// Editing commands for the selection: undo/redo, facing, take off the set, form helpers, snapping, the step grid.
import { useState } from "react";
import { FACINGS } from "@/lib/editor/forms";

export type FormCommand = "line" | "arc" | "mirror" | "copy-previous" | "snap";

export function EditTools(props: {
  editable: boolean;
  selectionSize: number;
  canUndo: boolean;
  canRedo: boolean;
  hasPrevious: boolean;
  snap: boolean;
  showGrid: boolean;
  onUndo(): void;
  onRedo(): void;
  onFace(deg: number): void;
  onRemove(): void;
  onForm(cmd: FormCommand): void;
  onBlock(columns: number, intervalSteps: number): void;
  onSnap(on: boolean): void;
  onGrid(on: boolean): void;
}) {
  const [angle, setAngle] = useState("45");
  const [columns, setColumns] = useState("4");
  const [interval, setInterval] = useState("2");
  const none = props.selectionSize === 0;
  const btn = "min-h-9 rounded-md border border-ink/20 bg-paper-raised px-2.5 text-sm font-semibold hover:bg-paper-sunk disabled:opacity-40";
  const toggles = (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      <label className="inline-flex items-center gap-1.5">
        <input type="checkbox" checked={props.showGrid} onChange={(e) => props.onGrid(e.target.checked)} /> Step grid
      </label>
      {props.editable ? (
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" checked={props.snap} onChange={(e) => props.onSnap(e.target.checked)} /> Snap to steps
        </label>
      ) : null}
    </div>
  );
  if (!props.editable) {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-sm text-ink-soft" data-testid="read-only">Read only: your role can read the drill but not change it.</p>
        {toggles}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-2" data-testid="edit-tools">
      <div className="flex flex-wrap items-center gap-1.5">
        <button type="button" className={btn} disabled={!props.canUndo} onClick={props.onUndo} title="Ctrl+Z">
          Undo
        </button>
        <button type="button" className={btn} disabled={!props.canRedo} onClick={props.onRedo} title="Ctrl+Shift+Z">
          Redo
        </button>
        <span className="mx-1 h-6 w-px bg-ink/15" aria-hidden="true" />
        <span className="text-sm text-ink-soft">Face</span>
        {Object.entries(FACINGS).map(([name, deg]) => (
          <button key={name} type="button" className={btn} disabled={none} onClick={() => props.onFace(deg)}>
            {name}
          </button>
        ))}
        <form
          className="inline-flex items-center gap-1"
          onSubmit={(e) => {
            e.preventDefault();
            props.onFace(Number(angle));
          }}
        >
          <input aria-label="Facing angle in degrees" type="number" className="min-h-9 w-16 rounded-md border border-ink/20 px-2 text-sm" value={angle} onChange={(e) => setAngle(e.target.value)} />
          <button type="submit" className={btn} disabled={none}>
            °
          </button>
        </form>
        <span className="mx-1 h-6 w-px bg-ink/15" aria-hidden="true" />
        <button type="button" className={btn} disabled={none} onClick={props.onRemove} title="Delete key">
          Take off set
        </button>
      </div>
      <div className="flex flex-wrap items-center gap-1.5">
        <span className="text-sm text-ink-soft">Form</span>
        <button type="button" className={btn} disabled={props.selectionSize < 3} onClick={() => props.onForm("line")} title="Even spacing between the two ends">
          Line
        </button>
        <button type="button" className={btn} disabled={props.selectionSize < 3} onClick={() => props.onForm("arc")} title="Even spacing on the arc through the ends and the one farthest out">
          Arc
        </button>
        <form
          className="inline-flex items-center gap-1"
          onSubmit={(e) => {
            e.preventDefault();
            props.onBlock(Number(columns), Number(interval));
          }}
        >
          <button type="submit" className={btn} disabled={none}>
            Block
          </button>
          <label className="text-sm">
            <input aria-label="Files across" type="number" min={1} className="min-h-9 w-14 rounded-md border border-ink/20 px-2" value={columns} onChange={(e) => setColumns(e.target.value)} /> across
          </label>
          <label className="text-sm">
            <input aria-label="Interval in steps" type="number" min={0.5} step={0.5} className="min-h-9 w-14 rounded-md border border-ink/20 px-2" value={interval} onChange={(e) => setInterval(e.target.value)} /> step interval
          </label>
        </form>
        <button type="button" className={btn} disabled={none} onClick={() => props.onForm("mirror")}>
          Mirror sides
        </button>
        <button type="button" className={btn} disabled={none || !props.hasPrevious} onClick={() => props.onForm("copy-previous")}>
          Copy from previous set
        </button>
        <button type="button" className={btn} disabled={none} onClick={() => props.onForm("snap")}>
          Snap to steps
        </button>
        <span className="mx-1 h-6 w-px bg-ink/15" aria-hidden="true" />
        {toggles}
      </div>
    </div>
  );
}
