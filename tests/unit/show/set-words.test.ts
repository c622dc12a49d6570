// Set lists in words: one set is "Set 6", never "Sets 6".
import { describe, expect, it } from "vitest";
import { setListWords } from "@/lib/show/set-words";

describe("setListWords", () => {
  it("says Set for one and Sets for more", () => {
    expect(setListWords(["6"])).toBe("Set 6");
    expect(setListWords(["6", "7"])).toBe("Sets 6 and 7");
    expect(setListWords(["6", "7", "12A"])).toBe("Sets 6, 7 and 12A");
    expect(setListWords([])).toBe("");
  });
});
