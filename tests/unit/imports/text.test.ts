// Upload text: UTF-8 (with or without a byte-order mark) is read; binary, UTF-16 and Latin-1 are refused.
import { describe, expect, it } from "vitest";
import { decodeUploadText } from "@/lib/imports/text";

describe("decodeUploadText", () => {
  it("reads UTF-8, keeping non-ASCII letters", () => {
    expect(decodeUploadText(new TextEncoder().encode("label,name\nT1,Zoë\n"))).toEqual({ ok: true, text: "label,name\nT1,Zoë\n" });
  });
  it.each([
    ["UTF-16 with a byte-order mark", [0xff, 0xfe, 0x6c, 0x00], /UTF-16/],
    ["binary with a NUL", [0x50, 0x4b, 0x03, 0x04, 0x00], /not a text file/],
    ["Latin-1 é (0xE9 alone is never UTF-8)", [0x6c, 0x0a, 0xe9, 0x0a], /not UTF-8/],
  ])("refuses %s", (_what, bytes, reason) => {
    const r = decodeUploadText(Uint8Array.from(bytes));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});
