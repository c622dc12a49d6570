// The show as GET /api/shows/{id} answers it (shared/API.md), also the answer of PATCH.
import { listMovements } from "@/db/queries/show-settings";
import { listListeningPoints, listPerformers, listSets, showProgress } from "@/db/queries/shows";
import type { Show } from "@/db/schema";
import type { Role } from "@/lib/auth/permissions";
import { showConditions } from "@/lib/analysis/show-conditions";

export async function showAnswer(show: Show, role: Role) {
  const [listeningPoints, performers, sets, movements, progress] = await Promise.all([
    listListeningPoints(show.id),
    listPerformers(show.id),
    listSets(show.id),
    listMovements(show.id),
    showProgress(show.id),
  ]);
  return {
    show: {
      id: show.id,
      programId: show.programId,
      name: show.name,
      fieldRules: show.fieldRules,
      conditions: showConditions(show),
      archivedAt: show.archivedAt,
    },
    role,
    listeningPoints,
    performers,
    sets,
    movements,
    /** For a new show's next step: performers placed in any set, phrases written. */
    progress,
  };
}
