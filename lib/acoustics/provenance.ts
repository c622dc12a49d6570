// How sure the catalog is of each instrument: where its numbers come from and how far off its
// level at a listening point may be (dB, about one standard deviation).
import type { InstrumentCatalog, InstrumentSpec } from "./types";

export type ProvenanceKind = "source" | "memory" | "fitted";

export interface InstrumentProvenance {
  kind: ProvenanceKind;
  /** In words: the source, "from memory", or "fitted from N box readings". */
  text: string;
  /** About one standard deviation of the instrument's level at a listening point (dB). */
  uncertaintyDb: number;
}

/**
 * Uncertainty of an instrument whose levels are from memory: the sound power one player makes at
 * one written dynamic varies by several dB between players and published tables (from memory, not
 * checked). Everest's Table 5-1 bounds only the peaks, so the catalog's other levels count here.
 */
export const MEMORY_UNCERTAINTY_DB = 5;
/** Uncertainty of a value a named source gives for this use (a custom catalog may say so). */
export const SOURCED_UNCERTAINTY_DB = 2;
/** Below this a level is shown to 0.1 dB; at or above it to whole dB. */
export const TENTH_DB_BELOW = 1;

/** The spec's provenance: an adopted fit first, then the spec's own uncertainty, else from memory. */
export function instrumentProvenance(spec: InstrumentSpec): InstrumentProvenance {
  if (spec.fit) {
    const n = spec.fit.readings;
    return { kind: "fitted", text: `fitted from ${n} box reading${n === 1 ? "" : "s"}`, uncertaintyDb: spec.fit.stdErrorDb };
  }
  if (spec.uncertaintyDb !== undefined) {
    return { kind: "source", text: spec.source, uncertaintyDb: spec.uncertaintyDb };
  }
  return { kind: "memory", text: spec.source, uncertaintyDb: MEMORY_UNCERTAINTY_DB };
}

/** Provenance of every instrument of a catalog, by key. */
export function catalogProvenance(catalog: InstrumentCatalog): Record<string, InstrumentProvenance> {
  return Object.fromEntries(Object.entries(catalog).map(([k, s]) => [k, instrumentProvenance(s)]));
}

/** Shown precision (dB) for a level of this uncertainty: 0.1 when it is under 1 dB, else 1. */
export function shownPrecisionDb(uncertaintyDb: number): 0.1 | 1 {
  return uncertaintyDb < TENTH_DB_BELOW ? 0.1 : 1;
}
