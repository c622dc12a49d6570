"use client";
// The konva stage: the painted field (its own layer, redrawn only when the view changes), the
// previous set faintly, the performers, and the rubber band. Drags move the konva nodes directly
// once per animation frame (no React render per frame) and report the live positions; the
// editor commits them at the end. Client only: loaded through FieldCanvas (next/dynamic, ssr: false).
import type Konva from "konva";
import type { KonvaEventObject } from "konva/lib/Node";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { Circle, Group, Layer, Line, Rect, Shape, Stage } from "react-konva";
import type { FieldRules } from "@/lib/field/geometry";
import { clampToFieldArea } from "@/lib/field/geometry";
import { facingVector, fieldBounds, fitView, panBy, toField, toScreen, zoomAt, type View } from "@/lib/field/view";
import { snappedOffset } from "@/lib/editor/forms";
import { idsInRect } from "@/lib/editor/selection";
import { FieldMarkings, type MarkedPoint } from "./FieldMarkings";
import { wedgePoints } from "@/lib/field/marks";
import { haloRadius, type VoiceStyle } from "./palette";

export interface StageDot {
  id: string;
  label: string;
  /** How far the instrument throws its sound either side of the facing (degrees; lib/field/marks.ts). */
  spreadDeg: number;
  style: VoiceStyle;
  x: number;
  y: number;
  facingDeg: number;
}

export interface FieldStageProps {
  rules: FieldRules;
  dots: StageDot[];
  ghosts: { id: string; x: number; y: number }[];
  selected: ReadonlySet<string>;
  /** Players marked by the balance check the user chose (a dashed outer ring, see the legend). */
  flagged?: ReadonlySet<string>;
  /** Level of each performer relative to the loudest at the listening point (dB, ≤ 0). */
  relDb: Readonly<Record<string, number>>;
  listeningPoints: MarkedPoint[];
  selectedPointId: string | null;
  editable: boolean;
  showGrid: boolean;
  snap: boolean;
  placing: boolean;
  onSelect(ids: string[], mode: "click" | "band", additive: boolean): void;
  /** Each animation frame of a drag: the dragged performers' live positions; may answer their new relative levels. */
  onDragFrame(moved: { performerId: string; x: number; y: number; facingDeg: number }[]): Readonly<Record<string, number>> | void;
  onDragEnd(ids: string[], dx: number, dy: number): void;
  onPlace(x: number, y: number): void;
  onFrameTime?(ms: number): void;
}

type Gesture =
  | { kind: "drag"; ids: string[]; lead: { x: number; y: number }; start: { x: number; y: number }; last: { x: number; y: number }; moved: boolean }
  | { kind: "band"; start: { x: number; y: number }; last: { x: number; y: number }; additive: boolean }
  | { kind: "pan"; last: { x: number; y: number } }
  | { kind: "pinch"; dist: number; center: { x: number; y: number } };

const DRAG_THRESHOLD_PX = 3;

export default function FieldStage(props: FieldStageProps) {
  const { dots, editable } = props;
  const box = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 800, height: 500 });
  // null: fitted to the window (follows resizes); a View once the user zooms or pans.
  const [view, setView] = useState<View | null>(null);
  const [band, setBand] = useState<{ x: number; y: number; w: number; h: number } | null>(null);
  const dotsLayer = useRef<Konva.Layer>(null);
  const nodes = useRef(new Map<string, Konva.Shape>());
  const gesture = useRef<Gesture | null>(null);
  const frame = useRef<number | null>(null);
  const latest = useRef(props);
  // The latest props, for gesture handlers attached once.
  useEffect(() => {
    latest.current = props;
  });

  const bounds = useMemo(() => fieldBounds(props.listeningPoints), [props.listeningPoints]);
  const fit = useCallback(() => setView(null), []);

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    let measured = { width: 0, height: 0 };
    const ro = new ResizeObserver(([entry]) => {
      const w = Math.max(200, Math.floor(entry.contentRect.width));
      const h = Math.max(200, Math.floor(entry.contentRect.height));
      if (w === measured.width && h === measured.height) return;
      measured = { width: w, height: h };
      setSize(measured);
      setView(null); // a new window size fits the field again
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  const fitted = useMemo(() => fitView(size.width, size.height, bounds), [size, bounds]);
  const v = view ?? fitted;
  const r = Math.min(13, Math.max(6.5, 0.5 * v.scale));
  const byId = useMemo(() => new Map(dots.map((d) => [d.id, d])), [dots]);

  const labelled = useMemo(() => visibleLabels(dots, v, props.selected), [dots, v, props.selected]);

  const pointer = (): { x: number; y: number } | null => dotsLayer.current?.getStage()?.getPointerPosition() ?? null;

  // One frame of a drag: move the nodes, let the editor update the preview, draw.
  const runDragFrame = useCallback(() => {
    frame.current = null;
    const g = gesture.current;
    if (!g || g.kind !== "drag") return;
    const t0 = performance.now();
    const p = latest.current;
    const cur = toField(v, g.last.x, g.last.y);
    const start = toField(v, g.start.x, g.start.y);
    let dx = cur.x - start.x;
    let dy = cur.y - start.y;
    if (p.snap) ({ dx, dy } = snappedOffset(g.lead, dx, dy));
    const moved: { performerId: string; x: number; y: number; facingDeg: number }[] = [];
    for (const id of g.ids) {
      const d = byId.get(id);
      if (!d) continue;
      const at = clampToFieldArea(d.x + dx, d.y + dy);
      moved.push({ performerId: id, x: at.x, y: at.y, facingDeg: d.facingDeg });
      const node = nodes.current.get(id);
      if (node) node.position(toScreen(v, at.x, at.y));
    }
    const rel = p.onDragFrame(moved);
    if (rel) for (const id of g.ids) nodes.current.get(id)?.setAttr("halo", haloRadius(r, rel[id]));
    dotsLayer.current?.drawScene(); // the hit graph is redrawn once, when the drag ends
    p.onFrameTime?.(performance.now() - t0);
  }, [v, byId, r]);

  const schedule = () => {
    if (frame.current === null) frame.current = requestAnimationFrame(runDragFrame);
  };

  const dotIdOf = (target: Konva.Node): string | null => {
    const g = target.findAncestor(".dot", true) as Konva.Node | undefined;
    return g ? g.id() : null;
  };

  const onDown = (e: KonvaEventObject<PointerEvent>) => {
    const pos = pointer();
    if (!pos) return;
    const evt = e.evt;
    const p = latest.current;
    if (evt.button === 1 || evt.button === 2 || (!editable && !p.placing && !dotIdOf(e.target))) {
      gesture.current = { kind: "pan", last: pos };
      return;
    }
    if (p.placing) {
      const at = toField(v, pos.x, pos.y);
      p.onPlace(at.x, at.y);
      return;
    }
    const id = dotIdOf(e.target);
    if (id) {
      const additive = evt.shiftKey;
      const already = p.selected.has(id);
      if (!already || additive) p.onSelect([id], "click", additive);
      if (!editable || (additive && already)) return;
      const ids = already && !additive ? [...p.selected] : additive ? [...p.selected, id] : [id];
      const d = byId.get(id)!;
      gesture.current = { kind: "drag", ids, lead: { x: d.x, y: d.y }, start: pos, last: pos, moved: false };
      return;
    }
    gesture.current = { kind: "band", start: pos, last: pos, additive: evt.shiftKey };
  };

  const onMove = () => {
    const g = gesture.current;
    const pos = pointer();
    if (!g || !pos) return;
    if (g.kind === "pan") {
      setView((cur) => panBy(cur ?? v, pos.x - g.last.x, pos.y - g.last.y));
      g.last = pos;
    } else if (g.kind === "band") {
      g.last = pos;
      setBand({ x: Math.min(g.start.x, pos.x), y: Math.min(g.start.y, pos.y), w: Math.abs(pos.x - g.start.x), h: Math.abs(pos.y - g.start.y) });
    } else if (g.kind === "drag") {
      g.last = pos;
      if (!g.moved && Math.hypot(pos.x - g.start.x, pos.y - g.start.y) < DRAG_THRESHOLD_PX) return;
      g.moved = true;
      schedule();
    }
  };

  const onUp = () => {
    const g = gesture.current;
    gesture.current = null;
    if (!g) return;
    if (g.kind === "band") {
      setBand(null);
      const a = toField(v, g.start.x, g.start.y);
      const b = toField(v, g.last.x, g.last.y);
      const small = Math.hypot(g.last.x - g.start.x, g.last.y - g.start.y) < DRAG_THRESHOLD_PX;
      latest.current.onSelect(small ? [] : idsInRect(dots, { x0: a.x, y0: a.y, x1: b.x, y1: b.y }), "band", g.additive && !small);
    } else if (g.kind === "drag" && g.moved) {
      if (frame.current !== null) cancelAnimationFrame(frame.current);
      frame.current = null;
      runDragFrame();
      const cur = toField(v, g.last.x, g.last.y);
      const start = toField(v, g.start.x, g.start.y);
      let dx = cur.x - start.x;
      let dy = cur.y - start.y;
      if (latest.current.snap) ({ dx, dy } = snappedOffset(g.lead, dx, dy));
      latest.current.onDragEnd(g.ids, dx, dy);
    }
  };

  const onWheel = (e: KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const pos = pointer();
    if (!pos) return;
    const factor = Math.exp(-e.evt.deltaY * 0.0015);
    setView((cur) => zoomAt(cur ?? v, factor, pos.x, pos.y));
  };

  const onTouchMove = (e: KonvaEventObject<TouchEvent>) => {
    const t = e.evt.touches;
    if (t.length !== 2) return;
    e.evt.preventDefault();
    const rect = box.current!.getBoundingClientRect();
    const a = { x: t[0].clientX - rect.left, y: t[0].clientY - rect.top };
    const b = { x: t[1].clientX - rect.left, y: t[1].clientY - rect.top };
    const dist = Math.hypot(a.x - b.x, a.y - b.y);
    const center = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    const g = gesture.current;
    if (g?.kind === "pinch") {
      setView((cur) => panBy(zoomAt(cur ?? v, dist / g.dist, center.x, center.y), center.x - g.center.x, center.y - g.center.y));
    }
    setBand(null);
    gesture.current = { kind: "pinch", dist, center };
  };

  const zoomButton = (factor: number) => setView((cur) => zoomAt(cur ?? v, factor, size.width / 2, size.height / 2));

  return (
    <div ref={box} className="relative h-full w-full touch-none select-none overflow-hidden rounded-lg border border-ink/15 bg-[#f3f4ef]" style={{ cursor: props.placing ? "crosshair" : undefined }} data-testid="field-stage" data-scale={v.scale.toFixed(4)}>
      <Stage
        width={size.width}
        height={size.height}
        onPointerDown={onDown}
        onPointerMove={onMove}
        onPointerUp={onUp}
        onPointerLeave={onUp}
        onWheel={onWheel}
        onTouchMove={onTouchMove}
        onTouchEnd={() => (gesture.current = null)}
        onContextMenu={(e) => e.evt.preventDefault()}
      >
        <Layer listening={false}>
          <FieldMarkings view={v} rules={props.rules} showGrid={props.showGrid} listeningPoints={props.listeningPoints} selectedPointId={props.selectedPointId} />
        </Layer>
        <Layer listening={false}>
          {props.ghosts.map((g) => {
            const a = toScreen(v, g.x, g.y);
            const cur = byId.get(g.id);
            const b = cur ? toScreen(v, cur.x, cur.y) : null;
            return (
              <Group key={g.id}>
                {b ? <Line points={[a.x, a.y, b.x, b.y]} stroke="#8a94a3" strokeWidth={1} opacity={0.35} perfectDrawEnabled={false} /> : null}
                <Circle x={a.x} y={a.y} radius={r * 0.55} fill="#8a94a3" opacity={0.35} perfectDrawEnabled={false} />
              </Group>
            );
          })}
        </Layer>
        <Layer ref={dotsLayer}>
          {dots.map((d) => {
            const at = toScreen(v, d.x, d.y);
            const f = facingVector(d.facingDeg);
            const sel = props.selected.has(d.id);
            const flag = props.flagged?.has(d.id) ?? false;
            const halo = haloRadius(r, props.relDb[d.id]);
            return (
              // One shape a performer (halo, symbol, facing, label): a drag frame redraws 300 nodes, not 1200.
              <Shape
                key={d.id}
                id={d.id}
                name="dot"
                x={at.x}
                y={at.y}
                halo={halo}
                ref={(node: Konva.Shape | null) => {
                  if (node) nodes.current.set(d.id, node);
                  else nodes.current.delete(d.id);
                }}
                sceneFunc={(ctx, shape) => drawDot(ctx, d, r, { selected: sel, flagged: flag, halo: shape.getAttr("halo") as number, facing: f, label: labelled.has(d.id) })}
                hitFunc={(ctx, shape) => {
                  ctx.beginPath();
                  ctx.arc(0, 0, r + 3, 0, Math.PI * 2);
                  ctx.closePath();
                  ctx.fillShape(shape);
                }}
                fill="#000"
              />
            );
          })}
        </Layer>
        <Layer listening={false}>
          {band ? <Rect {...{ x: band.x, y: band.y, width: band.w, height: band.h }} stroke="#1f6fb5" strokeWidth={1} dash={[4, 3]} fill="rgba(31,111,181,0.08)" /> : null}
        </Layer>
      </Stage>
      <div className="absolute right-2 top-2 flex flex-col gap-1" role="group" aria-label="Zoom">
        <button type="button" className="h-9 w-9 rounded-md border border-ink/20 bg-paper-raised text-lg font-bold shadow-sm hover:bg-paper-sunk" onClick={() => zoomButton(1.3)} aria-label="Zoom in">
          +
        </button>
        <button type="button" className="h-9 w-9 rounded-md border border-ink/20 bg-paper-raised text-lg font-bold shadow-sm hover:bg-paper-sunk" onClick={() => zoomButton(1 / 1.3)} aria-label="Zoom out">
          −
        </button>
        <button type="button" className="h-9 w-9 rounded-md border border-ink/20 bg-paper-raised text-xs font-semibold shadow-sm hover:bg-paper-sunk" onClick={fit} aria-label="Fit the field">
          Fit
        </button>
      </div>
    </div>
  );
}

/**
 * Labels that fit without covering one another (selected first, then side 1 to side 2), so a
 * dense form stays readable at any zoom; zooming in shows them all.
 */
function visibleLabels(dots: StageDot[], v: View, selected: ReadonlySet<string>): Set<string> {
  const W = 26;
  const H = 12;
  const cell = new Map<string, { x: number; y: number }[]>();
  const out = new Set<string>();
  const order = [...dots].sort((a, b) => Number(selected.has(b.id)) - Number(selected.has(a.id)) || a.x - b.x);
  for (const d of order) {
    const p = toScreen(v, d.x, d.y);
    const cx = Math.floor(p.x / W);
    const cy = Math.floor(p.y / H);
    let free = true;
    for (let i = cx - 1; i <= cx + 1 && free; i++) {
      for (let j = cy - 1; j <= cy + 1 && free; j++) {
        for (const q of cell.get(`${i},${j}`) ?? []) if (Math.abs(q.x - p.x) < W && Math.abs(q.y - p.y) < H) free = false;
      }
    }
    if (!free && !selected.has(d.id)) continue;
    out.add(d.id);
    const key = `${cx},${cy}`;
    cell.set(key, [...(cell.get(key) ?? []), p]);
  }
  return out;
}

type Ctx = Parameters<NonNullable<Konva.ShapeConfig["sceneFunc"]>>[0];

/** A performer on the field: contribution halo, sound wedge toward the facing, dot and (when it fits) its label. */
function drawDot(ctx: Ctx, d: StageDot, r: number, o: { selected: boolean; flagged: boolean; halo: number; facing: { dx: number; dy: number }; label: boolean }) {
  const c = ctx._context;
  if (o.halo > 0) {
    c.beginPath();
    c.arc(0, 0, o.halo, 0, Math.PI * 2);
    c.globalAlpha = 0.18;
    c.fillStyle = d.style.colour;
    c.fill();
    c.globalAlpha = 1;
  }
  drawWedge(c, d, r);
  drawSymbol(ctx, d, r, o.selected, o.flagged);
  // Where the player faces, also for an instrument that sounds all round.
  c.beginPath();
  c.moveTo(o.facing.dx * r, o.facing.dy * r);
  c.lineTo(o.facing.dx * (r + 4), o.facing.dy * (r + 4));
  c.lineWidth = 1.5;
  c.lineCap = "round";
  c.strokeStyle = "#1c2430";
  c.stroke();
  c.lineCap = "butt";
  if (o.label) {
    // Bold 11 px with a white edge, so a label stays readable over grass, lines and other symbols.
    c.font = "bold 11px Arial";
    c.textBaseline = "middle";
    c.textAlign = "left";
    c.lineJoin = "round";
    c.lineWidth = 3;
    c.strokeStyle = "#ffffff";
    c.strokeText(d.label, r * 0.8, -r - 3.5);
    c.fillStyle = "#1c2430";
    c.fillText(d.label, r * 0.8, -r - 3.5);
    c.lineJoin = "miter";
  }
}

/** The sound wedge: the voice's colour, light, out to 2.6 dot radii, as wide as the instrument throws its sound. */
function drawWedge(c: CanvasRenderingContext2D, d: StageDot, r: number) {
  const pts = wedgePoints(d.facingDeg, d.spreadDeg, r * 2.6);
  c.beginPath();
  c.moveTo(pts[0]![0], pts[0]![1]);
  for (const [x, y] of pts.slice(1)) c.lineTo(x, y);
  c.closePath();
  c.globalAlpha = 0.3;
  c.fillStyle = d.style.colour;
  c.fill();
  c.globalAlpha = 0.9;
  c.lineWidth = 1;
  c.strokeStyle = d.style.colour;
  c.stroke();
  c.globalAlpha = 1;
}

/** The performer's dot: voice colour and outline, selection ring, check marker. */
function drawSymbol(ctx: Ctx, d: StageDot, r: number, selected: boolean, flagged: boolean) {
  const c = ctx._context;
  const st = d.style;
  if (flagged) {
    // Dark dashes over a white ring, outside the selection ring: readable on grass and on any voice colour.
    for (const [colour, width, dash] of [["#ffffff", 5, []], ["#1c2430", 2.5, [4, 3]]] as const) {
      c.beginPath();
      c.arc(0, 0, r + 8.5, 0, Math.PI * 2);
      c.lineWidth = width;
      c.strokeStyle = colour;
      c.setLineDash([...dash]);
      c.stroke();
    }
    c.setLineDash([]);
  }
  if (selected) {
    c.beginPath();
    c.arc(0, 0, r + 4.5, 0, Math.PI * 2);
    c.lineWidth = 2.5;
    c.strokeStyle = "#1f6fb5";
    c.setLineDash([]);
    c.stroke();
  }
  c.beginPath();
  c.arc(0, 0, r, 0, Math.PI * 2);
  if (st.fillAlpha > 0) {
    c.globalAlpha = st.fillAlpha;
    c.fillStyle = st.colour;
    c.fill();
    c.globalAlpha = 1;
  } else {
    c.fillStyle = "#ffffff";
    c.fill();
  }
  c.setLineDash(st.dash);
  c.lineWidth = st.fillAlpha === 0 ? 2 : 1.5;
  c.strokeStyle = st.fillAlpha === 0 ? st.colour : st.fillAlpha < 1 ? st.colour : "#1c2430";
  c.stroke();
  c.setLineDash([]);
  if (st.ring) {
    c.beginPath();
    c.arc(0, 0, r + 2.5, 0, Math.PI * 2);
    c.lineWidth = 1.2;
    c.strokeStyle = "#1c2430";
    c.stroke();
  }
}
