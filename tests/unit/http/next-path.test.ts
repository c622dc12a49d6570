// The sign-in page's `next` target: only paths of this site survive, whatever a hostile link holds.
// Resolution follows the WHATWG URL Standard (Node's URL), as a browser resolves a Location header.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/components/next-path";

const SITE = "https://farfield.example.org";

/** True when a browser on SITE that follows `target` stays on SITE. */
function staysHere(target: string): boolean {
  return /^\/(?![/\\])/.test(target) && new URL(target, SITE).origin === SITE && new URL(target, SITE + "/deep/er/page").origin === SITE;
}

describe("safeNextPath", () => {
  it("refuses the issue's case: /..//evil.example/phish becomes //evil.example/phish once resolved", () => {
    expect(safeNextPath(decodeURIComponent("%2F..%2F%2Fevil.example%2Fphish"))).toBe("/programs");
  });

  for (const hostile of ["//evil.example", "/\\evil.example", "/..//evil.example", "/./..//evil.example", "/a/../..//evil.example", "/%2e%2e//evil.example", "https://evil.example", "/\t/evil.example", "javascript:alert(1)"]) {
    it(`refuses ${JSON.stringify(hostile)}`, () => expect(safeNextPath(hostile)).toBe("/programs"));
  }

  it("keeps ordinary paths with their query and fragment", () => {
    expect(safeNextPath("/shows/abc/sets?set=3#field")).toBe("/shows/abc/sets?set=3#field");
    expect(safeNextPath("/programs/x/../y")).toBe("/programs/y");
  });

  it("answers only paths that stay on this site, for any mix of hostile pieces", () => {
    const piece = fc.constantFrom("/", "\\", "..", ".", "%2F", "%2f", "%5C", "%2e", "%2E%2E", "evil.example", "@", ":", "//", "?", "#", "\t", "\n", " ", "https:", "javascript:", "%00", "programs");
    const hostile = fc.array(piece, { maxLength: 12 }).map((parts) => parts.join(""));
    fc.assert(
      fc.property(fc.oneof(hostile, fc.string(), hostile.map((s) => "/" + s)), (input) => {
        const out = safeNextPath(input);
        expect(staysHere(out)).toBe(true);
        // Decoded once more (a router or proxy may decode the query again), it is still safe.
        const decoded = (() => {
          try {
            return decodeURIComponent(input);
          } catch {
            return input;
          }
        })();
        expect(staysHere(safeNextPath(decoded))).toBe(true);
      }),
      { numRuns: 3000 },
    );
  });
});
