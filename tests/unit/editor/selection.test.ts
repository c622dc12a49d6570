// Selection rules of the editor (common practice, no source).
import { describe, expect, it } from "vitest";
import { bandSelect, clickSelect, idsInRect } from "@/lib/editor/selection";

describe("selection", () => {
  const pts = [
    { id: "a", x: 0, y: 0 },
    { id: "b", x: 5, y: 5 },
    { id: "c", x: 10, y: 2 },
  ];
  it("takes the points in a band drawn from any corner", () => {
    expect(idsInRect(pts, { x0: 6, y0: 6, x1: -1, y1: -1 })).toEqual(["a", "b"]);
    expect(idsInRect(pts, { x0: 20, y0: 20, x1: 30, y1: 30 })).toEqual([]);
  });
  it("selects one on click and toggles with shift", () => {
    expect(clickSelect(["a", "b"], "c", false)).toEqual(["c"]);
    expect(clickSelect(["a", "b"], "c", true)).toEqual(["a", "b", "c"]);
    expect(clickSelect(["a", "b"], "a", true)).toEqual(["b"]);
  });
  it("replaces or extends the selection with a band", () => {
    expect(bandSelect(["a"], ["b"], false)).toEqual(["b"]);
    expect(bandSelect(["a", "b"], ["b", "c"], true)).toEqual(["a", "b", "c"]);
  });
});
