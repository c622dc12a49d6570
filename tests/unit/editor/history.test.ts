// Undo and redo: the usual editor contract (common practice, no source).
import { describe, expect, it } from "vitest";
import { canRedo, canUndo, commit, historyOf, redo, undo } from "@/lib/editor/history";

describe("history", () => {
  it("undoes and redoes edits in order, and a new edit drops the redo branch", () => {
    let h = historyOf("a");
    h = commit(h, "b");
    h = commit(h, "c");
    expect(canUndo(h)).toBe(true);
    h = undo(h);
    expect(h.present).toBe("b");
    h = undo(h);
    expect(h.present).toBe("a");
    expect(canUndo(h)).toBe(false);
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present).toBe("b");
    expect(canRedo(h)).toBe(true);
    h = commit(h, "d");
    expect(canRedo(h)).toBe(false);
    expect(redo(h)).toBe(h);
    expect(undo(h).present).toBe("b");
  });

  it("ignores a commit of the same snapshot and forgets the oldest past the limit", () => {
    const s = { n: 1 };
    let h = historyOf(s);
    expect(commit(h, s)).toBe(h);
    for (let i = 0; i < 10; i++) h = commit(h, { n: i + 2 }, 3);
    expect(h.past).toHaveLength(3);
    expect(h.past[0]).toEqual({ n: 8 });
  });
});
