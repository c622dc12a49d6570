// The engine's conditions from a show row: air and the ground by region. One place, so the
// stored analyses, the balance work and the show's API answer read the same fields.
import type { Conditions } from "@/lib/acoustics/types";

export type ShowConditionsRow = {
  temperatureC: number;
  relativeHumidityPct: number;
  pressureKPa: number;
  groundFactor: number | null;
  betweenGroundFactor: number | null;
};

/** The show's conditions as the engine takes them. */
export function showConditions(show: ShowConditionsRow): Conditions {
  return {
    temperatureC: show.temperatureC,
    relativeHumidityPct: show.relativeHumidityPct,
    pressureKPa: show.pressureKPa,
    groundFactor: show.groundFactor,
    betweenGroundFactor: show.betweenGroundFactor,
  };
}
