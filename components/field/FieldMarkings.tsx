// The painted field, drawn once per view on its own layer: end zones, sidelines and end lines,
// goal lines, yard lines every 5 with numbers every 10, hashes by the rules in force, the optional
// 8-to-5 step grid, side 1 / side 2 and the front, and the listening points off the front sideline.
import { Fragment } from "react";
import { Circle, Group, Line, Rect, Text } from "react-konva";
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, STEP_M, YARD_M, yardLines, type FieldRules } from "@/lib/field/geometry";
import { toScreen, type View } from "@/lib/field/view";

const LINE = "#8da889";
const STRONG = "#5f7d5b";
const NUMBER = "#6d8769";
const GRID = "rgba(95,125,91,0.16)";

export interface MarkedPoint {
  id: string;
  name: string;
  x: number;
  y: number;
  z: number;
}

export function FieldMarkings({ view, rules, showGrid, listeningPoints, selectedPointId }: { view: View; rules: FieldRules; showGrid: boolean; listeningPoints: MarkedPoint[]; selectedPointId: string | null }) {
  const s = (x: number, y: number) => toScreen(view, x, y);
  const seg = (x0: number, y0: number, x1: number, y1: number) => {
    const a = s(x0, y0);
    const b = s(x1, y1);
    return [a.x, a.y, b.x, b.y];
  };
  const corner = s(-END_LINE_X_M, FIELD_WIDTH_M);
  const px = (m: number) => m * view.scale;
  const h = hashesY(rules);
  const numberSize = Math.max(9, px(1.83)); // painted numbers are 6 ft tall (from memory)
  const fontSize = 13;

  const hashTicks: number[][] = [];
  for (let yd = -50; yd <= 50; yd++) {
    const x = yd * YARD_M;
    if (yd % 5 === 0) continue;
    for (const y of [h.front, h.back]) hashTicks.push(seg(x, y - 0.3, x, y + 0.3));
    hashTicks.push(seg(x, 0, x, 0.6), seg(x, FIELD_WIDTH_M - 0.6, x, FIELD_WIDTH_M));
  }

  const grid: number[][] = [];
  if (showGrid && view.scale * STEP_M >= 3) {
    const n = Math.floor(END_LINE_X_M / STEP_M);
    for (let i = -n; i <= n; i++) grid.push(seg(i * STEP_M, 0, i * STEP_M, FIELD_WIDTH_M));
    for (let j = 1; j * STEP_M < FIELD_WIDTH_M; j++) grid.push(seg(-END_LINE_X_M, j * STEP_M, END_LINE_X_M, j * STEP_M));
  }

  const back = s(0, FIELD_WIDTH_M);
  const mid = s(0, FIELD_WIDTH_M / 2);
  const left = s(-END_LINE_X_M, 0);
  const right = s(END_LINE_X_M, 0);

  return (
    <Group listening={false}>
      <Rect x={corner.x} y={corner.y} width={px(2 * END_LINE_X_M)} height={px(FIELD_WIDTH_M)} fill="#e8f0e1" />
      {[-1, 1].map((k) => {
        const a = s(k < 0 ? -END_LINE_X_M : GOAL_LINE_X_M, FIELD_WIDTH_M);
        return <Rect key={k} x={a.x} y={a.y} width={px(END_LINE_X_M - GOAL_LINE_X_M)} height={px(FIELD_WIDTH_M)} fill="#d9e5d1" />;
      })}
      {grid.map((pts, i) => (
        <Line key={`g${i}`} points={pts} stroke={GRID} strokeWidth={1} perfectDrawEnabled={false} />
      ))}
      {yardLines().map((l) => (
        <Fragment key={l.x}>
          <Line points={seg(l.x, 0, l.x, FIELD_WIDTH_M)} stroke={l.yard === 0 ? STRONG : LINE} strokeWidth={l.yard === 0 || l.yard === 50 ? 2 : 1} />
          {l.numbered
            ? [9 * YARD_M, FIELD_WIDTH_M - 9 * YARD_M].map((y) => {
                const p = s(l.x, y);
                return (
                  <Text
                    key={y}
                    x={p.x - numberSize * 1.5}
                    y={p.y - numberSize / 2}
                    width={numberSize * 3}
                    align="center"
                    text={String(l.yard)}
                    fontSize={numberSize}
                    fontStyle="bold"
                    fill={NUMBER}
                    opacity={0.75}
                  />
                );
              })
            : null}
        </Fragment>
      ))}
      {hashTicks.map((pts, i) => (
        <Line key={`h${i}`} points={pts} stroke={LINE} strokeWidth={1} perfectDrawEnabled={false} />
      ))}
      {[h.front, h.back].map((y) => (
        <Line key={`hash${y}`} points={seg(-GOAL_LINE_X_M, y, GOAL_LINE_X_M, y)} stroke={LINE} strokeWidth={1} dash={[2, Math.max(2, px(YARD_M) - 2)]} />
      ))}
      <Rect x={corner.x} y={corner.y} width={px(2 * END_LINE_X_M)} height={px(FIELD_WIDTH_M)} stroke={STRONG} strokeWidth={2.5} />
      <Text x={left.x} y={left.y + 5} text="FRONT SIDELINE · press box side" fontSize={fontSize} fontStyle="bold" fill="#4a5566" />
      <Text x={back.x - 200} y={back.y - fontSize - 6} width={400} align="center" text="BACK SIDELINE" fontSize={fontSize} fill="#4a5566" />
      <Text x={left.x + 6} y={mid.y - fontSize / 2} text="SIDE 1" fontSize={fontSize} fontStyle="bold" fill="#4a5566" />
      <Text x={right.x - 54} y={mid.y - fontSize / 2} width={48} align="right" text="SIDE 2" fontSize={fontSize} fontStyle="bold" fill="#4a5566" />
      <Text x={left.x + 6} y={s(0, h.front).y + 3} text="front hash" fontSize={11} fill="#6d7788" />
      <Text x={left.x + 6} y={s(0, h.back).y - 14} text="back hash" fontSize={11} fill="#6d7788" />
      {listeningPoints.map((lp) => {
        const p = s(lp.x, lp.y);
        const on = lp.id === selectedPointId;
        return (
          <Group key={lp.id} x={p.x} y={p.y}>
            <Rect x={-7} y={-7} width={14} height={14} fill={on ? "#1c2430" : "#ffffff"} stroke="#1c2430" strokeWidth={2} cornerRadius={2} />
            <Circle radius={2.5} fill={on ? "#ffffff" : "#1c2430"} />
            <Text x={12} y={-8} text={`${lp.name} · ${lp.z.toFixed(0)} m up`} fontSize={12} fontStyle={on ? "bold" : "normal"} fill="#1c2430" />
          </Group>
        );
      })}
    </Group>
  );
}
