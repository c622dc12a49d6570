// Refactoring guard for checkConfidence's fast path (lib/acoustics/instrument-shift.ts): each likely
// case shifts one instrument's players at the point instead of evaluating the set again with that
// instrument's carryDb moved. Compared here with the slow computation it replaced (evaluate the set
// again per case, then the checks) on random bands; the checks themselves are checked against their
// sources in checks*.test.ts and confidence.test.ts.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkBalance, createSetEvaluator, DEFAULT_INSTRUMENTS, DYNAMICS, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { catalogOf, soundingPlayers } from "@/lib/acoustics/box-players";
import { checkConfidence, type CheckConfidence } from "@/lib/acoustics/confidence";
import { shiftInstrument } from "@/lib/acoustics/instrument-shift";
import { instrumentProvenance } from "@/lib/acoustics/provenance";
import { AIR, BOX } from "./helpers";

const KEYS = ["trumpet", "mellophone", "tuba", "clarinet", "flute", "alto-sax", "snare", "bass-drum"].filter((k) => k in DEFAULT_INSTRUMENTS);
const VOICE_CHOICES = ["melody", "countermelody", "accompaniment", "bass", "percussion", "tacet"] as const;

/** The computation checkConfidence did before: every case evaluates the set again with the instrument's carry moved. */
function slowConfidence(input: AnalysisInput): CheckConfidence[] {
  const one = { ...input, listeningPoints: [input.listeningPoints[0]!] };
  const run = (i: AnalysisInput) => {
    const ev = createSetEvaluator(i);
    ev.evaluate();
    const pr = ev.result().points[0]!;
    return { point: pr, checks: checkBalance(i, pr) };
  };
  const base = run(one);
  const catalog = catalogOf(input);
  const sounding = [...new Set(soundingPlayers(one, base.point).map((p) => p.instrument))].sort();
  const out = base.checks.map((c) => ({ id: c.id, confidence: "clear" as CheckConfidence["confidence"], cases: 1, sameInCases: 1, turnedBy: [] as CheckConfidence["turnedBy"] }));
  for (const key of sounding) {
    const spec = catalog[key]!;
    const u = instrumentProvenance(spec).uncertaintyDb;
    for (const shiftDb of [u, -u]) {
      const shifted = run({ ...one, instruments: { ...(input.instruments ?? {}), [key]: { ...spec, carryDb: spec.carryDb + shiftDb } } });
      shifted.checks.forEach((c, n) => {
        const o = out[n]!;
        o.cases += 1;
        if (c.passed === base.checks[n]!.passed) o.sameInCases += 1;
        else o.turnedBy.push({ instrument: key, name: spec.name, shiftDb });
      });
    }
  }
  for (const o of out) o.confidence = o.sameInCases === o.cases ? "clear" : "borderline";
  return out;
}

const performerArb = fc.record({
  instrument: fc.constantFrom(...KEYS),
  voice: fc.constantFrom(...VOICE_CHOICES),
  dynamic: fc.constantFrom(...DYNAMICS),
  x: fc.double({ min: -45, max: 45, noNaN: true }),
  y: fc.double({ min: 0, max: 48, noNaN: true }),
  facingDeg: fc.double({ min: 0, max: 360, noNaN: true }),
  strengthDb: fc.integer({ min: -6, max: 6 }),
  solo: fc.boolean(),
});
const bandArb = fc.record({
  players: fc.array(performerArb, { minLength: 1, maxLength: 14 }),
  // Uncertainties from 0.5 dB (few verdicts turn) to 8 dB (many do).
  uncertainty: fc.dictionary(fc.constantFrom(...KEYS), fc.double({ min: 0.5, max: 8, noNaN: true })),
  background: fc.constantFrom(undefined, { preset: "crowd-during-performance" as const }, { preset: "quiet-field" as const }),
  ground: fc.constantFrom(null, 0, 1),
});
type Band = typeof bandArb extends fc.Arbitrary<infer T> ? T : never;
const toInput = (b: Band): AnalysisInput => ({
  performers: b.players.map((p, i): PerformerInput => ({ id: `p${i}`, section: p.instrument, z: 1.5, ...p })),
  listeningPoints: [{ ...BOX, ...(b.background ? { background: b.background } : {}) }],
  conditions: { ...AIR, groundFactor: b.ground },
  instruments: Object.fromEntries(Object.entries(b.uncertainty).map(([k, u]) => [k, { ...DEFAULT_INSTRUMENTS[k]!, uncertaintyDb: u }])),
});

describe("checkConfidence's shifted cases against evaluating the set again (refactoring guard)", () => {
  it("a shifted instrument's players arrive exactly as the evaluator gives them with its carryDb moved; the others are untouched", () => {
    fc.assert(
      fc.property(bandArb, fc.double({ min: -8, max: 8, noNaN: true }), (b, shiftDb) => {
        const input = toInput(b);
        const run = (i: AnalysisInput) => {
          const ev = createSetEvaluator(i);
          ev.evaluate();
          return soundingPlayers(i, ev.result().points[0]!);
        };
        const key = input.performers[0]!.instrument;
        const spec = catalogOf(input)[key]!;
        const fast = shiftInstrument(run(input), key, shiftDb);
        const slow = run({ ...input, instruments: { ...input.instruments, [key]: { ...spec, carryDb: spec.carryDb + shiftDb } } });
        expect(fast.map((p) => p.id)).toEqual(slow.map((p) => p.id));
        fast.forEach((p, i) => {
          expect(p.dbA).toBeCloseTo(slow[i]!.dbA, 9);
          p.bandsDb.forEach((l, k) => (Number.isFinite(l) ? expect(l).toBeCloseTo(slow[i]!.bandsDb[k]!, 9) : expect(l).toBe(slow[i]!.bandsDb[k])));
          p.bandsE.forEach((e, k) => expect(e).toBeCloseTo(slow[i]!.bandsE[k]!, 6));
        });
      }),
      { numRuns: 60, seed: 20261202 },
    );
  });

  it("gives the same cases, verdicts and turning instruments as the slow computation on random bands, some of them borderline", () => {
    let borderline = 0;
    fc.assert(
      fc.property(bandArb, (b) => {
        const input = toInput(b);
        const fast = checkConfidence(input, BOX.id);
        expect(fast).toEqual(slowConfidence(input));
        borderline += fast.filter((c) => c.confidence === "borderline").length;
      }),
      { numRuns: 80, seed: 20261202 },
    );
    // The comparison means something only if verdicts did turn in some cases.
    expect(borderline).toBeGreaterThan(5);
  });
});
