// Every set's transition sweep of a show at every listening point: stored per set, recomputed
// only for the sets whose inputs changed (their own or the previous set's positions, the voicing…).
import { createHash } from "node:crypto";
import { BALANCE_VERSION } from "@/lib/acoustics/targets";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { setInputs } from "./balance-inputs";
import type { ShowBalance } from "./show-context";
import { sweepTransition, type SweepSample } from "./sweep";

export const SWEEP_VERSION = `${MODEL_VERSION}+${BALANCE_VERSION}+sweep-1`;

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

/** The inputs of each set's sweep and their hash (the same for every listening point but keyed per point). */
function plannedSweeps(sb: ShowBalance) {
  return sb.sets.map((set, i) => {
    const prev = i > 0 ? sb.sets[i - 1]! : null;
    const { played } = setInputs(sb.ctx, { order: set.order, positions: set.positions });
    const from = prev && prev.positions.length ? prev.positions : null;
    const hash = createHash("sha256").update(JSON.stringify({ played, from, counts: set.counts, targets: sb.targets })).digest("hex");
    return { set, played, from, hash };
  });
}

/** All sweeps of the show; `recomputed` counts the sets computed now, the rest came from the store. */
export async function showSweeps(sb: ShowBalance, store: SweepStore): Promise<{ sweeps: SetSweep[]; recomputed: number; reused: number }> {
  const planned = plannedSweeps(sb);
  const stored = await store.list(sb.sets.map((s) => s.id));
  const key = (setId: string, lp: string) => `${setId}\u0000${lp}`;
  const byKey = new Map(stored.map((r) => [key(r.setId, r.listeningPointId), r]));
  const lpIds = sb.listeningPoints.map((l) => l.id);
  const toSave: Parameters<SweepStore["save"]>[0] = [];
  let recomputed = 0;
  const sweeps = planned.map(({ set, played, from, hash }) => {
    const fresh = lpIds.every((lp) => {
      const r = byKey.get(key(set.id, lp));
      return r && r.inputsHash === hash && r.modelVersion === SWEEP_VERSION;
    });
    let points: Record<string, SweepSample[]>;
    if (fresh) points = Object.fromEntries(lpIds.map((lp) => [lp, byKey.get(key(set.id, lp))!.result as SweepSample[]]));
    else {
      recomputed++;
      points = sweepTransition(played, from, set.counts, sb.targets);
      for (const lp of lpIds) toSave.push({ setId: set.id, listeningPointId: lp, inputsHash: hash, modelVersion: SWEEP_VERSION, result: points[lp] ?? [] });
    }
    return { setId: set.id, number: set.number, order: set.order, counts: set.counts, points };
  });
  if (toSave.length) await store.save(toSave);
  return { sweeps, recomputed, reused: sweeps.length - recomputed };
}
