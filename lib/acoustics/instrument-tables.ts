// Per-instrument tables the evaluator reads: checked once, band powers for every dynamic and
// the flattened directivity. Deep-frozen specs (the default catalog, or frozen overrides) cannot
// change, so their tables are kept across calls; other specs are compiled on every call.
import { BAND_COUNT } from "./bands";
import { compileDirectivity, type CompiledDirectivity } from "./directivity";
import { instrumentBandsInto, validateInstrumentSpec } from "./instrument";
import { DYNAMICS, type Dynamic, type InstrumentSpec } from "./types";

export interface InstrumentTables {
  /** Lw per band for each dynamic: [dynamicIndex · BAND_COUNT + band]. */
  bandsByDynamic: Float64Array;
  directivity: CompiledDirectivity;
}

const frozenCache = new WeakMap<InstrumentSpec, InstrumentTables>();

function isDeepFrozen(value: unknown): boolean {
  if (value === null || typeof value !== "object") return true;
  return Object.isFrozen(value) && Object.values(value).every(isDeepFrozen);
}

/** Tables of one instrument; `field` names it in error messages (e.g. `instruments.trumpet`). */
export function instrumentTables(spec: InstrumentSpec, field: string): InstrumentTables {
  const cached = frozenCache.get(spec);
  if (cached) return cached;
  validateInstrumentSpec(spec, field);
  const bandsByDynamic = new Float64Array(DYNAMICS.length * BAND_COUNT);
  DYNAMICS.forEach((d: Dynamic, i) => instrumentBandsInto(spec, d, bandsByDynamic, i * BAND_COUNT));
  const tables = { bandsByDynamic, directivity: compileDirectivity(spec.directivity, `${field}.directivity`) };
  if (isDeepFrozen(spec)) frozenCache.set(spec, tables);
  return tables;
}
