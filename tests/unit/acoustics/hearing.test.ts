import { describe, expect, it } from "vitest";
import { hearingMap, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { AIR, handSource, lazy, performer } from "./helpers";

const drum = (over: Partial<PerformerInput> = {}): PerformerInput =>
  performer({ id: "BD", instrument: "bass-drum", section: "bass drums", voice: "percussion", dynamic: "ff", x: 0, y: 20, facingDeg: 0, ...over });
const listener = (id: string, x: number, y = 20): PerformerInput => performer({ id, instrument: "trumpet", section: "trumpets", voice: "tacet", x, y, facingDeg: 0 });
const set = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [], conditions: AIR });
const byId = (m: ReturnType<typeof hearingMap>, id: string) => m.performers.find((p) => p.id === id)!;

describe("hearing map: levels at the ears", () => {
  // Near T1 (one step and a bit, 1.2 m to the side) and far T2 (20 m to the side), both tacet.
  const map = lazy(() => hearingMap(set([drum(), listener("T1", 1.2), listener("T2", 20)]), { rehearsalMinutes: 120 }));

  it("makes a performer next to a bass drum more exposed than one 20 m away", () => {
    expect(byId(map(), "T1").dbA).toBeGreaterThan(byId(map(), "T2").dbA + 20);
    expect(byId(map(), "T1").loudestSourceId).toBe("BD");
    expect(byId(map(), "T1").exposure.niosh.dose).toBeGreaterThan(byId(map(), "T2").exposure.niosh.dose);
  });

  it("falls off with the inverse-square law between them (−20·lg(r2/r1); Everest & Pohlmann, Master Handbook of Acoustics, ch. 3), air and directivity aside", () => {
    // 3-D distances from the drum (source 1.5 m) to ears at 1.6 m.
    const r1 = Math.hypot(1.2, 0.1);
    const r2 = Math.hypot(20, 0.1);
    const drop = byId(map(), "T1").dbA - byId(map(), "T2").dbA;
    expect(Math.abs(drop - 20 * Math.log10(r2 / r1))).toBeLessThan(1.5);
  });

  it("matches a hand calculation: 1 kHz sources 2 m and 4 m from the ears sum to 94.967 dBA (ISO 9613-2 eq. 7, ISO 9613-1 Table 1)", () => {
    // Two sources with all their power in the 1 kHz band, Lw 111.03 dB, at ear height 1.6 m,
    // 2 m and 4 m from T1. Each: Lw − (20·lg r + 11) − α·r with α(1 kHz, 20 °C, 50 %) = 4.66 dB/km
    // (ISO 9613-1 Table 1, via jmrplens/phonometry), A-weighting 0 dB at 1 kHz (IEC 61672-1
    // Table 3): 94.000080 and 87.970160 dB; energetic sum 94.967318 dBA (python by hand).
    const tone = handSource([-20, -20, -20, -20, 111.03, -20, -20, -20]);
    const src = (id: string, x: number) => performer({ id, instrument: "tone", section: "tones", voice: "melody", x, y: 20, z: 1.6 });
    const input: AnalysisInput = { ...set([src("S1", -2), listener("T1", 0), src("S2", 4)]), instruments: { tone } };
    const t1 = byId(hearingMap(input, { rehearsalMinutes: 60 }), "T1");
    expect(t1.dbA).toBeCloseTo(94.967318, 2);
    expect(t1.loudestSourceId).toBe("S1");
  });

  it("does not count the player's own instrument, and counts a neighbour a step away as 1 m, never infinite", () => {
    const alone = hearingMap(set([drum()]), { rehearsalMinutes: 60 });
    expect(byId(alone, "BD").dbA).toBe(-Infinity);
    expect(byId(alone, "BD").exposure.niosh.dose).toBe(0);
    const touching = byId(hearingMap(set([drum(), listener("T1", 0.2)]), { rehearsalMinutes: 60 }), "T1").dbA;
    const atOneMetre = byId(hearingMap(set([drum(), listener("T1", Math.sqrt(1 - 0.01))]), { rehearsalMinutes: 60 }), "T1").dbA;
    expect(Number.isFinite(touching)).toBe(true);
    expect(Math.abs(touching - atOneMetre)).toBeLessThan(0.2); // only the angle and the ground path differ
  });

  it("sums every other performer energetically: two equal drums mirrored about a player add 3 dB (Davis & Patronis, Sound System Engineering §2.15)", () => {
    const one = byId(hearingMap(set([drum({ x: -5 }), listener("T1", 0)]), { rehearsalMinutes: 60 }), "T1").dbA;
    const two = byId(hearingMap(set([drum({ x: -5 }), drum({ id: "BD2", x: 5 }), listener("T1", 0)]), { rehearsalMinutes: 60 }), "T1").dbA;
    expect(two - one).toBeCloseTo(10 * Math.log10(2), 6);
  });
});

describe("hearing map: dose of a rehearsal", () => {
  // A source with all its power in the 1 kHz band, 2 m from T1's ears at the same height: the
  // level there is Lw − 17.0206 − 0.0093 dB (ISO 9613-2 eq. 7; α = 4.66 dB/km at 1 kHz, 20 °C, 50 %,
  // ISO 9613-1 Table 1) with no A-weighting at 1 kHz, so Lw 111.03 gives 94.0001 dBA, 117.03 gives
  // 100.0001, 112.03 gives 95.0001 and 109.03 gives 92.0001 (hand calculation).
  function atLevel(lwDb: number, minutes: number) {
    const tone = handSource([-20, -20, -20, -20, lwDb, -20, -20, -20]);
    const src = performer({ id: "S", instrument: "tone", section: "tones", voice: "melody", x: -2, y: 20, z: 1.6 });
    const map = hearingMap({ ...set([src, listener("T1", 0)]), instruments: { tone } }, { rehearsalMinutes: minutes });
    return byId(map, "T1");
  }

  it("NIOSH 98-126 (85 dBA, 8 h, 3 dB exchange): 94 dBA for 1 h is a full daily dose; 100 dBA allows 15 min (from memory of the published table)", () => {
    const t = atLevel(111.03, 60);
    expect(t.dbA).toBeCloseTo(94, 2);
    expect(t.exposure.niosh.dose).toBeCloseTo(1, 2);
    expect(t.exposure.niosh.limitMinutes).toBeCloseTo(60, 0);
    expect(atLevel(117.03, 60).exposure.niosh.limitMinutes).toBeCloseTo(15, 1);
  });

  it("OSHA 29 CFR 1910.95 Table G-16 (90 dBA, 8 h, 5 dB exchange): 100 dBA for 2 h is a full dose, 95 dBA allows 4 h (from memory)", () => {
    const t = atLevel(117.03, 120);
    expect(t.dbA).toBeCloseTo(100, 2);
    expect(t.exposure.osha.dose).toBeCloseTo(1, 2);
    expect(t.exposure.niosh.dose).toBeCloseTo(8, 1); // 120 min against NIOSH's 15
    expect(atLevel(112.03, 60).exposure.osha.limitMinutes).toBeCloseTo(240, 0);
  });

  it("scales the dose with the rehearsal's length", () => {
    expect(atLevel(109.03, 90).exposure.niosh.dose).toBeCloseTo(3 * atLevel(109.03, 30).exposure.niosh.dose, 9);
  });

  it("rejects bad options with the field named", () => {
    const input = set([drum(), listener("T1", 3)]);
    expect(() => hearingMap(input, { rehearsalMinutes: -5 })).toThrow(/rehearsalMinutes/);
    expect(() => hearingMap(input, { rehearsalMinutes: Number.NaN })).toThrow(/rehearsalMinutes/);
    expect(() => hearingMap(input, { rehearsalMinutes: 60, minDistanceM: 0.1 })).toThrow(/minDistanceM/);
    expect(() => hearingMap(set([{ ...drum(), x: Number.NaN }]), { rehearsalMinutes: 60 })).toThrow(/performers\[0\]\.x/);
  });

  it("refuses missing or bad options with a message that names the field and says what is wanted", () => {
    const input = set([drum(), listener("T1", 3)]);
    expect(() => hearingMap(input, undefined as never)).toThrow(/^rehearsalMinutes must be a finite number$/);
    expect(() => hearingMap(input, { rehearsalMinutes: -5 })).toThrow(/^rehearsalMinutes must not be negative$/);
    expect(() => hearingMap(input, { rehearsalMinutes: 60, earHeightM: Number.NaN })).toThrow(/^earHeightM must be a finite number$/);
    expect(() => hearingMap(input, { rehearsalMinutes: 60, earHeightM: -0.1 })).toThrow(/^earHeightM must not be negative$/);
    expect(() => hearingMap(input, { rehearsalMinutes: 60, minDistanceM: Number.NaN })).toThrow(/^minDistanceM must be a finite number$/);
    expect(() => hearingMap(input, { rehearsalMinutes: 60, minDistanceM: 0.49 })).toThrow(/^minDistanceM must be at least 0\.5$/);
  });

  it("accepts the edges: a rehearsal of 0 minutes (no dose), ears at the ground, the engine's least distance of 0.5 m", () => {
    const input = set([drum(), listener("T1", 3)]);
    const none = byId(hearingMap(input, { rehearsalMinutes: 0 }), "T1");
    expect(Number.isFinite(none.dbA)).toBe(true);
    expect(none.exposure.niosh.dose).toBe(0);
    expect(none.exposure.osha.dose).toBe(0);
    expect(hearingMap(input, { rehearsalMinutes: 60, earHeightM: 0 }).earHeightM).toBe(0);
    expect(hearingMap(input, { rehearsalMinutes: 60, minDistanceM: 0.5 }).minDistanceM).toBe(0.5);
  });

  it("refuses an input that is null, not an object, or without a performers list, as performers must be an array", () => {
    expect(() => hearingMap(null as never, { rehearsalMinutes: 60 })).toThrow(/^performers must be an array$/);
    expect(() => hearingMap({ ...set([]), performers: "BD" } as never, { rehearsalMinutes: 60 })).toThrow(/^performers must be an array$/);
    // A function is not an object by typeof, even one that carries a performers list.
    const fn = Object.assign(() => 0, set([drum(), listener("T1", 3)]));
    expect(() => hearingMap(fn as never, { rehearsalMinutes: 60 })).toThrow(/^performers must be an array$/);
  });

  it("passes a performer that is null on to the engine's own check, naming its index", () => {
    expect(() => hearingMap(set([drum(), null as never]), { rehearsalMinutes: 60 })).toThrow(/^performers\[1\] must be an object$/);
  });
});

describe("hearing map: nearness and the loudest source", () => {
  it("counts a neighbour closer than 1 m as 1 m anywhere on the field, not only near x = 0", () => {
    // As the test above, moved 30 m along the field: ground and air alike, so only the angle and
    // the ground path differ between 0.2 m (counted as 1 m) and 1 m.
    const touching = byId(hearingMap(set([drum({ x: 30 }), listener("T1", 30.2)]), { rehearsalMinutes: 60 }), "T1").dbA;
    const atOneMetre = byId(hearingMap(set([drum({ x: 30 }), listener("T1", 30 + Math.sqrt(1 - 0.01))]), { rehearsalMinutes: 60 }), "T1").dbA;
    expect(Math.abs(touching - atOneMetre)).toBeLessThan(0.2);
  });

  it("names the first in the set's order as loudest when two sources tie exactly", () => {
    // Two identical sources on the same spot reach the ears at the same level, bit for bit.
    const tone = handSource([-20, -20, -20, -20, 111.03, -20, -20, -20]);
    const src = (id: string) => performer({ id, instrument: "tone", section: "tones", voice: "melody", x: -2, y: 20, z: 1.6 });
    const input: AnalysisInput = { ...set([src("S1"), src("S2"), listener("T1", 0)]), instruments: { tone } };
    expect(byId(hearingMap(input, { rehearsalMinutes: 60 }), "T1").loudestSourceId).toBe("S1");
  });
});
