// Builders shared by the readings and catalog API tests.
import type { Client } from "../support/api";

export interface DemoShow {
  showId: string;
  setIds: string[];
  pressBoxId: string;
}

/** A valid reading body for the demo show; override any field. */
export function readingBody(ids: DemoShow, over: Record<string, unknown> = {}) {
  return {
    setId: ids.setIds[0],
    listeningPointId: ids.pressBoxId,
    takenAt: "2026-09-18T19:30:00-05:00",
    temperatureC: 24,
    relativeHumidityPct: 55,
    sections: [{ section: "Trumpets", dynamic: "f" }],
    measuredDb: 84.5,
    weighting: "A",
    response: "slow",
    meterHeightM: 18,
    note: "test reading",
    ...over,
  };
}

/** Removes readings a test created (as a director, who may remove any). */
export async function removeReadings(director: Client, showId: string, ids: string[]) {
  for (const id of ids) await director.call("DELETE", `/api/shows/${showId}/readings/${id}`);
}
