import { currentCatalog } from "./catalog";
import { loadMusic } from "./music";
import { listPositions } from "./sets";
import { listListeningPoints, listPerformers } from "./shows";

/** Everything the engine needs about one set, read from the database. */
export async function loadSetContext(show: { id: string; programId: string }, set: { id: string; order: number }) {
  const [roster, positions, music, listeningPoints, catalog] = await Promise.all([
    listPerformers(show.id),
    listPositions(set.id),
    loadMusic(show.id),
    listListeningPoints(show.id),
    currentCatalog(show.programId),
  ]);
  return { roster, positions, music, listeningPoints, catalog };
}
