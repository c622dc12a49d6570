// The PostgreSQL store of transition sweeps, and the whole-show sweeps the timeline and sweep routes
// answer from it: refused (422) past the work limit, computed in a worker thread.
import "server-only";
import { listStoredSweeps, storeSweeps } from "@/db/queries/sweeps";
import { runHeavy } from "@/lib/heavy/pool";
import { unprocessable } from "@/lib/http/errors";
import { showWorkProblem } from "@/lib/limits";
import type { ShowBalance } from "./show-context";
import { showSweeps, type SweepRunner, type SweepStore } from "./show-sweeps";
import { sweepWork, withProgress } from "./work-progress";

export const sweepStore: SweepStore = { list: listStoredSweeps, save: storeSweeps };

const flights = new Map<string, ReturnType<typeof showSweeps>>();

export async function storedShowSweeps(sb: ShowBalance) {
  const problem = showWorkProblem({ sets: sb.sets.map((s) => ({ placed: s.positions.length, counts: s.counts })), listeningPoints: sb.listeningPoints.length });
  if (problem) throw unprocessable(problem);
  const run: SweepRunner = { hashes: (show, stored) => runHeavy("sweepHashes", show, stored), sweeps: (show, setIds) => runHeavy("setSweeps", show, setIds) };
  // Requests that read the same inputs (the page's own preload and its script's fetch) share one computation.
  const key = `${sb.show.id}:${sb.show.inputsRevision}:${sb.sets.map((s) => `${s.id}@${s.inputsRevision}`).join(",")}`;
  let flight = flights.get(key);
  if (!flight) {
    flight = withProgress(sweepWork(sb.show.id), (report) => showSweeps(sb, sweepStore, run, report)).finally(() => flights.delete(key));
    flights.set(key, flight);
  }
  return flight;
}
