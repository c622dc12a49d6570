// A set's parts at a listening point, from the engine's result as written and the balance plan.
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { dbToEnergy, energyToDb } from "@/lib/acoustics/levels";
import type { InstrumentCatalog, PerformerInput, PointResult, Voice } from "@/lib/acoustics/types";
import type { ListenPart } from "./types";

/** A plan entry as Listen reads it: the players it changes and by how much. */
export interface PlanChange {
  performerIds: readonly string[];
  /** Null where the stored answer held no finite change: taken as none. */
  changeDb: number | null;
}

interface Player {
  instrument: string;
  energyA: number;
  bandsDb: number[];
  arrivalMs: number;
  changeDb: number;
}

/**
 * One part per section and voice that sounds at the point. A part's arrival is the mean of its players'
 * arrivals weighted by their A-weighted energy: the section is heard as one sound led by its loudest
 * players, and unlike the single loudest player it does not jump when two players are nearly as loud.
 */
export function listenParts(point: PointResult, performers: readonly PerformerInput[], plan: readonly PlanChange[], instruments?: InstrumentCatalog): ListenPart[] {
  const catalog = { ...DEFAULT_INSTRUMENTS, ...(instruments ?? {}) };
  const change = new Map<string, number>();
  for (const e of plan) for (const id of e.performerIds) change.set(id, e.changeDb ?? 0);
  const byId = new Map(performers.map((p) => [p.id, p]));
  const groups = new Map<string, { section: string; voice: Voice; players: Player[] }>();
  for (const r of point.performers) {
    const p = byId.get(r.id);
    if (!p || p.voice === "tacet" || !(r.dbA > -Infinity)) continue;
    const key = `${p.section}|${p.voice}`;
    const g = groups.get(key) ?? { section: p.section, voice: p.voice, players: [] };
    g.players.push({ instrument: p.instrument, energyA: dbToEnergy(r.dbA), bandsDb: r.bandsDb, arrivalMs: r.arrivalMs, changeDb: change.get(r.id) ?? 0 });
    groups.set(key, g);
  }
  return [...groups].map(([key, g]) => {
    const total = g.players.reduce((s, p) => s + p.energyA, 0);
    const loudest = g.players.reduce((a, b) => (b.energyA > a.energyA ? b : a));
    const spec = catalog[loudest.instrument];
    const bandsDb = loudest.bandsDb.map((_, b) => energyToDb(g.players.reduce((s, p) => s + dbToEnergy(p.bandsDb[b]!), 0)));
    const withPlan = g.players.reduce((s, p) => s + p.energyA * dbToEnergy(p.changeDb), 0);
    return {
      key,
      section: g.section,
      voice: g.voice,
      family: spec?.family ?? "brass",
      register: spec?.register ?? "tenor",
      bandsDb,
      planChangeDb: energyToDb(withPlan / total),
      arrivalMs: g.players.reduce((s, p) => s + p.energyA * p.arrivalMs, 0) / total,
    };
  });
}
