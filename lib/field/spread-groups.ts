// The catalog's instruments grouped by how wide they throw their sound, for the marks' legend. Pure.
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import { soundSpreadDeg, spreadKind, type SpreadKind } from "./marks";

export interface SpreadGroup {
  kind: SpreadKind;
  /** A spread typical of the group: the median of its instruments (degrees). */
  spreadDeg: number;
  names: string[];
}

const ORDER: SpreadKind[] = ["narrow", "medium", "wide", "all round"];

/** Each kind of spread with the instruments of the catalog that have it (kinds with none left out). */
export function spreadGroups(catalog: InstrumentCatalog): SpreadGroup[] {
  const groups = new Map<SpreadKind, { spreads: number[]; names: string[] }>();
  for (const spec of Object.values(catalog)) {
    const spread = soundSpreadDeg(spec.directivity);
    const g = groups.get(spreadKind(spread)) ?? { spreads: [], names: [] };
    g.spreads.push(spread);
    g.names.push(spec.name);
    groups.set(spreadKind(spread), g);
  }
  return ORDER.flatMap((kind) => {
    const g = groups.get(kind);
    if (!g) return [];
    const sorted = [...g.spreads].sort((a, b) => a - b);
    return [{ kind, spreadDeg: sorted[Math.floor(sorted.length / 2)]!, names: g.names }];
  });
}
