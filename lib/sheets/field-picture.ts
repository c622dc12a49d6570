// A field picture for the coordinate sheets, as geometry in drawing units (points on paper; the
// screen draws the same numbers in an SVG viewBox), so paper and screen place every line, dot and
// label alike: the field to scale seen from the press box (front sideline at the bottom, side 1 on
// the left), yard lines, hashes, and each dot's label placed apart (label-layout.ts). Pure.
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, yardLines, type FieldRules } from "@/lib/field/geometry";
import { layoutLabels, type PlacedLabel } from "./label-layout";

/** Room drawn in front of the front sideline (a front ensemble stands there) and behind the back one, in metres. */
export const FRONT_ROOM_M = 7;
export const BACK_ROOM_M = 2;

export interface PictureDot {
  label: string;
  x: number;
  y: number;
  /** With both, the dot is drawn as a performer's mark (the sound wedge toward the facing). */
  facingDeg?: number;
  spreadDeg?: number;
}

export interface FieldPicture {
  width: number;
  height: number;
  /** The field's rectangle (sideline to sideline, end line to end line). */
  field: { x: number; y: number; w: number; h: number };
  yardLines: { x: number; goal: boolean; number: number | null }[];
  /** Tick marks of the hashes: one per yard on each hash. */
  hashTicks: { x: number; y: number }[];
  /** Where the yard numbers sit (their baseline's y). */
  numberY: number;
  dots: { label: string; x: number; y: number; facingDeg?: number; spreadDeg?: number }[];
  labels: PlacedLabel[];
  fontSize: number;
  dotRadius: number;
  /** Field metres to drawing units. */
  px(x: number): number;
  py(y: number): number;
}

export interface PictureOptions {
  /** Drawing width; the height follows the field's proportions. */
  width: number;
  /** Label text size (default width / 97, 5.5 pt on a Letter page). */
  fontSize?: number;
  /** Dot radius (default width / 240). */
  dotRadius?: number;
  /** Leave labels out (a small picture of where one performer stands). */
  labels?: boolean;
}

export function fieldPicture(rules: FieldRules, dots: readonly PictureDot[], options: PictureOptions): FieldPicture {
  const { width } = options;
  const scale = width / (2 * END_LINE_X_M);
  const height = (FIELD_WIDTH_M + FRONT_ROOM_M + BACK_ROOM_M) * scale;
  const px = (x: number) => (x + END_LINE_X_M) * scale;
  const py = (y: number) => (FIELD_WIDTH_M + BACK_ROOM_M - y) * scale;
  const fontSize = options.fontSize ?? width / 97;
  const dotRadius = options.dotRadius ?? width / 240;
  const h = hashesY(rules);
  const placed = dots.map((d) => ({ label: d.label, x: px(d.x), y: py(d.y), facingDeg: d.facingDeg, spreadDeg: d.spreadDeg }));
  return {
    width,
    height,
    field: { x: 0, y: py(FIELD_WIDTH_M), w: width, h: FIELD_WIDTH_M * scale },
    yardLines: yardLines().map((l) => ({ x: px(l.x), goal: Math.abs(Math.abs(l.x) - GOAL_LINE_X_M) < 1e-6, number: l.numbered ? l.yard : null })),
    hashTicks: Array.from({ length: 101 }, (_, k) => (k - 50) * (GOAL_LINE_X_M / 50)).flatMap((x) => [h.front, h.back].map((y) => ({ x: px(x), y: py(y) }))),
    numberY: py(3),
    dots: placed,
    labels: options.labels === false ? [] : layoutLabels(placed, { fontSize, dotRadius, bounds: { x: 0, y: 0, w: width, h: height } }),
    fontSize,
    dotRadius,
    px,
    py,
  };
}
