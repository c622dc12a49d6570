// directivity.ts at its edges: the errors name the field, a reading never leaves the table, and
// an angle from a cosine that rounding pushes a hair past ±1 is still 0° or 180°, never NaN.
import { describe, expect, it } from "vitest";
import { angleFromFacingDeg, compileDirectivity, directivityDb, directivityInto } from "@/lib/acoustics/directivity";
import { handSource } from "./helpers";

// Every band 0, −3, −6 dB at 0°, 90°, 180° except band 3: 0, −4, −10 dB.
const table = () => ({
  anglesDeg: [0, 90, 180],
  bandsDb: Array.from({ length: 8 }, (_, b) => (b === 3 ? [0, -4, -10] : [0, -3, -6])),
});

describe("compileDirectivity", () => {
  it("refuses a missing table as having no angles, naming the field", () => {
    expect(() => compileDirectivity(undefined as never, "instruments.tuba.directivity")).toThrow(/^instruments\.tuba\.directivity\.anglesDeg must list at least two angles$/);
    expect(() => compileDirectivity(null as never, "d")).toThrow(/^d\.anglesDeg must list at least two angles$/);
  });

  it("names the angle that is not a number", () => {
    expect(() => compileDirectivity({ ...table(), anglesDeg: [0, Number.NaN, 180] }, "d")).toThrow(/^d\.anglesDeg\[1\] must be a finite number$/);
  });
});

describe("directivityInto", () => {
  it("reads the last segment for an angle a hair past 180°, never past the table's end", () => {
    const out = new Float64Array(8);
    directivityInto(out, compileDirectivity(table(), "d"), 180 + 1e-9);
    // Extending the 90°…180° segment by 1e-9°: −10 − 6·1e-9/90 in band 3, −6 − 3·1e-9/90 elsewhere.
    expect(out[3]).toBeCloseTo(-10, 6);
    expect(out[0]).toBeCloseTo(-6, 6);
  });
});

describe("angleFromFacingDeg", () => {
  // Facing (1, 6)/|(1, 6)| toward a listener at (1, 6): the dot product over r rounds to
  // 1.0000000000000007 in double precision, and to −1.0000000000000007 facing away.
  const r = Math.hypot(1, 6);
  it("straight ahead is 0° even when rounding puts the cosine above 1", () => {
    expect(angleFromFacingDeg(1 / r, 6 / r, 1, 6, r)).toBe(0);
  });
  it("straight behind is 180° even when rounding puts the cosine below −1", () => {
    expect(angleFromFacingDeg(-1 / r, -6 / r, 1, 6, r)).toBeCloseTo(180, 12);
  });
});

describe("directivityDb", () => {
  const spec = () => ({ ...handSource([90, 90, 90, 90, 90, 90, 90, 90]), directivity: table() });
  it("refuses an angle that is not a number, by name", () => {
    expect(() => directivityDb(spec(), 3, Number.NaN)).toThrow(/^angleDeg must be a finite number$/);
  });
  it("names the instrument's table when it is broken", () => {
    expect(() => directivityDb({ ...spec(), directivity: { ...table(), anglesDeg: [0, 200] } }, 3, 10)).toThrow(/^directivity\.anglesDeg must run from 0 to 180$/);
  });
});
