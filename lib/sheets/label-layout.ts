// Labels of a field picture placed apart: each label goes to the nearest free spot around its dot
// (rings of growing distance, sixteen directions each), never over another label or a dot, and
// gets a leader line when it had to move away from its dot. Units are the caller's (points on
// paper, metres on screen). Pure; the PDF and the on-screen sheets share it.

export interface LabelDot {
  label: string;
  /** Centre of the dot, in drawing units (y grows downward, as on paper and in SVG). */
  x: number;
  y: number;
}

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface PlacedLabel {
  label: string;
  dotX: number;
  dotY: number;
  /** Where the label's text sits (top-left, width and height). */
  box: Box;
  /** Draw a line from the dot to the box: the label stands away from its dot. */
  leader: boolean;
}

export interface LabelLayoutOptions {
  /** Height of a label's text (its font size). */
  fontSize: number;
  /** Radius of a dot. */
  dotRadius: number;
  /** Area the labels must stay in. */
  bounds: Box;
  /** Width of one character as a share of the font size (0.62 covers Helvetica's capitals and digits). */
  charWidth?: number;
  /** Free space kept around every label. */
  gap?: number;
}

/** True when two boxes share any area. */
export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

const DIRECTIONS = Array.from({ length: 16 }, (_, i) => {
  // Right first (the usual place of a label), then up-right, up, …
  const a = (-i * Math.PI) / 8;
  return [Math.cos(a), Math.sin(a)] as const;
});

/** Places every dot's label; labels never overlap each other or any dot while room allows. */
export function layoutLabels(dots: readonly LabelDot[], options: LabelLayoutOptions): PlacedLabel[] {
  const { fontSize, dotRadius, bounds } = options;
  const charWidth = options.charWidth ?? 0.62;
  const gap = options.gap ?? fontSize * 0.15;
  const dotBoxes: Box[] = dots.map((d) => ({ x: d.x - dotRadius, y: d.y - dotRadius, w: 2 * dotRadius, h: 2 * dotRadius }));
  const placed: Box[] = [];
  const inside = (b: Box) => b.x >= bounds.x && b.y >= bounds.y && b.x + b.w <= bounds.x + bounds.w && b.y + b.h <= bounds.y + bounds.h;
  const padded = (b: Box): Box => ({ x: b.x - gap, y: b.y - gap, w: b.w + 2 * gap, h: b.h + 2 * gap });
  const free = (b: Box) => inside(b) && !placed.some((p) => boxesOverlap(padded(b), p)) && !dotBoxes.some((d) => boxesOverlap(padded(b), d));

  // Crowded dots first: they have the fewest free spots.
  const near = (i: number) => dots.filter((d, j) => j !== i && Math.hypot(d.x - dots[i]!.x, d.y - dots[i]!.y) < fontSize * 4).length;
  const order = dots.map((_, i) => ({ i, crowd: near(i) })).sort((a, b) => b.crowd - a.crowd || a.i - b.i);

  const out: PlacedLabel[] = new Array(dots.length);
  const maxRing = Math.max(bounds.w, bounds.h);
  for (const { i } of order) {
    const d = dots[i]!;
    const w = Math.max(1, d.label.length) * charWidth * fontSize;
    const h = fontSize;
    let chosen: Box | null = null;
    let ringDistance = 0;
    for (let r = dotRadius + gap; r <= maxRing && !chosen; r += fontSize * 0.5) {
      for (const [cx, cy] of DIRECTIONS) {
        // The box's centre sits so that its near edge is r from the dot's centre in this direction.
        const reach = Math.min(Math.abs(cx) > 1e-9 ? w / 2 / Math.abs(cx) : Infinity, Math.abs(cy) > 1e-9 ? h / 2 / Math.abs(cy) : Infinity);
        const mx = d.x + cx * (r + reach);
        const my = d.y + cy * (r + reach);
        const box = { x: mx - w / 2, y: my - h / 2, w, h };
        if (free(box)) {
          chosen = box;
          ringDistance = r;
          break;
        }
      }
    }
    // No room anywhere (more labels than the area holds): beside the dot, and the caller's test says so.
    const box = chosen ?? { x: d.x + dotRadius + gap, y: d.y - h / 2, w, h };
    placed.push(box);
    out[i] = { label: d.label, dotX: d.x, dotY: d.y, box, leader: ringDistance > dotRadius + gap + fontSize * 0.6 };
  }
  return out;
}

/** Pairs of labels whose boxes overlap, and labels that cover a dot (for tests and a last check). */
export function labelCollisions(labels: readonly PlacedLabel[], dotRadius: number): string[] {
  const found: string[] = [];
  for (let i = 0; i < labels.length; i++) {
    for (let j = i + 1; j < labels.length; j++) if (boxesOverlap(labels[i]!.box, labels[j]!.box)) found.push(`${labels[i]!.label} over ${labels[j]!.label}`);
    for (const d of labels) {
      const dot = { x: d.dotX - dotRadius, y: d.dotY - dotRadius, w: 2 * dotRadius, h: 2 * dotRadius };
      if (boxesOverlap(labels[i]!.box, dot)) found.push(`${labels[i]!.label} over the dot of ${d.label}`);
    }
  }
  return found;
}
