// The engine input of a stored set, as the server and the editor's live preview both use it.
import "server-only";
import { loadSetContext } from "@/db/queries/set-context";
import type { Conditions, InstrumentCatalog } from "@/lib/acoustics/types";
import { buildAnalysisInput } from "@/lib/music/analysis-input";

type ShowRow = {
  id: string;
  programId: string;
  temperatureC: number;
  relativeHumidityPct: number;
  pressureKPa: number;
  groundFactor: number | null;
  betweenGroundFactor: number | null;
};

export function showConditions(show: ShowRow): Conditions {
  return {
    temperatureC: show.temperatureC,
    relativeHumidityPct: show.relativeHumidityPct,
    pressureKPa: show.pressureKPa,
    groundFactor: show.groundFactor,
    betweenGroundFactor: show.betweenGroundFactor,
  };
}

export async function setAnalysisInput(show: ShowRow, set: { id: string; order: number }) {
  const ctx = await loadSetContext(show, set);
  const input = buildAnalysisInput({
    roster: ctx.roster,
    set: { order: set.order, positions: ctx.positions },
    music: ctx.music,
    listeningPoints: ctx.listeningPoints,
    conditions: showConditions(show),
    instruments: (ctx.catalog?.instruments as InstrumentCatalog | undefined) ?? undefined,
  });
  return { input, catalogVersion: ctx.catalog?.version ?? 0, listeningPoints: ctx.listeningPoints };
}
