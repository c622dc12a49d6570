// Facing in words. Directions of the field frame from shared/API.md (0 = toward the front sideline,
// 90 = toward side 2, 180 = toward the back sideline, 270 = toward side 1); the press box stands on
// the front sideline's side (README).
import { describe, expect, it } from "vitest";
import { facingInWords } from "@/lib/field/facing-words";

describe("facingInWords", () => {
  it("names the four directions without degrees", () => {
    expect(facingInWords(0)).toBe("toward the press box");
    expect(facingInWords(90)).toBe("toward side 2");
    expect(facingInWords(180)).toBe("toward the back sideline");
    expect(facingInWords(270)).toBe("toward side 1");
    expect(facingInWords(-90)).toBe("toward side 1");
    expect(facingInWords(360)).toBe("toward the press box");
  });

  it("gives degrees only as detail, leaning toward the nearer neighbour", () => {
    expect(facingInWords(30)).toBe("toward the press box, 30° toward side 2");
    expect(facingInWords(330)).toBe("toward the press box, 30° toward side 1");
    expect(facingInWords(100)).toBe("toward side 2, 10° toward the back sideline");
    expect(facingInWords(225)).toBe("toward side 1, 45° toward the back sideline");
  });
});
