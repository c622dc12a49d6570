// Everything the balance work needs about a whole show, read once: roster, music, listening
// points, catalog, conditions, targets and every set with its positions. (No "server-only" mark:
// the bench loads it too.)
import { currentCatalog } from "@/db/queries/catalog";
import { loadMusic } from "@/db/queries/music";
import { listShowPositions } from "@/db/queries/show-positions";
import { listListeningPoints, listPerformers, listSets } from "@/db/queries/shows";
import type { Show } from "@/db/schema";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import type { BalanceContext } from "./balance-inputs";
import { showConditions } from "./show-conditions";
import { showTargets } from "./show-targets";

export type ShowSet = Awaited<ReturnType<typeof listSets>>[number] & { positions: { performerId: string; x: number; y: number; facingDeg: number }[] };

export async function loadShowBalance(show: Show) {
  const [roster, music, listeningPoints, catalog, setRows, positionRows] = await Promise.all([
    listPerformers(show.id),
    loadMusic(show.id),
    listListeningPoints(show.id),
    currentCatalog(show.programId),
    listSets(show.id),
    listShowPositions(show.id),
  ]);
  const bySet = new Map<string, ShowSet["positions"]>();
  for (const { setId, ...p } of positionRows) {
    const list = bySet.get(setId);
    if (list) list.push(p);
    else bySet.set(setId, [p]);
  }
  const ctx: BalanceContext = {
    roster,
    music,
    listeningPoints,
    conditions: showConditions(show),
    instruments: (catalog?.instruments as InstrumentCatalog | undefined) ?? undefined,
  };
  const sets: ShowSet[] = setRows.map((s) => ({ ...s, positions: bySet.get(s.id) ?? [] }));
  return { show, ctx, sets, roster, listeningPoints, targets: showTargets(show.checkTargets), music };
}

export type ShowBalance = Awaited<ReturnType<typeof loadShowBalance>>;
