import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  DEFAULT_INSTRUMENTS,
  DYNAMICS,
  OCTAVE_BANDS,
  VOICES,
  airAbsorptionDbPerKm,
  analyzeSet,
  createSetEvaluator,
  speedOfSound,
  type AnalysisInput,
  type PerformerInput,
  type PointResult,
} from "@/lib/acoustics";
import { AIR, BOX, facingToward, lazy, performer } from "./helpers";

const INSTRUMENT_KEYS = Object.keys(DEFAULT_INSTRUMENTS);
const TOL = 1e-9;
const only = (input: AnalysisInput): PointResult => analyzeSet(input).points[0];

// On-field positions (m) and the rest of a performer, for properties.
const arbPerformerFields = fc.record({
  instrument: fc.constantFrom(...INSTRUMENT_KEYS),
  section: fc.constantFrom("s1", "s2", "s3"),
  voice: fc.constantFrom(...VOICES),
  dynamic: fc.constantFrom(...DYNAMICS),
  x: fc.double({ min: -55, max: 55, noNaN: true }),
  y: fc.double({ min: 0, max: 48.7, noNaN: true }),
  facingDeg: fc.double({ min: 0, max: 360, noNaN: true, maxExcluded: true }),
  strengthDb: fc.double({ min: -6, max: 6, noNaN: true }),
});
const arbBand = fc.array(arbPerformerFields, { minLength: 1, maxLength: 12 }).map((list) => list.map((p, i): PerformerInput => ({ id: `P${i}`, ...p })));
const arbGround = fc.constantFrom<number | null>(null, 0, 0.5, 1);

describe("analyzeSet: result shape", () => {
  const input: AnalysisInput = {
    performers: [
      performer({ id: "T1", section: "trumpets", voice: "melody" }),
      performer({ id: "T2", section: "trumpets", voice: "melody", x: 4 }),
      performer({ id: "C1", instrument: "clarinet", section: "clarinets", voice: "countermelody", x: -6, y: 30 }),
      performer({ id: "C2", instrument: "clarinet", section: "clarinets", voice: "tacet", x: 20, y: 40 }),
    ],
    listeningPoints: [BOX, { id: "judge", x: 10, y: 20, z: 1.6 }],
    conditions: { ...AIR, groundFactor: 1 },
  };
  const result = lazy(() => analyzeSet(input));

  it("gives one entry per listening point with voices, sections, performers and the arrival spread", () => {
    expect(result().points.map((p) => p.listeningPointId)).toEqual(["box", "judge"]);
    const box = result().points[0];
    expect(Object.keys(box.voices).sort()).toEqual(["countermelody", "melody"]);
    expect(Object.keys(box.sections).sort()).toEqual(["clarinets", "trumpets"]);
    expect(box.performers.map((p) => p.id)).toEqual(["T1", "T2", "C1", "C2"]);
    for (const p of box.performers) expect(p.bandsDb).toHaveLength(OCTAVE_BANDS.length);
  });

  it("sums sections, voices and the total energetically per band", () => {
    const box = result().points[0];
    const e = (l: number) => 10 ** (l / 10);
    for (let b = 0; b < OCTAVE_BANDS.length; b++) {
      const [t1, t2, c1] = box.performers.map((p) => p.bandsDb[b]);
      expect(box.sections.trumpets.bandsDb[b]).toBeCloseTo(10 * Math.log10(e(t1) + e(t2)), 9);
      expect(box.voices.countermelody!.bandsDb[b]).toBeCloseTo(c1, 9);
    }
    const total = 10 * Math.log10(Object.values(box.voices).reduce((s, v) => s + e(v!.dbA), 0));
    expect(box.totalDbA).toBeCloseTo(total, 9);
  });

  it("lists a tacet performer at -Infinity with an arrival time, leaving it out of sums and spread", () => {
    const box = result().points[0];
    const c2 = box.performers[3];
    expect(c2.dbA).toBe(-Infinity);
    expect(c2.bandsDb.every((v) => v === -Infinity)).toBe(true);
    expect(c2.arrivalMs).toBeGreaterThan(0);
    expect(box.sections.clarinets.dbA).toBeCloseTo(box.performers[2].dbA, 9);
    const sounding = box.performers.slice(0, 3).map((p) => p.arrivalMs);
    expect(box.arrivalSpreadMs).toBeCloseTo(Math.max(...sounding) - Math.min(...sounding), 9);
  });

  it("times arrival as r / c with c from the temperature (ISO 9613-1 speed of sound)", () => {
    const t1 = result().points[0].performers[0];
    const r = Math.hypot(0 - 0, -25 - 10, 18 - 1.5); // source height 1.5 m by default
    expect(t1.arrivalMs).toBeCloseTo((r / speedOfSound(20)) * 1000, 9);
  });

  it("gives a section of tacet players -Infinity and no voice entry", () => {
    const box = only({ ...input, performers: [performer({ id: "X", voice: "tacet" })] });
    expect(box.sections.trumpets.dbA).toBe(-Infinity);
    expect(box.voices).toEqual({});
    expect(box.totalDbA).toBe(-Infinity);
    expect(box.arrivalSpreadMs).toBe(0);
  });
});

describe("analyzeSet: properties (fast-check)", () => {
  it("lowers a 63 Hz level by 6.02 dB per doubling of distance, no ground term, absorption accounted for (ISO 9613-2 eq. 7)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 200, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.constantFrom(...INSTRUMENT_KEYS), (d, theta, instrument) => {
        const at = (r: number) => {
          const x = r * Math.sin(theta);
          const y = 30 + r * Math.cos(theta);
          return only({
            performers: [performer({ id: "A", instrument, x, y, z: 1.5, facingDeg: facingToward(x, y, 0, 30) })],
            listeningPoints: [{ id: "L", x: 0, y: 30, z: 1.5 }],
            conditions: AIR,
          }).performers[0].bandsDb[0];
        };
        const alpha = airAbsorptionDbPerKm(OCTAVE_BANDS[0].exactHz, AIR) / 1000;
        expect(at(d) - at(2 * d) - alpha * d).toBeCloseTo(20 * Math.log10(2), 6);
      }),
    );
  });

  it("puts N identical performers at one spot 10·log10 N above one (Davis & Patronis §2.15)", () => {
    fc.assert(
      fc.property(arbPerformerFields, fc.integer({ min: 2, max: 40 }), arbGround, (p, n, g) => {
        const one = only({ performers: [{ id: "A", ...p }], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: g } });
        const many = only({
          performers: Array.from({ length: n }, (_, i) => ({ id: `A${i}`, ...p })),
          listeningPoints: [BOX],
          conditions: { ...AIR, groundFactor: g },
        });
        expect(many.totalDbA - one.totalDbA).toBeCloseTo(10 * Math.log10(n), 8);
        many.sections[p.section].bandsDb.forEach((v, b) => expect(v - one.sections[p.section].bandsDb[b]).toBeCloseTo(10 * Math.log10(n), 8));
      }),
    );
  });

  it("never lowers any sum when a performer is added", () => {
    fc.assert(
      fc.property(arbBand, arbPerformerFields, arbGround, (band, extra, g) => {
        const conditions = { ...AIR, groundFactor: g };
        const before = only({ performers: band, listeningPoints: [BOX], conditions });
        const after = only({ performers: [...band, { id: "EXTRA", ...extra }], listeningPoints: [BOX], conditions });
        expect(after.totalDbA).toBeGreaterThanOrEqual(before.totalDbA - TOL);
        for (const [s, v] of Object.entries(before.sections)) {
          expect(after.sections[s].dbA).toBeGreaterThanOrEqual(v.dbA - TOL);
          v.bandsDb.forEach((l, b) => expect(after.sections[s].bandsDb[b]).toBeGreaterThanOrEqual(l - TOL));
        }
        for (const [voice, v] of Object.entries(before.voices)) {
          expect(after.voices[voice as keyof typeof after.voices]!.dbA).toBeGreaterThanOrEqual(v!.dbA - TOL);
        }
      }),
    );
  });

  it("does not depend on the order of performers", () => {
    fc.assert(
      fc.property(
        arbBand.chain((band) => fc.tuple(fc.constant(band), fc.shuffledSubarray(band, { minLength: band.length, maxLength: band.length }))),
        arbGround,
        ([band, shuffled], g) => {
          const conditions = { ...AIR, groundFactor: g };
          const a = only({ performers: band, listeningPoints: [BOX], conditions });
          const b = only({ performers: shuffled, listeningPoints: [BOX], conditions });
          expect(b.totalDbA).toBeCloseTo(a.totalDbA, 9);
          for (const s of Object.keys(a.sections)) expect(b.sections[s].dbA).toBeCloseTo(a.sections[s].dbA, 9);
          for (const v of Object.keys(a.voices) as (keyof typeof a.voices)[]) expect(b.voices[v]!.dbA).toBeCloseTo(a.voices[v]!.dbA, 9);
          const byId = new Map(b.performers.map((p) => [p.id, p]));
          for (const p of a.performers) expect(byId.get(p.id)!.dbA).toBeCloseTo(p.dbA, 9);
          expect(b.arrivalSpreadMs).toBeCloseTo(a.arrivalSpreadMs, 9);
        },
      ),
    );
  });

  it("shifts a performer by exactly its strength offset, in every band and in dBA", () => {
    fc.assert(
      fc.property(arbPerformerFields, fc.double({ min: -6, max: 6, noNaN: true }), arbGround, (p, s, g) => {
        const run = (strengthDb: number) =>
          only({ performers: [{ id: "A", ...p, strengthDb }], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: g } }).performers[0];
        const base = run(0);
        const shifted = run(s);
        expect(shifted.dbA - base.dbA).toBeCloseTo(s, 9);
        shifted.bandsDb.forEach((v, b) => expect(v - base.bandsDb[b]).toBeCloseTo(s, 9));
      }),
    );
  });

  it("raises the level at the box with every dynamic step, in every band and in dBA", () => {
    fc.assert(
      fc.property(arbPerformerFields, arbGround, (p, g) => {
        const levels = DYNAMICS.map(
          (dynamic) => only({ performers: [{ id: "A", ...p, dynamic }], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: g } }).performers[0],
        );
        for (let i = 1; i < levels.length; i++) {
          expect(levels[i].dbA).toBeGreaterThan(levels[i - 1].dbA);
          levels[i].bandsDb.forEach((v, b) => expect(v).toBeGreaterThan(levels[i - 1].bandsDb[b]));
        }
      }),
    );
  });

  it("is never quieter facing the listener than facing any other way (in 3-D, box above the field)", () => {
    fc.assert(
      fc.property(arbPerformerFields, arbGround, (p, g) => {
        const run = (facingDeg: number) =>
          only({ performers: [{ id: "A", ...p, facingDeg }], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: g } }).performers[0];
        const toward = run(facingToward(p.x, p.y, BOX.x, BOX.y));
        const other = run(p.facingDeg);
        const away = run(facingToward(p.x, p.y, BOX.x, BOX.y) + 180);
        expect(toward.dbA).toBeGreaterThanOrEqual(other.dbA - TOL);
        expect(toward.dbA).toBeGreaterThanOrEqual(away.dbA - TOL);
        toward.bandsDb.forEach((v, b) => expect(v).toBeGreaterThanOrEqual(away.bandsDb[b] - TOL));
      }),
    );
  });

  it("never returns NaN for valid input", () => {
    fc.assert(
      fc.property(arbBand, arbGround, (band, g) => {
        const r = analyzeSet({ performers: band, listeningPoints: [BOX, { id: "on", x: band[0].x, y: band[0].y, z: 1.5 }], conditions: { ...AIR, groundFactor: g } });
        expect(JSON.stringify(r)).not.toContain("NaN");
        for (const pt of r.points) {
          expect(Number.isNaN(pt.totalDbA)).toBe(false);
          for (const p of pt.performers) expect(p.bandsDb.some(Number.isNaN)).toBe(false);
        }
      }),
    );
  });

  it("gives the evaluator the same result as analyzeSet after moving performers", () => {
    const performers = [performer({ id: "A" }), performer({ id: "B", instrument: "tuba", section: "tubas", voice: "bass", x: 10 })];
    const ev = createSetEvaluator({ performers, listeningPoints: [BOX], conditions: { ...AIR, groundFactor: 0.5 } });
    ev.setPositions([{ performerId: "B", x: -12, y: 30, facingDeg: 45 }]);
    ev.evaluate();
    const direct = analyzeSet({ performers: [performers[0], { ...performers[1], x: -12, y: 30, facingDeg: 45 }], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: 0.5 } });
    expect(ev.result().points[0].totalDbA).toBeCloseTo(direct.points[0].totalDbA, 12);
    expect(ev.mix.totalDbA[0]).toBeCloseTo(direct.points[0].totalDbA, 12);
  });
});

describe("rules of thumb of the trade", () => {
  const section = (instrument: string, n: number, y: number): PerformerInput[] =>
    Array.from({ length: n }, (_, i) => {
      const x = -8 + i * 2.3;
      return performer({ id: `${instrument}${i}`, instrument, section: instrument, dynamic: "p", x, y, facingDeg: facingToward(x, y, BOX.x, BOX.y) });
    });

  it("puts a clarinet section at p well below a trumpet section of the same size at p at the box (common practice, no source)", () => {
    for (const g of [null, 1]) {
      const box = only({ performers: [...section("clarinet", 8, 20), ...section("trumpet", 8, 20)], listeningPoints: [BOX], conditions: { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325, groundFactor: g } });
      expect(box.sections.trumpet.dbA - box.sections.clarinet.dbA).toBeGreaterThan(10);
    }
  });

  it("brings a performer on the front sideline to the box louder than on the back sideline (common practice, no source)", () => {
    for (const instrument of ["trumpet", "clarinet", "snare"]) {
      const at = (y: number) => only({ performers: [performer({ id: "A", instrument, y, facingDeg: 0 })], listeningPoints: [BOX], conditions: { ...AIR, groundFactor: 1 } }).totalDbA;
      expect(at(0)).toBeGreaterThan(at(48.768) + 3);
    }
  });
});
