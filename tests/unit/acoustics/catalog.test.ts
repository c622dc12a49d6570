import { describe, expect, it } from "vitest";
import {
  BAND_COUNT,
  DEFAULT_INSTRUMENTS,
  DYNAMICS,
  EVEREST_PEAK_LW_DB,
  dynamicChangeDb,
  instrumentLevelDb,
  shiftDynamic,
  sumLevelsDb,
} from "@/lib/acoustics";
import { handSource } from "./helpers";

const KEYS = [
  "flute", "piccolo", "clarinet", "bass-clarinet", "alto-sax", "tenor-sax", "bari-sax", "trumpet", "mellophone",
  "trombone", "baritone", "tuba", "snare", "tenors", "bass-drum", "cymbals", "marimba", "vibraphone", "synth",
];
const entries = Object.entries(DEFAULT_INSTRUMENTS);
const bandsAt = (key: string, d: (typeof DYNAMICS)[number]) =>
  Array.from({ length: BAND_COUNT }, (_, b) => instrumentLevelDb(DEFAULT_INSTRUMENTS[key], d, b));

describe("default instrument catalog", () => {
  it("holds every instrument of the issue with family, register, carryDb and a source", () => {
    for (const k of KEYS) {
      const s = DEFAULT_INSTRUMENTS[k];
      expect(s, k).toBeDefined();
      expect(["woodwind", "brass", "percussion", "keyboard", "amplified"]).toContain(s.family);
      expect(["soprano", "alto", "tenor", "bass"]).toContain(s.register);
      expect(Number.isFinite(s.carryDb)).toBe(true);
      expect(s.source.length).toBeGreaterThan(0);
    }
    expect(DEFAULT_INSTRUMENTS.synth.family).toBe("amplified");
  });

  it("transcribes Everest, Master Handbook of Acoustics, Table 5-1 watts as Lw re 1 pW", () => {
    const watts: Record<string, number> = { "bass-drum": 25, snare: 12, cymbals: 10, trombone: 6, trumpet: 0.3, tuba: 0.2, piccolo: 0.08, flute: 0.06, clarinet: 0.05 };
    for (const [k, w] of Object.entries(watts)) expect(Math.abs(EVEREST_PEAK_LW_DB[k] - 10 * Math.log10(w / 1e-12))).toBeLessThan(0.05);
  });

  it("keeps ff and fff at or below the Everest Table 5-1 peak power (peaks are upper bounds)", () => {
    for (const [k, peak] of Object.entries(EVEREST_PEAK_LW_DB)) {
      expect(DEFAULT_INSTRUMENTS[k].powerDb.ff).toBeLessThanOrEqual(peak);
      expect(DEFAULT_INSTRUMENTS[k].powerDb.fff).toBeLessThanOrEqual(peak);
      expect(DEFAULT_INSTRUMENTS[k].source).toMatch(/Everest/);
    }
  });

  it("raises every band with every dynamic step (from memory: levels rise pp → fff)", () => {
    for (const [k] of entries) {
      for (let i = 1; i < DYNAMICS.length; i++) {
        const lo = bandsAt(k, DYNAMICS[i - 1]);
        const hi = bandsAt(k, DYNAMICS[i]);
        hi.forEach((v, b) => expect(v, `${k} ${DYNAMICS[i]} band ${b}`).toBeGreaterThan(lo[b]));
      }
    }
  });

  it("spans 10–30 dB from pp to ff (from memory, not checked)", () => {
    for (const [k, s] of entries) {
      const span = s.powerDb.ff - s.powerDb.pp;
      expect(span, k).toBeGreaterThanOrEqual(10);
      expect(span, k).toBeLessThanOrEqual(30);
    }
  });

  it("puts woodwinds at 60–70 dB Lw at pp (piccolo and saxophones held at 72) and 95–105 at ff, brass ff at 109–120 (from memory, not checked)", () => {
    // The from-memory range is 60–70 at pp. The piccolo and the saxophones sit at 72 so their
    // pp–ff span stays inside 10–30 dB with ff at 100–101; named here rather than hidden in a bound.
    const ABOVE_70_AT_PP = new Set(["piccolo", "alto-sax", "tenor-sax", "bari-sax"]);
    for (const [k, s] of entries) {
      if (s.family === "woodwind") {
        expect(s.powerDb.pp, k).toBeGreaterThanOrEqual(60);
        expect(s.powerDb.pp, k).toBeLessThanOrEqual(ABOVE_70_AT_PP.has(k) ? 72 : 70);
        expect(s.powerDb.ff, k).toBeGreaterThanOrEqual(95);
        expect(s.powerDb.ff, k).toBeLessThanOrEqual(105);
      }
      if (s.family === "brass") {
        expect(s.powerDb.ff, k).toBeGreaterThanOrEqual(109);
        expect(s.powerDb.ff, k).toBeLessThanOrEqual(120);
      }
    }
  });

  it("has every brass ff above every woodwind ff, and woodwinds carrying worse than brass", () => {
    const ww = entries.filter(([, s]) => s.family === "woodwind").map(([, s]) => s);
    const br = entries.filter(([, s]) => s.family === "brass").map(([, s]) => s);
    expect(Math.min(...br.map((s) => s.powerDb.ff))).toBeGreaterThan(Math.max(...ww.map((s) => s.powerDb.ff)));
    expect(Math.max(...ww.map((s) => s.carryDb))).toBeLessThan(Math.min(...br.map((s) => s.carryDb)));
  });

  it("sums the bands of a dynamic to its overall powerDb (the spectrum is a shape only)", () => {
    for (const [k, s] of entries) for (const d of DYNAMICS) expect(sumLevelsDb(bandsAt(k, d))).toBeCloseTo(s.powerDb[d], 9);
  });

  it("brightens with dynamic: the 4 kHz band gains more than the 125 Hz band from p to ff for brass", () => {
    const t = DEFAULT_INSTRUMENTS.trumpet;
    expect(dynamicChangeDb(t, "p", "ff", 6)).toBeGreaterThan(dynamicChangeDb(t, "p", "ff", 1));
  });

  it("changes level from p to ff by hand-calculated amounts (flat spectrum, +1 dB per step at 4 kHz only)", () => {
    // Hand calculation: p = 80, ff = 100 dB overall, four steps apart. At ff the 4 kHz band is +2 dB
    // over the other seven, at p −2 dB; each spectrum is normalised to its overall level, so
    // 4 kHz changes by 4 + 20 − 10·lg((7 + 10^0.2)/(7 + 10^−0.2)) = 23.488441 dB and every other
    // band by 19.488441 dB.
    const spec = { ...handSource([80, 80, 80, 80, 80, 80, 80, 80], 5), brightnessDbPerStep: [0, 0, 0, 0, 0, 0, 1, 0] };
    spec.powerDb = { ...spec.powerDb, p: 80, ff: 100 };
    expect(dynamicChangeDb(spec, "p", "ff")).toBeCloseTo(20, 9);
    expect(dynamicChangeDb(spec, "ff", "p")).toBeCloseTo(-20, 9);
    expect(dynamicChangeDb(spec, "p", "ff", 6)).toBeCloseTo(23.488441, 5);
    for (const b of [0, 1, 2, 3, 4, 5, 7]) expect(dynamicChangeDb(spec, "p", "ff", b)).toBeCloseTo(19.488441, 5);
  });

  it("steps dynamics within pp…fff", () => {
    expect(shiftDynamic("p", 2)).toBe("mf");
    expect(shiftDynamic("mf", -3)).toBe("pp");
    expect(shiftDynamic("ff", 2)).toBeNull();
    expect(shiftDynamic("pp", -1)).toBeNull();
  });

  it("radiates bells forward: trumpet at least 6 dB down at 90° and 15 dB behind at 2 kHz, near omni below 500 Hz (from memory)", () => {
    const d = DEFAULT_INSTRUMENTS.trumpet.directivity;
    const at = (band: number, angle: number) => d.bandsDb[band][d.anglesDeg.indexOf(angle)];
    expect(at(5, 90)).toBeLessThanOrEqual(-6);
    expect(at(5, 90)).toBeGreaterThanOrEqual(-10);
    expect(at(5, 180)).toBeLessThanOrEqual(-15);
    expect(at(5, 180)).toBeGreaterThanOrEqual(-20);
    for (let b = 0; b <= 2; b++) expect(Math.min(...d.bandsDb[b])).toBeGreaterThanOrEqual(-3);
    const cl = DEFAULT_INSTRUMENTS.clarinet.directivity;
    for (let b = 0; b <= 4; b++) expect(Math.min(...cl.bandsDb[b])).toBeGreaterThanOrEqual(-3); // woodwinds within a few dB below 1 kHz
  });

  it("keeps every band of a spectrum under the whole: no octave is louder than the sum of all of them", () => {
    // The shape is relative to the overall level (types.ts), and the overall level is the energy sum of
    // the bands, so each band lies below 0 dB (physics of an energy sum, no source needed).
    for (const [k, s] of Object.entries(DEFAULT_INSTRUMENTS)) for (const db of s.spectrumDb) expect(db, k).toBeLessThan(0);
  });

  it("brightens with each step up and darkens with each step down, more the higher the band (common practice, no source)", () => {
    // High partials grow faster than the fundamental as a player pushes: per step, no band gains less
    // than the band below it, and nothing changes at 500 Hz, the pivot.
    for (const [k, s] of Object.entries(DEFAULT_INSTRUMENTS)) {
      const b = s.brightnessDbPerStep;
      for (let i = 1; i < b.length; i++) expect(b[i]!, `${k} band ${i}`).toBeGreaterThanOrEqual(b[i - 1]!);
      expect(b[3], k).toBe(0);
    }
  });

  it("names every instrument as people call it: each name given and no two alike", () => {
    const names = Object.values(DEFAULT_INSTRUMENTS).map((s) => s.name);
    for (const name of names) expect(name.trim().length, name).toBeGreaterThan(2);
    expect(new Set(names).size).toBe(names.length);
    expect(DEFAULT_INSTRUMENTS.tuba.name).toBe("Tuba / sousaphone");
  });

  it("is frozen so callers cannot change the defaults by accident", () => {
    expect(() => {
      (DEFAULT_INSTRUMENTS.trumpet as { carryDb: number }).carryDb = 5;
    }).toThrow();
  });
});

describe("catalog helpers", () => {
  it("interpolates directivity linearly in angle and folds angles beyond 180°", async () => {
    const { directivityDb } = await import("@/lib/acoustics");
    const t = DEFAULT_INSTRUMENTS.trumpet;
    const row = t.directivity.bandsDb[5];
    expect(directivityDb(t, 5, 67.5)).toBeCloseTo((row[1] + row[2]) / 2, 12);
    expect(directivityDb(t, 5, 270)).toBeCloseTo(row[2], 12);
    expect(directivityDb(t, 5, -45)).toBeCloseTo(row[1], 12);
  });
  it("rejects a band index outside the table", () => {
    expect(() => instrumentLevelDb(DEFAULT_INSTRUMENTS.flute, "p", 8)).toThrow("bandIndex");
    expect(() => instrumentLevelDb(DEFAULT_INSTRUMENTS.flute, "p", 1.5)).toThrow("bandIndex");
  });
});
