// Air: absorption per ISO 9613-1:1993 (eqs. 3–5, Annex B) and the speed of sound.
import { AcousticsInputError, requireFinite, requireInRange } from "./errors";

const T0 = 293.15; // K, reference temperature
const T01 = 273.16; // K, triple point of water
const PR = 101.325; // kPa, reference pressure

export interface AirConditions {
  temperatureC: number;
  relativeHumidityPct: number;
  pressureKPa: number;
}

/** Throws unless the air conditions are usable; `prefix` names the object in messages. */
export function validateAir(air: AirConditions, prefix = ""): void {
  if (air === null || typeof air !== "object") throw new AcousticsInputError(prefix || "conditions", "must be an object");
  // Outdoor range where the formulas are meaningful; ISO 9613-1 states −20 … +50 °C.
  requireInRange(air.temperatureC, -50, 60, `${prefix}temperatureC`);
  requireInRange(air.relativeHumidityPct, 0, 100, `${prefix}relativeHumidityPct`);
  const p = requireFinite(air.pressureKPa, `${prefix}pressureKPa`);
  if (p <= 0 || p > 200) throw new AcousticsInputError(`${prefix}pressureKPa`, "must be above 0 and at most 200");
}

/** Saturation vapour pressure (kPa) over water, ISO 9613-1 Annex B: psat/pr = 10^C. */
export function saturationVapourPressureKPa(temperatureC: number): number {
  const T = temperatureC + 273.15;
  return PR * 10 ** (-6.8346 * (T01 / T) ** 1.261 + 4.6151);
}

/** ISO 9613-1 intermediate values: water vapour h (%), relaxation frequencies frO and frN (Hz). */
export function relaxationFrequencies(air: AirConditions): { h: number; frO: number; frN: number } {
  const pa = air.pressureKPa / PR;
  const h = (air.relativeHumidityPct * saturationVapourPressureKPa(air.temperatureC)) / air.pressureKPa;
  const tr = (air.temperatureC + 273.15) / T0;
  const frO = pa * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h)); // eq. (3)
  const frN = pa * tr ** -0.5 * (9 + 280 * h * Math.exp(-4.17 * (tr ** (-1 / 3) - 1))); // eq. (4)
  return { h, frO, frN };
}

/** ISO 9613-1 pure-tone absorption coefficient α in dB/km, eq. (5); inputs checked by the caller. */
export function absorptionDbPerKmUnchecked(frequencyHz: number, air: AirConditions): number {
  const T = air.temperatureC + 273.15;
  const pa = air.pressureKPa / PR;
  const tr = T / T0;
  const { frO, frN } = relaxationFrequencies(air);
  const f2 = frequencyHz * frequencyHz;
  const alphaDbPerM =
    8.686 *
    f2 *
    ((1.84e-11 / pa) * tr ** 0.5 +
      tr ** -2.5 *
        ((0.01275 * Math.exp(-2239.1 / T)) / (frO + f2 / frO) + (0.1068 * Math.exp(-3352.0 / T)) / (frN + f2 / frN)));
  return alphaDbPerM * 1000;
}

/** Atmospheric absorption α (dB/km) at a frequency, ISO 9613-1:1993. */
export function airAbsorptionDbPerKm(frequencyHz: number, air: AirConditions): number {
  const f = requireFinite(frequencyHz, "frequencyHz");
  if (f <= 0) throw new AcousticsInputError("frequencyHz", "must be above 0");
  validateAir(air);
  return absorptionDbPerKmUnchecked(f, air);
}

/** Speed of sound in m/s, c = 343.2·sqrt(T / 293.15 K) (ISO 9613-1 form). */
export function speedOfSound(temperatureC: number): number {
  const t = requireFinite(temperatureC, "temperatureC");
  if (t <= -273.15) throw new AcousticsInputError("temperatureC", "must be above absolute zero");
  return 343.2 * Math.sqrt((t + 273.15) / T0);
}
