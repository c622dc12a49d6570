// The whole propagation chain (spreading, air, ground) against values from outside the project:
// the ISO/TR 17534-3:2015 software test cases of ISO 9613-2, and hand calculations from the
// standard's own equations with their numbers written out.
import { describe, expect, it } from "vitest";
import { analyzeSet, groundAttenuationDb, type Conditions, type PointResult } from "@/lib/acoustics";
import { handSource, performer } from "./helpers";

// ISO/TR 17534-3:2015 §6.2, Tables 1–6, as transcribed in jmrplens/phonometry
// tests/environment/propagation/test_iso17534_3.py @ 001d785c0ad1dd769831112dd3205c1f04cf685b:
// source (10, 10, 1), receiver (200, 50, 4), 93 dB in every octave, 20 °C, 70 % RH; the
// document's envelope is ±0.05 dB per band and per total.
const TR_SOURCE = { x: 10, y: 10, z: 1 };
const TR_RECEIVER = { id: "R", x: 200, y: 50, z: 4 };
const TR_AIR = { temperatureC: 20, relativeHumidityPct: 70, pressureKPa: 101.325 };
const ENVELOPE_DB = 0.05;
const FLAT_93 = handSource([93, 93, 93, 93, 93, 93, 93, 93]);

function trCase(groundFactor: number | null): PointResult {
  return analyzeSet({
    performers: [performer({ id: "S", instrument: "flat93", ...TR_SOURCE, facingDeg: 0 })],
    listeningPoints: [TR_RECEIVER],
    conditions: { ...TR_AIR, groundFactor },
    instruments: { flat93: FLAT_93 },
  }).points[0];
}

describe("ISO/TR 17534-3 test cases T01–T03 (flat ground of one kind, ISO 9613-2 general method)", () => {
  const cases = [
    { id: "T01", g: 0, levels: [39.9, 39.86, 39.7, 39.37, 38.95, 38.17, 35.47, 25.04], totalA: 44.29 },
    { id: "T02", g: 0.5, levels: [39.9, 36.17, 33.02, 33.2, 36.11, 36.33, 33.63, 23.2], totalA: 41.53 },
    { id: "T03", g: 1, levels: [39.9, 32.48, 26.33, 27.03, 33.27, 34.49, 31.79, 21.36], totalA: 39.14 },
  ];
  for (const c of cases) {
    it(`${c.id} (G = ${c.g}): every band and the A-weighted total within ±0.05 dB of the printed table`, () => {
      const point = trCase(c.g);
      point.performers[0].bandsDb.forEach((l, b) => expect(Math.abs(l - c.levels[b]), `${c.id} band ${b}`).toBeLessThanOrEqual(ENVELOPE_DB));
      expect(Math.abs(point.totalDbA - c.totalA)).toBeLessThanOrEqual(ENVELOPE_DB);
    });
  }

  it("T01: A_div = 56.76 dB at d = 194.19 m (Table 3), so 93 − 56.76 + 3.68 − A_atm(63 Hz ≈ 0.02) = 39.90 at 63 Hz", () => {
    // With the ground term off, the 63 Hz level is 93 − A_div − A_atm alone: 93 − 56.76 − 0.02.
    expect(Math.abs(trCase(null).performers[0].bandsDb[0] - (93 - 56.76 - 0.02))).toBeLessThanOrEqual(ENVELOPE_DB);
  });

  it("Table 3's a', b', c', d' printed for hs = 1 m (2.45, 9.20, 10.16, 3.49) and hr = 4 m (4.24, 3.50, 1.51, 1.50) at dp = 194.16 m", () => {
    // With G = 1 in every region A_gr = (a'(hs) − 1.5) + (a'(hr) − 1.5) per band, and A_m = −3q(1 − G) = 0.
    const dp = Math.hypot(190, 40);
    const at = (f: number) => groundAttenuationDb({ frequencyHz: f, sourceHeightM: 1, receiverHeightM: 4, distanceM: dp, groundFactor: 1 });
    expect(at(125)).toBeCloseTo(2.45 + 4.24 - 3, 1);
    expect(at(250)).toBeCloseTo(9.2 + 3.5 - 3, 1);
    expect(at(500)).toBeCloseTo(10.16 + 1.51 - 3, 1);
    expect(at(1000)).toBeCloseTo(3.49 + 1.5 - 3, 1);
    // T01 prints A_gr = −3.68 dB in every band over hard ground: −1.5 twice and −3q, q = 0.23.
    for (const f of [63, 125, 250, 500, 1000, 2000, 4000, 8000]) {
      expect(groundAttenuationDb({ frequencyHz: f, sourceHeightM: 1, receiverHeightM: 4, distanceM: dp, groundFactor: 0 })).toBeCloseTo(-3.68, 2);
    }
  });

  it("63 Hz rule of Table 3: the source and receiver regions give −1.5 dB whatever G (T01 and T03 print the same 39.90)", () => {
    expect(trCase(1).performers[0].bandsDb[0]).toBeCloseTo(trCase(0).performers[0].bandsDb[0], 9);
  });
});

// Hand calculation on a steep path where the slant and horizontal distances differ a lot: the
// source 1.5 m up, the receiver 30 m away on the ground and 41.5 m up (dp = 30 m, dz = 40 m,
// so d = 50 m). ISO 9613-2 uses d for A_div (eq. 7) and A_atm (eq. 8), dp for A_gr (7.3.1).
describe("slant versus horizontal distance in each term (hand calculation)", () => {
  const AIR_70: Conditions = { ...TR_AIR, groundFactor: null };
  // α (dB/km) at 20 °C, 70 % RH: ISO 9613-2:1996 Table 2, via jmrplens/phonometry
  // tests/reference_data/environment.py (see shared REFERENCES).
  const ALPHA = [0.1, 0.3, 1.1, 2.8, 5.0, 9.0, 22.9, 76.6];
  // A_div = 20·lg(50) + 11 = 44.979400 dB (eq. 7); over dp it would be 40.542 dB.
  const A_DIV_50 = 44.9794;
  const run = (groundFactor: number | null) =>
    analyzeSet({
      performers: [performer({ id: "S", instrument: "flat93", x: 0, y: 0, z: 1.5, facingDeg: 180 })],
      listeningPoints: [{ id: "R", x: 0, y: -30, z: 41.5 }],
      conditions: { ...AIR_70, groundFactor },
      instruments: { flat93: FLAT_93 },
    }).points[0].performers[0].bandsDb;

  it("spreads and absorbs over the slant distance: L = 93 − 44.979 − α·0.050 km in every band", () => {
    run(null).forEach((l, b) => expect(l, `band ${b}`).toBeCloseTo(93 - A_DIV_50 - ALPHA[b] * 0.05, 2));
  });

  it("takes the ground term over the projected distance dp = 30 m (Table 3 by hand, G = 1, q = 0)", () => {
    // A_gr per band from Table 3 with hs 1.5, hr 41.5, dp 30 (python by hand):
    // −3.000, 0.322935, 3.168923, 2.243836, 0.297770, 0, 0, 0. With dp = 50 it would be
    // −3.000, 0.468494, 4.439701, 3.143643, 0.417180, 0, 0, 0.
    const agr = [-3, 0.322935, 3.168923, 2.243836, 0.29777, 0, 0, 0];
    run(1).forEach((l, b) => expect(l, `band ${b}`).toBeCloseTo(93 - A_DIV_50 - ALPHA[b] * 0.05 - agr[b], 2));
  });
});
