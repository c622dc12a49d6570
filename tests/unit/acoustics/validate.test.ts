// validate.ts alone: each check of the analysis input refuses what it should with a message that
// names the field and says what is wanted, and accepts the edge cases a person may send (a height
// of 0, a ground factor left null). The API answers 400 with these messages, so their words matter.
import { describe, expect, it } from "vitest";
import { validateConditions, validateListeningPoints, validatePerformers } from "@/lib/acoustics/validate";
import type { ListeningPointInput, PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, performer } from "./helpers";

// The catalog as the evaluator passes it, reduced to one instrument.
const onlyTrumpet = (key: string) => key === "trumpet";
const band = (...changes: object[]): PerformerInput[] =>
  changes.map((c, i) => ({ ...performer({ id: `P${i}`, x: 3 * i }), ...c }) as PerformerInput);
const points = (...changes: object[]): ListeningPointInput[] => changes.map((c, i) => ({ ...BOX, id: `pt${i}`, ...c }) as ListeningPointInput);

describe("validateConditions", () => {
  it("takes a between-stands ground factor left null as none given", () => {
    expect(() => validateConditions({ ...AIR, betweenGroundFactor: null })).not.toThrow();
    expect(() => validateConditions({ ...AIR, betweenGroundFactor: undefined })).not.toThrow();
    expect(() => validateConditions({ ...AIR, betweenGroundFactor: 1.01 })).toThrow(/^conditions\.betweenGroundFactor must be between 0 and 1$/);
  });
});

describe("validatePerformers", () => {
  it("refuses a list that is not an array, by name", () => {
    // A string has a length and indexable characters: without the array check it would be read as performers.
    expect(() => validatePerformers("band" as never, onlyTrumpet)).toThrow(/^performers must be an array$/);
    expect(() => validatePerformers({ length: 0 } as never, onlyTrumpet)).toThrow(/^performers must be an array$/);
  });

  it("refuses a performer that is null or not an object, naming its index alone", () => {
    expect(() => validatePerformers([...band({}), null] as never, onlyTrumpet)).toThrow(/^performers\[1\] must be an object$/);
    expect(() => validatePerformers([7] as never, onlyTrumpet)).toThrow(/^performers\[0\] must be an object$/);
  });

  it("refuses an id or section that is missing, not a string or empty", () => {
    for (const id of [undefined, 12, ""]) {
      expect(() => validatePerformers(band({}, { id }), onlyTrumpet)).toThrow(/^performers\[1\]\.id must be a non-empty string$/);
    }
    for (const section of [undefined, 3, ""]) {
      expect(() => validatePerformers(band({ section }), onlyTrumpet)).toThrow(/^performers\[0\]\.section must be a non-empty string$/);
    }
  });

  it("refuses an instrument that is not a string even where the catalog would say yes", () => {
    expect(() => validatePerformers(band({ instrument: 5 }), () => true)).toThrow(/^performers\[0\]\.instrument "5" is not in the instrument catalog$/);
    expect(() => validatePerformers(band({ instrument: "tuba" }), onlyTrumpet)).toThrow(/^performers\[0\]\.instrument "tuba" is not in the instrument catalog$/);
  });

  it("lists the allowed voices and dynamics, readably, when one is unknown", () => {
    expect(() => validatePerformers(band({ voice: "solo" }), onlyTrumpet)).toThrow(
      /^performers\[0\]\.voice must be one of melody, countermelody, accompaniment, bass, percussion, tacet$/,
    );
    expect(() => validatePerformers(band({ dynamic: "loud" }), onlyTrumpet)).toThrow(/^performers\[0\]\.dynamic must be one of pp, p, mp, mf, f, ff, fff$/);
  });

  it("height: optional, a finite number, 0 (on the ground) accepted and below it refused", () => {
    expect(() => validatePerformers(band({ z: 0 }, { z: 2.5 }, {}), onlyTrumpet)).not.toThrow();
    for (const z of [Number.NaN, Infinity, "1.5"]) {
      expect(() => validatePerformers(band({}, { z }), onlyTrumpet)).toThrow(/^performers\[1\]\.z must be a finite number$/);
    }
    expect(() => validatePerformers(band({ z: -0.01 }), onlyTrumpet)).toThrow(/^performers\[0\]\.z must not be negative$/);
  });
});

describe("validateListeningPoints", () => {
  it("refuses a list that is not an array, by name", () => {
    expect(() => validateListeningPoints(BOX as never)).toThrow(/^listeningPoints must be an array$/);
  });

  it("refuses a point that is null or not an object, naming its index", () => {
    expect(() => validateListeningPoints([BOX, null] as never)).toThrow(/^listeningPoints\[1\] must be an object$/);
    expect(() => validateListeningPoints(["box"] as never)).toThrow(/^listeningPoints\[0\] must be an object$/);
  });

  it("refuses an id that is missing, not a string or empty", () => {
    for (const id of [undefined, 4, ""]) {
      expect(() => validateListeningPoints(points({}, { id }))).toThrow(/^listeningPoints\[1\]\.id must be a non-empty string$/);
    }
  });

  it("names the coordinate that is not a finite number", () => {
    expect(() => validateListeningPoints(points({ x: Number.NaN }))).toThrow(/^listeningPoints\[0\]\.x must be a finite number$/);
    expect(() => validateListeningPoints(points({}, { y: "40" }))).toThrow(/^listeningPoints\[1\]\.y must be a finite number$/);
  });

  it("a point on the ground (z 0) and surroundings of 0 m are accepted; below 0 is refused by name", () => {
    expect(() => validateListeningPoints(points({ z: 0, surroundingsM: 0 }))).not.toThrow();
    expect(() => validateListeningPoints(points({ surroundingsM: -0.5 }))).toThrow(/^listeningPoints\[0\]\.surroundingsM must not be negative$/);
    expect(() => validateListeningPoints(points({ surroundingsM: Number.NaN }))).toThrow(/^listeningPoints\[0\]\.surroundingsM must be a finite number$/);
  });

  it("takes a ground factor left null as none given", () => {
    expect(() => validateListeningPoints(points({ groundFactor: null }, { groundFactor: 0.5 }))).not.toThrow();
  });

  it("refuses two points with one id, naming the second", () => {
    expect(() => validateListeningPoints(points({ id: "box" }, { id: "field" }, { id: "box" }))).toThrow(/^listeningPoints\[2\]\.id "box" is used twice$/);
  });
});
