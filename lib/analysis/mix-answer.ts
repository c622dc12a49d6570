// The API's `mix` object (shared/API.md) from one point of the engine's result, with band levels added.
import { toJsonSafe } from "@/lib/acoustics";
import type { PointResult } from "@/lib/acoustics/types";

export function mixOf(point: PointResult) {
  const pick = (o: Record<string, { dbA: number; bandsDb: number[] } | undefined>) =>
    Object.fromEntries(Object.entries(o).flatMap(([k, v]) => (v ? [[k, { dbA: v.dbA, bandsDb: v.bandsDb }]] : [])));
  return toJsonSafe({
    totalDbA: point.totalDbA,
    voices: pick(point.voices),
    sections: pick(point.sections),
    performers: point.performers.map((p) => ({ performerId: p.id, dbA: p.dbA, arrivalMs: p.arrivalMs })),
    arrivalSpreadMs: point.arrivalSpreadMs,
  });
}
