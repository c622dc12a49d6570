// The engine input of a stored set, as the server and the editor's live preview both use it.
import "server-only";
import { loadSetContext } from "@/db/queries/set-context";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import { buildAnalysisInput } from "@/lib/music/analysis-input";
import { showConditions, type ShowConditionsRow } from "./show-conditions";

type ShowRow = ShowConditionsRow & { id: string; programId: string };

/** Re-exported for the callers that read it from here. */
export { showConditions };

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
