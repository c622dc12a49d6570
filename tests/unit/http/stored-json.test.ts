// Splicing fields into stored JSON text: checked against JSON.parse of the whole (ECMA-404 grammar, as
// Node's JSON implements it), for any fields and any stored object, compact or spaced as jsonb prints it.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { jsonWithStoredObject } from "@/lib/http/stored-json";

const key = fc.string({ minLength: 1, maxLength: 8 });
const value = fc.jsonValue({ maxDepth: 3 });

describe("jsonWithStoredObject", () => {
  it("is the JSON of the fields followed by the stored members", () => {
    fc.assert(
      fc.property(fc.dictionary(key, value), fc.dictionary(key, value), fc.boolean(), (fields, stored, spaced) => {
        const prefixed = Object.fromEntries(Object.entries(stored).map(([k, v]) => [`s_${k}`, v])); // keys apart from the fields'
        const text = spaced ? ` ${JSON.stringify(prefixed, null, 2)}\n` : JSON.stringify(prefixed);
        expect(JSON.parse(jsonWithStoredObject(fields, text))).toEqual(JSON.parse(JSON.stringify({ ...fields, ...prefixed })));
      }),
    );
  });

  it("handles empty fields and an empty stored object", () => {
    expect(jsonWithStoredObject({}, "{}")).toBe("{}");
    expect(jsonWithStoredObject({ a: 1 }, "{ }")).toBe('{"a":1}');
    expect(jsonWithStoredObject({}, '{"b": 2}')).toBe('{"b": 2}');
  });

  it("refuses stored text that is not an object", () => {
    expect(() => jsonWithStoredObject({ a: 1 }, "[1,2]")).toThrow(/not a JSON object/);
    expect(() => jsonWithStoredObject({ a: 1 }, "null")).toThrow(/not a JSON object/);
  });
});
