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
/** Each set's inputs hash, and the sets whose stored rows do not all match it. */
export interface SweepHashes {
  hashes: Record<string, string>;
  stale: string[];
}
export type ComputedSweeps = Record<string, Record<string, SweepSample[]>>;
/** Runs the two pure steps below, in this thread or another. */
export interface SweepRunner {
  hashes(sb: SweepShow, stored: StoredSweepKey[]): Promise<SweepHashes>;
  sweeps(sb: SweepShow, setIds: string[]): Promise<ComputedSweeps>;
}

/** What the sweep of the show's i-th set reads: its played inputs, and where the players come from (none for the first set). */
function transitionInputs(sb: SweepShow, i: number) {
  const set = sb.sets[i]!;
  const prev = i > 0 ? sb.sets[i - 1]! : null;
  const { played } = setInputs(sb.ctx, { order: set.order, positions: set.positions });
  return { set, played, from: prev && prev.positions.length ? prev.positions : null };
}

/** Pure: hashes the inputs of each set's sweep (the same for every listening point but stored per point). */
export function sweepHashes(sb: SweepShow, stored: StoredSweepKey[]): SweepHashes {
  const key = (setId: string, lp: string) => `${setId}\u0000${lp}`;
  const byKey = new Map(stored.map((r) => [key(r.setId, r.listeningPointId), r]));
  const lpIds = sb.listeningPoints.map((l) => l.id);
  const out: SweepHashes = { hashes: {}, stale: [] };
  sb.sets.forEach((_, i) => {
    const { set, played, from } = transitionInputs(sb, i);
    const hash = createHash("sha256").update(JSON.stringify({ played, from, counts: set.counts, targets: sb.targets })).digest("hex");
    out.hashes[set.id] = hash;
    const fresh = lpIds.every((lp) => {
      const r = byKey.get(key(set.id, lp));
      return r && r.inputsHash === hash && r.modelVersion === SWEEP_VERSION;
    });
    if (!fresh) out.stale.push(set.id);
  });
  return out;
}

/** Pure: the sweeps of the given sets, each from the set before it, per listening point. */
export function setSweeps(sb: SweepShow, setIds: string[]): ComputedSweeps {
  const out: ComputedSweeps = {};
  sb.sets.forEach((s, i) => {
    if (!setIds.includes(s.id)) return;
    const { set, played, from } = transitionInputs(sb, i);
    out[set.id] = sweepTransition(played, from, set.counts, sb.targets);
  });
  return out;
}

const inThisThread: SweepRunner = { hashes: async (sb, stored) => sweepHashes(sb, stored), sweeps: async (sb, ids) => setSweeps(sb, ids) };

/** At most this many steps of progress: each is one task, so fewer steps cost less handing the show to a worker. */
const PROGRESS_STEPS = 8;

/**
 * All sweeps of the show; `recomputed` counts the sets computed now, the rest came from the store.
 * `onProgress` hears how many of the sets to compute are done, after each step.
 */
export async function showSweeps(
  sb: SweepShow,
  store: SweepStore,
  run: SweepRunner = inThisThread,
  onProgress: (done: number, total: number) => void = () => {},
): Promise<{ sweeps: SetSweep[]; recomputed: number; reused: number }> {
  const stored = await store.list(sb.sets.map((s) => s.id));
  const show: SweepShow = { ctx: sb.ctx, sets: sb.sets, listeningPoints: sb.listeningPoints, targets: sb.targets };
  const { hashes, stale } = await run.hashes(show, stored.map(({ result: _result, ...k }) => k));
  const computed: ComputedSweeps = {};
  const size = Math.ceil(stale.length / PROGRESS_STEPS);
  onProgress(0, stale.length);
  for (let i = 0; i < stale.length; i += size) {
    Object.assign(computed, await run.sweeps(show, stale.slice(i, i + size)));
    onProgress(Math.min(i + size, stale.length), stale.length);
  }
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
