import { describe, expect, it } from "vitest";
import {
  OCTAVE_BANDS,
  airAbsorptionDbPerKm,
  relaxationFrequencies,
  saturationVapourPressureKPa,
  speedOfSound,
} from "@/lib/acoustics";

const AIR_70 = { temperatureC: 20, relativeHumidityPct: 70, pressureKPa: 101.325 };
const AIR_50 = { temperatureC: 20, relativeHumidityPct: 50, pressureKPa: 101.325 };

describe("atmospheric absorption, ISO 9613-1:1993", () => {
  it("matches ISO 9613-2:1996 Table 2 at 20 °C, 70 % RH (via jmrplens/phonometry tests/reference_data/environment.py)", () => {
    const table = [0.1, 0.3, 1.1, 2.8, 5.0, 9.0, 22.9, 76.6]; // printed to 0.1 dB/km
    OCTAVE_BANDS.forEach((b, i) => expect(Math.abs(airAbsorptionDbPerKm(b.exactHz, AIR_70) - table[i])).toBeLessThanOrEqual(0.05 + 1e-9));
  });

  it("matches equation (5) evaluated at 20 °C, 70 % RH to 0.001 dB/km (computed, REFERENCES.md)", () => {
    const computed = [0.09, 0.339, 1.132, 2.798, 4.978, 9.016, 22.911, 76.621];
    OCTAVE_BANDS.forEach((b, i) => expect(airAbsorptionDbPerKm(b.exactHz, AIR_70)).toBeCloseTo(computed[i], 2));
  });

  it("matches ISO 9613-1 Table 1 at 20 °C, 50 % RH: 1 kHz 4.66, 1995.26 Hz 9.86 (via phonometry)", () => {
    expect(airAbsorptionDbPerKm(1000, AIR_50)).toBeCloseTo(4.66, 1);
    expect(Math.abs(airAbsorptionDbPerKm(1000, AIR_50) - 4.66)).toBeLessThan(0.01);
    expect(Math.abs(airAbsorptionDbPerKm(1995.26, AIR_50) - 9.86)).toBeLessThan(0.01);
  });

  it("gives 0.445 dB/km at 125.89 Hz, 20 °C, 50 % RH (commuted/sound-propagation tests/test_atmospheric_absorption.py)", () => {
    expect(Math.abs(airAbsorptionDbPerKm(125.89, AIR_50) - 0.445)).toBeLessThan(0.001);
  });

  it("gives psat 2.33663 kPa at 293.15 K, Annex B (python-acoustics tests/test_atmosphere.py)", () => {
    expect(saturationVapourPressureKPa(20)).toBeCloseTo(2.33663, 4);
  });

  it("gives h 1.15304 %, frO 35 414 Hz, frN 331.85 Hz at 20 °C, 50 % RH (eqs. 3, 4, computed)", () => {
    const r = relaxationFrequencies(AIR_50);
    expect(r.h).toBeCloseTo(1.15304, 4);
    expect(Math.abs(r.frO - 35414)).toBeLessThan(1);
    expect(r.frN).toBeCloseTo(331.85, 1);
  });

  it("absorbs more at higher frequencies in the show's air (24 °C, 55 %)", () => {
    const air = { temperatureC: 24, relativeHumidityPct: 55, pressureKPa: 101.325 };
    const alphas = OCTAVE_BANDS.map((b) => airAbsorptionDbPerKm(b.exactHz, air));
    for (let i = 1; i < alphas.length; i++) expect(alphas[i]).toBeGreaterThan(alphas[i - 1]);
  });
});

describe("speed of sound, c = 343.2·sqrt(T / 293.15 K) (ISO 9613-1 form; python-acoustics constant)", () => {
  it("is 343.2 m/s at 20 °C and 331.3 m/s at 0 °C", () => {
    expect(speedOfSound(20)).toBeCloseTo(343.2, 6);
    expect(Math.abs(speedOfSound(0) - 331.3)).toBeLessThan(0.05);
  });
});
