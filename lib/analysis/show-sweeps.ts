// Every set's transition sweep of a show at every listening point: stored per set, recomputed
// only for the sets whose inputs changed (their own or the previous set's positions, the voicing…).
import { createHash } from "node:crypto";
import { BALANCE_VERSION } from "@/lib/acoustics/targets";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { setInputs } from "./balance-inputs";
import type { ShowBalance } from "./show-context";
import { sweepTransition, type SweepSample } from "./sweep";

export const SWEEP_VERSION = `${MODEL_VERSION}+${BALANCE_VERSION}+sweep-3`; // sweep-2: samples name the checks with nothing to judge; sweep-3: loudness in sones

export interface SetSweep {
  setId: string;
  number: string;
  order: number;
  counts: number;
  /** Samples per listening point id. */
  points: Record<string, SweepSample[]>;
}

export interface SweepStore {
  list(setIds: string[]): Promise<{ setId: string; listeningPointId: string; inputsHash: string; modelVersion: string; result: unknown }[]>;
  save(rows: { setId: string; listeningPointId: string; inputsHash: string; modelVersion: string; result: unknown }[]): Promise<unknown>;
}

/** What a sweep needs of a show: the balance context, the sets with their positions, the points and targets. */
export type SweepShow = Pick<ShowBalance, "ctx" | "sets" | "listeningPoints" | "targets">;
export type StoredSweepKey = Omit<Awaited<ReturnType<SweepStore["list"]>>[number], "result">;
/** Each set's inputs hash, and the sweeps computed now for the sets the store did not match. */
export interface StaleSweeps {
  hashes: Record<string, string>;
  computed: Record<string, Record<string, SweepSample[]>>;
}
/** Runs staleSweeps, in this thread or another. */
export type SweepRunner = (sb: SweepShow, stored: StoredSweepKey[]) => Promise<StaleSweeps>;

/**
 * Pure: hashes the inputs of each set's sweep (the same for every listening point but stored per point)
 * and computes the sweeps of the sets whose stored rows do not all match.
 */
export function staleSweeps(sb: SweepShow, stored: StoredSweepKey[]): StaleSweeps {
  const key = (setId: string, lp: string) => `${setId}\u0000${lp}`;
  const byKey = new Map(stored.map((r) => [key(r.setId, r.listeningPointId), r]));
  const lpIds = sb.listeningPoints.map((l) => l.id);
  const out: StaleSweeps = { hashes: {}, computed: {} };
  sb.sets.forEach((set, i) => {
    const prev = i > 0 ? sb.sets[i - 1]! : null;
    const { played } = setInputs(sb.ctx, { order: set.order, positions: set.positions });
    const from = prev && prev.positions.length ? prev.positions : null;
    const hash = createHash("sha256").update(JSON.stringify({ played, from, counts: set.counts, targets: sb.targets })).digest("hex");
    out.hashes[set.id] = hash;
    const fresh = lpIds.every((lp) => {
      const r = byKey.get(key(set.id, lp));
      return r && r.inputsHash === hash && r.modelVersion === SWEEP_VERSION;
    });
    if (!fresh) out.computed[set.id] = sweepTransition(played, from, set.counts, sb.targets);
  });
  return out;
}

const inThisThread: SweepRunner = async (sb, stored) => staleSweeps(sb, stored);

/** All sweeps of the show; `recomputed` counts the sets computed now, the rest came from the store. */
export async function showSweeps(sb: SweepShow, store: SweepStore, run: SweepRunner = inThisThread): Promise<{ sweeps: SetSweep[]; recomputed: number; reused: number }> {
  const stored = await store.list(sb.sets.map((s) => s.id));
  const { hashes, computed } = await run(
    { ctx: sb.ctx, sets: sb.sets, listeningPoints: sb.listeningPoints, targets: sb.targets },
    stored.map(({ result: _result, ...k }) => k),
  );
  const results = new Map(stored.map((r) => [`${r.setId}\u0000${r.listeningPointId}`, r.result as SweepSample[]]));
  const lpIds = sb.listeningPoints.map((l) => l.id);
  const toSave: Parameters<SweepStore["save"]>[0] = [];
  const sweeps = sb.sets.map((set) => {
    const fresh = computed[set.id];
    const points = fresh ?? Object.fromEntries(lpIds.map((lp) => [lp, results.get(`${set.id}\u0000${lp}`)!]));
    if (fresh) for (const lp of lpIds) toSave.push({ setId: set.id, listeningPointId: lp, inputsHash: hashes[set.id]!, modelVersion: SWEEP_VERSION, result: fresh[lp] ?? [] });
    return { setId: set.id, number: set.number, order: set.order, counts: set.counts, points };
  });
  if (toSave.length) await store.save(toSave);
  const recomputed = Object.keys(computed).length;
  return { sweeps, recomputed, reused: sweeps.length - recomputed };
}
