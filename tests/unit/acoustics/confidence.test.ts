// How sure a box mix and its checks are, across the catalog's uncertainty (lib/acoustics/confidence.ts).
import { describe, expect, it } from "vitest";
import { checkConfidence, levelUncertainty } from "@/lib/acoustics/confidence";
import { analyzeSet, type AnalysisInput } from "@/lib/acoustics";
import { instrumentProvenance, MEMORY_UNCERTAINTY_DB, shownPrecisionDb } from "@/lib/acoustics/provenance";
import { AIR, BOX, handSource, performer } from "./helpers";

const FLAT = (db: number) => handSource([db, db, db, db, db, db, db, db]);

function input(instruments: AnalysisInput["instruments"], players: { id: string; instrument: string; voice: "melody" | "accompaniment"; section: string }[]): AnalysisInput {
  return {
    performers: players.map((p) => performer({ ...p, x: 0, y: 10 })),
    listeningPoints: [BOX],
    conditions: AIR,
    instruments,
  };
}

describe("levelUncertainty (GUM JCGM 100:2008 §5.1.2 eq. 10, sensitivity Ek/E)", () => {
  it("two players of one instrument share its error: the total is as uncertain as the instrument (5 dB)", () => {
    const i = input({ a: FLAT(90) }, [
      { id: "1", instrument: "a", voice: "melody", section: "S" },
      { id: "2", instrument: "a", voice: "melody", section: "S" },
    ]);
    const u = levelUncertainty(i, analyzeSet(i).points[0]);
    expect(u.totalDb).toBeCloseTo(MEMORY_UNCERTAINTY_DB, 9);
  });

  it("two equally loud instruments with independent 5 dB errors: 5/√2 = 3.536 dB on the total; a voice of one alone keeps 5", () => {
    const i = input({ a: FLAT(90), b: FLAT(90) }, [
      { id: "1", instrument: "a", voice: "melody", section: "A" },
      { id: "2", instrument: "b", voice: "accompaniment", section: "B" },
    ]);
    const u = levelUncertainty(i, analyzeSet(i).points[0]);
    expect(u.totalDb).toBeCloseTo(3.5355, 3);
    expect(u.voices.melody).toBeCloseTo(5, 9);
    expect(u.sections.B).toBeCloseTo(5, 9);
    expect(u.precisionDb).toBe(1);
  });

  it("an instrument 10 dB under another adds little: √((10/11·1)² + (1/11·5)²) = 1.0101 dB with 1 and 5 dB", () => {
    // Energies 10 : 1, shares 10/11 and 1/11 (hand calculation).
    const i = input({ a: { ...FLAT(100), uncertaintyDb: 1 }, b: FLAT(90) }, [
      { id: "1", instrument: "a", voice: "melody", section: "A" },
      { id: "2", instrument: "b", voice: "accompaniment", section: "B" },
    ]);
    expect(levelUncertainty(i, analyzeSet(i).points[0]).totalDb).toBeCloseTo(Math.hypot(10 / 11, 5 / 11), 4);
  });
});

describe("provenance of catalog values", () => {
  it("a default instrument is from memory at 5 dB; a fitted one says from how many readings, with the fit's error", () => {
    const p = instrumentProvenance(FLAT(90));
    expect(p.kind).toBe("memory");
    expect(p.uncertaintyDb).toBe(MEMORY_UNCERTAINTY_DB);
    const f = instrumentProvenance({ ...FLAT(90), fit: { readings: 3, stdErrorDb: 1.4 } });
    expect(f).toEqual({ kind: "fitted", text: "fitted from 3 box readings", uncertaintyDb: 1.4 });
    expect(instrumentProvenance({ ...FLAT(90), fit: { readings: 1, stdErrorDb: 2 } }).text).toBe("fitted from 1 box reading");
  });

  it("shows whole dB from 1 dB of uncertainty up, tenths below", () => {
    expect(shownPrecisionDb(0.99)).toBe(0.1);
    expect(shownPrecisionDb(1)).toBe(1);
  });
});

describe("checkConfidence: clear or borderline across the likely cases", () => {
  // melody-forward needs a 3 dB lead (targets.ts). Both players at one spot, flat spectra, so the
  // lead at the box is the difference of their sound powers.
  const run = (melodyDb: number) =>
    checkConfidence(
      input({ mel: FLAT(melodyDb), acc: { ...FLAT(90), uncertaintyDb: 1 } }, [
        { id: "M", instrument: "mel", voice: "melody", section: "Mel" },
        { id: "A", instrument: "acc", voice: "accompaniment", section: "Acc" },
      ]),
      BOX.id,
    ).find((c) => c.id === "melody-forward")!;

  it("a 10 dB lead holds whatever the melody (±5) and the accompaniment (±1) do: clear in all 5 cases", () => {
    expect(run(100)).toEqual({ id: "melody-forward", confidence: "clear", cases: 5, sameInCases: 5, turnedBy: [] });
  });

  it("a 6 dB lead passes as it is but fails with the melody 5 dB softer (1 dB lead): borderline, naming it", () => {
    const c = run(96);
    expect(c.confidence).toBe("borderline");
    expect(c.sameInCases).toBe(4);
    expect(c.turnedBy).toEqual([{ instrument: "mel", name: "hand source", shiftDb: -5 }]);
  });

  it("a melody 10 dB under the accompaniment fails in every likely case: a clear failure", () => {
    expect(run(80).confidence).toBe("clear");
  });
});
