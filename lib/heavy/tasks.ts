// The whole-show computations the server runs in worker threads (lib/heavy/pool.ts), by name. This
// module is the workers' entry point: it and all it imports must be pure (no framework, no database).
import { hearingMap } from "@/lib/acoustics/hearing";
import { phrasePlan } from "@/lib/analysis/phrase-plan";
import { setSweeps, sweepHashes } from "@/lib/analysis/show-sweeps";
import { readShowFile } from "@/lib/show-file/read";

export const HEAVY_TASKS = { sweepHashes, setSweeps, hearingMap, readShowFile, phrasePlan };

export type HeavyTask = keyof typeof HEAVY_TASKS;
export type HeavyArgs<K extends HeavyTask> = Parameters<(typeof HEAVY_TASKS)[K]>;
export type HeavyResult<K extends HeavyTask> = ReturnType<(typeof HEAVY_TASKS)[K]>;

/** One task in a worker: piscina calls the default export with what `run()` was given. */
export default function runTask<K extends HeavyTask>({ task, args }: { task: K; args: HeavyArgs<K> }): HeavyResult<K> {
  return (HEAVY_TASKS[task] as unknown as (...a: HeavyArgs<K>) => HeavyResult<K>)(...args);
}
