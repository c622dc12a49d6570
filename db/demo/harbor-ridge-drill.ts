// Harbor Ridge's drill (invented): 18 sets over three movements. Every marching member has a
// dot in every set; the front ensemble stays put in front of the front sideline.
import { arc, block, line, row, steps, translate, wedge, type Point } from "./geometry";
import { GROUPS, HARBOR_RIDGE_PERFORMERS } from "./harbor-ridge-roster";
import type { DemoPosition, DemoSet } from "./types";

interface Form {
  labels: string[];
  points: Point[];
  /** Facing in degrees (0 = toward the front sideline); 0 unless given. */
  facingDeg?: number;
}

const WW = GROUPS.woodwinds; // 23: flutes and piccolo, clarinets, saxes
const BR = GROUPS.brass; // 31: trumpets, mellophones, trombones, baritones, tubas
const BAT = GROUPS.battery; // 12
const FLUTES = WW.slice(0, 7);
const CLARINETS = WW.slice(7, 16);
const SAXES = WW.slice(16);
const SOLOIST = "T1";

// Keyboards and synth in a row 3 m in front of the front sideline, facing the stands.
const FRONT_ENSEMBLE: Form = { labels: GROUPS.frontEnsemble, points: [-10.5, -7.5, -4.5, 1.5, 4.5, 9].map((x) => ({ x, y: -3 })) };

const round = (v: number) => Math.round(v * 1000) / 1000;

function drillSet(number: string, counts: number, movement: number, forms: Form[]): DemoSet {
  const positions: Record<string, DemoPosition> = {};
  for (const form of [...forms, FRONT_ENSEMBLE]) {
    if (form.labels.length !== form.points.length)
      throw new Error(`set ${number}: ${form.labels.length} performers for ${form.points.length} dots`);
    form.labels.forEach((label, i) => {
      if (positions[label]) throw new Error(`set ${number}: ${label} placed twice`);
      const p = form.points[i];
      positions[label] = { x: round(p.x), y: round(p.y), facingDeg: form.facingDeg ?? 0 };
    });
  }
  const missing = HARBOR_RIDGE_PERFORMERS.filter((p) => !positions[p.label]).map((p) => p.label);
  if (missing.length) throw new Error(`set ${number}: no dot for ${missing.join(", ")}`);
  return { number, counts, movement, positions };
}

/** The woodwinds then the brass along one form, side 1 to side 2. */
function winds(points: Point[], facingDeg = 0): Form[] {
  return [
    { labels: WW, points: points.slice(0, WW.length), facingDeg },
    { labels: BR, points: points.slice(WW.length), facingDeg },
  ];
}

const windCount = WW.length + BR.length;
const companyFront = (y: number) => row(0, y, windCount, 2); // 2-step interval: side-1 17 to side-2 17
const brassBlock = block({ x: -4, y: 17 }, 8, 4, 2).slice(0, BR.length); // trumpets in the front row
// Eight files 3 steps apart of four ranks 10 steps apart, filled file by file, so each section has players in front and back.
const deepBrass = Array.from({ length: 32 }, (_, i) => ({ x: 8 + steps(3) * Math.floor(i / 4), y: 12 + steps(10) * (i % 4) })).slice(0, BR.length);
const withoutSoloist = BR.filter((l) => l !== SOLOIST);
const brassBlockNoSolo = brassBlock.filter((_, i) => BR[i] !== SOLOIST);
const ballad = (clarinetY: number): Form[] => [
  { labels: FLUTES, points: row(-11, 12, FLUTES.length, 2) },
  { labels: CLARINETS, points: row(0, clarinetY, CLARINETS.length, 2) },
  { labels: SAXES, points: row(11, 12, SAXES.length, 2) },
];

export const HARBOR_RIDGE_SETS: DemoSet[] = [
  // Movement 1, "Harbor Lights": two blocks open into arcs, join in one arc, then the company front.
  drillSet("1", 0, 1, [
    { labels: WW, points: block({ x: -20, y: 12 }, 6, 4, 3, "files").slice(0, WW.length) },
    { labels: BR, points: block({ x: 8, y: 12 }, 8, 4, 3, "files").slice(0, BR.length) },
    { labels: BAT, points: row(0, 16, BAT.length, 2) },
  ]),
  drillSet("2", 16, 1, [
    { labels: WW, points: arc({ x: -14, y: 24 }, 10, 200, 340, WW.length) },
    { labels: BR, points: arc({ x: 14, y: 24 }, 12, 200, 340, BR.length) },
    { labels: BAT, points: block({ x: -2.86, y: 18 }, 6, 2, 2) },
  ]),
  drillSet("3", 24, 1, [...winds(arc({ x: 0, y: 6 }, 22, 160, 20, windCount)), { labels: BAT, points: row(0, 18, BAT.length, 2) }]),
  drillSet("4", 8, 1, [...winds(arc({ x: 0, y: 8 }, 21, 162, 18, windCount)), { labels: BAT, points: row(0, 19, BAT.length, 2) }]),
  drillSet("5", 24, 1, [
    { labels: WW, points: block({ x: -16, y: 14 }, 6, 4, 2, "files").slice(0, WW.length) },
    { labels: BR, points: block({ x: 2, y: 15 }, 8, 4, 2, "files").slice(0, BR.length) },
    { labels: BAT, points: block({ x: -2.86, y: 26 }, 6, 2, 2) },
  ]),
  // The wide form: a company front of all winds, 2 steps apart, about 66 yards wide.
  drillSet("6", 32, 1, [...winds(companyFront(12)), { labels: BAT, points: row(0, 16, BAT.length, 2) }]),

  // Movement 2, "Still Water": the clarinets' song in front of a brass arc.
  drillSet("7", 32, 2, [
    ...ballad(10),
    { labels: BR, points: arc({ x: 0, y: 10 }, 16, 160, 20, BR.length) },
    { labels: BAT, points: block({ x: -2.86, y: 30 }, 6, 2, 2) },
  ]),
  drillSet("7A", 8, 2, [
    ...ballad(8),
    { labels: BR, points: arc({ x: 0, y: 9 }, 16, 160, 20, BR.length) },
    { labels: BAT, points: block({ x: -2.86, y: 30 }, 6, 2, 2) },
  ]),
  drillSet("8", 24, 2, [...ballad(10), { labels: BR, points: brassBlock }, { labels: BAT, points: block({ x: -2.86, y: 30 }, 6, 2, 2) }]),
  // The trumpet solo steps out in front of the clarinets.
  drillSet("9", 16, 2, [
    ...ballad(12),
    { labels: [SOLOIST], points: [{ x: 0, y: 7 }] },
    { labels: withoutSoloist, points: brassBlockNoSolo },
    { labels: BAT, points: block({ x: -2.86, y: 30 }, 6, 2, 2) },
  ]),
  drillSet("10", 16, 2, [
    ...ballad(12).map((f) => ({ ...f, points: translate(f.points, 2, 0) })),
    { labels: BR, points: translate(brassBlock, 2, 1) },
    { labels: BAT, points: block({ x: -2.86, y: 30 }, 6, 2, 2) },
  ]),
  // Brass arc bulging toward the box, woodwinds in a wider arc behind it.
  drillSet("11", 24, 2, [
    { labels: WW, points: arc({ x: 0, y: 40 }, 20, 220, 320, WW.length) },
    { labels: BR, points: arc({ x: 0, y: 34 }, 20, 215, 325, BR.length) },
    { labels: BAT, points: row(0, 32, BAT.length, 2) },
  ]),

  // Movement 3, "Lantern Procession": a drum feature with the winds' backs to the box.
  drillSet("12", 32, 3, [
    { labels: WW, points: line({ x: -27, y: 30 }, { x: -4, y: 22 }, WW.length), facingDeg: 180 },
    { labels: BR, points: line({ x: 4, y: 22 }, { x: 34, y: 32 }, BR.length), facingDeg: 180 },
    { labels: BAT, points: block({ x: -2.86, y: 12 }, 6, 2, 2) },
  ]),
  // The brass in a deep block, its back two ranks turned upstage for the visual: the back of the field goes thin.
  drillSet("13", 32, 3, [
    { labels: WW, points: line({ x: -27, y: 22 }, { x: -4, y: 30 }, WW.length), facingDeg: 30 },
    { labels: BR.filter((_, i) => i % 4 < 2), points: deepBrass.filter((_, i) => i % 4 < 2) },
    { labels: BR.filter((_, i) => i % 4 >= 2), points: deepBrass.filter((_, i) => i % 4 >= 2), facingDeg: 180 },
    { labels: BAT, points: block({ x: -2.86, y: 8 }, 6, 2, 2) },
  ]),
  // Woodwinds forward in a block; the brass wedge opens behind them.
  drillSet("14", 32, 3, [
    { labels: WW, points: block({ x: -13, y: 8 }, 6, 4, 3, "files").slice(0, WW.length) },
    { labels: BAT, points: block({ x: -2.86, y: 13 }, 6, 2, 2) },
    { labels: BR, points: wedge({ x: 8, y: 18 }, { x: -8, y: 28 }, { x: 24, y: 28 }, BR.length) },
  ]),
  drillSet("15", 8, 3, [
    { labels: WW, points: block({ x: -13, y: 8 }, 6, 4, 3, "files").slice(0, WW.length) },
    { labels: BAT, points: block({ x: -2.86, y: 13 }, 6, 2, 2) },
    { labels: BR, points: wedge({ x: 8, y: 16 }, { x: -8, y: 26 }, { x: 24, y: 26 }, BR.length) },
  ]),
  drillSet("16", 32, 3, [...winds(companyFront(14)), { labels: BAT, points: row(0, 20, BAT.length, 2) }]),
  // The company front bows toward the box for the final chord (about 55 yards wide).
  drillSet("17", 8, 3, [...winds(arc({ x: 0, y: 60 }, 50, 240, 300, windCount)), { labels: BAT, points: row(0, 14, BAT.length, 2) }]),
];
