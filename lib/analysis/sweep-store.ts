// The PostgreSQL store of transition sweeps, and the whole-show sweeps the timeline and sweep routes
// answer from it: refused (422) past the work limit, computed in a worker thread.
import "server-only";
import { listStoredSweeps, storeSweeps } from "@/db/queries/sweeps";
import { runHeavy } from "@/lib/heavy/pool";
import { unprocessable } from "@/lib/http/errors";
import { showWorkProblem } from "@/lib/limits";
import type { ShowBalance } from "./show-context";
import { showSweeps, type SweepStore } from "./show-sweeps";

export const sweepStore: SweepStore = { list: listStoredSweeps, save: storeSweeps };

export async function storedShowSweeps(sb: ShowBalance) {
  const problem = showWorkProblem({ sets: sb.sets.map((s) => ({ placed: s.positions.length, counts: s.counts })), listeningPoints: sb.listeningPoints.length });
  if (problem) throw unprocessable(problem);
  return showSweeps(sb, sweepStore, (show, stored) => runHeavy("staleSweeps", show, stored));
}
