// The plan's loudness model against a full evaluation. The plan reads each group's loudness level off a
// curve: the group's written octave spectrum moved as a whole by its change of energy. A full evaluation
// instead puts every player at its planned dynamic (the instrument's own spectrum at that dynamic,
// propagated to the point) and computes ISO 532-1 loudness of the summed levels. The two must agree at
// the plan the solver returns, or the plan is tuned to levels nobody will hear. With a one-phon-per-dB
// model, a soft clarinet melody under a brass chorale was raised four steps and still called "under".
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeSet, applyPlan, checkBalance, solveBalancePlan, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { soundingPlayers } from "@/lib/acoustics/box-players";
import { groupLoudness, octaveLoudness } from "@/lib/acoustics/group-loudness";
import { planProblem } from "@/lib/acoustics/plan";
import { levelOfEnergy, levelsAtSteps } from "@/lib/acoustics/plan-model";
import { DYNAMICS } from "@/lib/acoustics/types";
import { AIR, BOX, facingToward, performer } from "./helpers";
import { randomCase } from "./plan-cases";

/** Each target group's loudness level (phon) as the plan predicts it and as a full evaluation gives it, at the plan's steps. */
function predictedAndEvaluated(input: AnalysisInput, limits?: Parameters<typeof solveBalancePlan>[4]) {
  const plan = solveBalancePlan([input], BOX.id, null, undefined, limits);
  const p = planProblem([input], BOX.id, null, limits);
  const k = p.model.units.map((u) => DYNAMICS.indexOf(plan.entries.find((e) => e.section === u.section)!.playedDynamic) - u.base);
  const predicted = levelsAtSteps(p.model, k);
  const played = applyPlan(input, plan.entries);
  const point = analyzeSet(played).points[0]!;
  const players = soundingPlayers(played, point);
  // The model's players are listed set by set in the order soundingPlayers gives them: the same order here.
  const evaluated = p.model.groups.map((members) => groupLoudness(members.map((i) => ({ bandsDb: players[i]!.bandsDb }))).phon);
  return { plan, predicted: [...predicted], evaluated, played, point, isLoudness: p.model.isLoudness };
}

describe("the balance plan's loudness levels", () => {
  // Where they differ, it is because an instrument's spectrum changes shape with its dynamic (brighter
  // when loud), which the curve's whole-spectrum shift leaves out; a one-phon-per-dB model missed by up to 18 phon here.
  it("match a full evaluation at the plan over 300 seeded bands (2–5 sections, mixed registers): 95 % within 1 phon, all within 2.5", () => {
    const errors: number[] = [];
    for (let seed = 1; seed <= 300; seed++) {
      const { input, limits } = randomCase(seed);
      const { predicted, evaluated, isLoudness } = predictedAndEvaluated(input, limits);
      predicted.forEach((phon, g) => {
        // A silent group has no level to compare; a voice's margin over what masks it is a change of energy, not a loudness level.
        if (evaluated[g]! > 0 && isLoudness[g]) errors.push(Math.abs(phon - evaluated[g]!));
      });
    }
    errors.sort((a, b) => a - b);
    const p95 = errors[Math.floor(0.95 * errors.length)]!;
    console.log(`plan loudness model vs full evaluation over ${errors.length} groups: 95 % within ${p95.toFixed(2)} phon, worst ${errors.at(-1)!.toFixed(2)}`);
    expect(errors.length).toBeGreaterThan(300);
    expect(p95).toBeLessThan(1);
    expect(errors.at(-1)!).toBeLessThan(2.5);
  });

  it("hold at the ends of what the sections can play: a level read beyond them is the curve's first or last point", () => {
    // The first seeded band with targets to plan for (a band that passes every check as written has none).
    const m = Array.from({ length: 50 }, (_, seed) => randomCase(seed + 1))
      .map(({ input, limits }) => planProblem([input], BOX.id, null, limits).model)
      .find((model) => model.groups.length > 0)!;
    expect(m.groups.length).toBeGreaterThan(0);
    const steps = (pick: "kMin" | "kMax") => m.units.map((u) => u[pick]);
    const softest = levelsAtSteps(m, steps("kMin"));
    const loudest = levelsAtSteps(m, steps("kMax"));
    m.groups.forEach((_, g) => {
      const written = 10 ** (m.writtenDb[g]! / 10);
      expect(levelOfEnergy(m, g, written * 1e-6)).toBeLessThanOrEqual(softest[g]! + 1e-9);
      expect(Number.isFinite(levelOfEnergy(m, g, written * 1e-6))).toBe(true);
      expect(levelOfEnergy(m, g, written * 1e6)).toBeGreaterThanOrEqual(loudest[g]! - 1e-9);
      expect(Number.isFinite(levelOfEnergy(m, g, written * 1e6))).toBe(true);
    });
  });

  it("bring a soft, far clarinet melody over a brass chorale as far as the target and no further", () => {
    // Nine clarinets at p deep on the field, under trumpets and trombones at mp nearer the box.
    const clarinets = Array.from({ length: 9 }, (_, i) => ({ x: -8 + i * 2, y: 40 }));
    const brass = Array.from({ length: 12 }, (_, i) => ({ x: -11 + i * 2, y: 20 }));
    const band: PerformerInput[] = [
      ...clarinets.map((c, i) => performer({ id: `C${i}`, ...c, instrument: "clarinet", section: "Clarinets", voice: "melody", dynamic: "p", facingDeg: facingToward(c.x, c.y, BOX.x, BOX.y) })),
      ...brass.map((b, i) =>
        performer({ id: `B${i}`, ...b, instrument: i % 2 ? "trombone" : "trumpet", section: i % 2 ? "Trombones" : "Trumpets", voice: "accompaniment", dynamic: "mp", facingDeg: facingToward(b.x, b.y, BOX.x, BOX.y) }),
      ),
    ];
    const input: AnalysisInput = { performers: band, listeningPoints: [BOX], conditions: AIR };
    const before = checkBalance(input, analyzeSet(input).points[0]!).find((c) => c.id === "melody-forward")!;
    expect(before.passed).toBe(false);
    const { plan, played, point } = predictedAndEvaluated(input, { windSteps: 4, percussionSteps: 1, keepShape: true });
    const after = checkBalance(played, point).find((c) => c.id === "melody-forward")!;
    // The plan says the lead is met, and played, it is: within a step's reach of the 3 dB target, not far past it.
    expect(plan.unmet).toEqual([]);
    expect(after.passed).toBe(true);
    const lead = point.loudness!.voices.melody!.phon - point.loudness!.voices.accompaniment!.phon;
    expect(lead).toBeGreaterThanOrEqual(3 - 0.1);
    expect(lead).toBeLessThan(3 + 4);
  });
});

// The search's bound holds only if a group's loudness never falls as its level rises as a whole
// (in ISO 532-1's method specific loudness grows with excitation in every critical band; from memory).
it("a spectrum raised as a whole is never less loud (the search's bound relies on it)", () => {
  fc.assert(
    fc.property(fc.array(fc.double({ min: -10, max: 110, noNaN: true }), { minLength: 8, maxLength: 8 }), fc.double({ min: 0, max: 30, noNaN: true }), (bands, rise) => {
      expect(octaveLoudness(bands.map((b) => b + rise)).phon).toBeGreaterThanOrEqual(octaveLoudness(bands).phon - 1e-9);
    }),
    { numRuns: 300 },
  );
});
