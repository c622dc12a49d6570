// Field pictures' labels never overlap: a block of 72 dots two steps apart (the densest a band
// marches, common practice), a tight arc, and dots on one spot, laid out at the PDF's scale.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { boxesOverlap, labelCollisions, layoutLabels, type LabelDot } from "@/lib/sheets/label-layout";

// Letter paper less margins: 532 pt for 120 yards of field, 0.5715 m a step → 2.53 pt a step.
const PT_PER_M = 532 / 109.728;
const STEP_PT = 0.5715 * PT_PER_M;
const bounds = { x: 0, y: 0, w: 532, h: 48.768 * PT_PER_M + 30 };
const opts = { fontSize: 5.5, dotRadius: 2.2, bounds };

function block(rows: number, cols: number, spacingSteps: number): LabelDot[] {
  const dots: LabelDot[] = [];
  for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) dots.push({ label: `T${r * cols + c + 1}`, x: 200 + c * spacingSteps * STEP_PT, y: 60 + r * spacingSteps * STEP_PT });
  return dots;
}

describe("layoutLabels", () => {
  it("keeps 72 labels of a block two steps apart off each other and off every dot", () => {
    const labels = layoutLabels(block(6, 12, 2), opts);
    expect(labels).toHaveLength(72);
    expect(labelCollisions(labels, opts.dotRadius)).toEqual([]);
    // Too dense to sit beside every dot: some labels stand away, on a leader line.
    expect(labels.some((l) => l.leader)).toBe(true);
  });

  it("keeps a label beside a lone dot, without a leader", () => {
    const [only] = layoutLabels([{ label: "S1", x: 100, y: 100 }], opts);
    expect(only!.leader).toBe(false);
    expect(only!.box.x).toBeGreaterThan(100);
    expect(Math.abs(only!.box.y + only!.box.h / 2 - 100)).toBeLessThan(1);
  });

  it("separates labels of dots that share one spot", () => {
    const same = ["A1", "A2", "A3", "A4"].map((label) => ({ label, x: 300, y: 100 }));
    const labels = layoutLabels(same, opts);
    for (let i = 0; i < labels.length; i++) for (let j = i + 1; j < labels.length; j++) expect(boxesOverlap(labels[i]!.box, labels[j]!.box)).toBe(false);
  });

  it("never overlaps for any band of up to 80 on the field (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.record({ x: fc.double({ min: 20, max: 510, noNaN: true }), y: fc.double({ min: 10, max: 230, noNaN: true }) }), { minLength: 1, maxLength: 80 }), (pts) => {
        const labels = layoutLabels(pts.map((p, i) => ({ label: `P${i + 1}`, ...p })), opts);
        const pairs = labelCollisions(labels, opts.dotRadius).filter((c) => !c.includes("dot"));
        expect(pairs).toEqual([]);
      }),
      { numRuns: 30 },
    );
  });
});
