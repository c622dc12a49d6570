// The provenance markers of the code, said in plain words on the sources page.
import { describe, expect, it } from "vitest";
import { plainSource } from "@/lib/sources/plain-source";

describe("plainSource", () => {
  it("says a rule of thumb and an unchecked estimate in plain words, keeping the named source", () => {
    expect(plainSource("40 yards; common practice, no source")).toBe("40 yards; a rule of thumb of the trade, with no published source");
    expect(plainSource("ISO/IEC 11172-3 masking, less a few dB for direction (from memory)")).toBe(
      "ISO/IEC 11172-3 masking, less a few dB for direction (an estimate not yet checked against a published source)",
    );
    expect(plainSource("from memory")).toBe("an estimate not yet checked against a published source");
    expect(plainSource("ISO 9613-2 §7.3.1")).toBe("ISO 9613-2 §7.3.1");
    for (const t of ["common practice, no source", "G = 0.5, from memory (turf)", "no source"]) expect(plainSource(t)).not.toMatch(/from memory|no source/i);
  });
});
