// Each performer of a set joined with what reaches the listening point from them: the common
// ground of the balance checks and the balance plan.
import { DEFAULT_INSTRUMENTS } from "./catalog";
import { AcousticsInputError } from "./errors";
import { bandEnergies } from "./group-loudness";
import { sumLevelsDb } from "./levels";
import { DEFAULT_SOURCE_HEIGHT_M } from "./validate";
import type { AnalysisInput, Dynamic, Family, InstrumentCatalog, InstrumentSpec, PerformerInput, PointResult, Register, VoiceOrTacet } from "./types";

/** The catalog in force for an input: the defaults with the input's instruments laid over them. */
export function catalogOf(input: Pick<AnalysisInput, "instruments">): InstrumentCatalog {
  return input.instruments ? { ...DEFAULT_INSTRUMENTS, ...input.instruments } : DEFAULT_INSTRUMENTS;
}

export interface BoxPlayer {
  id: string;
  section: string;
  instrument: string;
  spec: InstrumentSpec;
  family: Family;
  register: Register;
  voice: VoiceOrTacet;
  dynamic: Dynamic;
  x: number;
  y: number;
  /** Distance (m) from the player to the listening point. */
  distanceM: number;
  /** A part marked solo (PerformerInput.solo). */
  solo: boolean;
  /** A-weighted level of this player at the listening point (dBA). */
  dbA: number;
  /** Unweighted band levels at the listening point (dB). */
  bandsDb: number[];
  /** Their energies, 10^(L/10) per band: computed once for every loudness sum the player is part of. */
  bandsE: Float64Array;
  arrivalMs: number;
}

/** The sounding performers (not tacet) with their levels at the point; throws if the result does not match the input. */
export function soundingPlayers(input: AnalysisInput, point: PointResult): BoxPlayer[] {
  const catalog = catalogOf(input);
  const byId = new Map(point.performers.map((p) => [p.id, p]));
  const lp = input.listeningPoints.find((p) => p.id === point.listeningPointId);
  return input.performers.flatMap((perf: PerformerInput) => {
    if (perf.voice === "tacet") return [];
    const res = byId.get(perf.id);
    if (!res) throw new AcousticsInputError("pointResult.performers", `has no entry for performer "${perf.id}"`);
    if (!Number.isFinite(res.dbA)) return [];
    const spec = catalog[perf.instrument];
    if (!spec) throw new AcousticsInputError("performers.instrument", `"${perf.instrument}" is not in the instrument catalog`);
    return [
      {
        id: perf.id,
        section: perf.section,
        instrument: perf.instrument,
        spec,
        family: spec.family,
        register: spec.register,
        voice: perf.voice,
        dynamic: perf.dynamic,
        x: perf.x,
        y: perf.y,
        distanceM: lp ? Math.hypot(perf.x - lp.x, perf.y - lp.y, (perf.z ?? DEFAULT_SOURCE_HEIGHT_M) - lp.z) : 0,
        solo: perf.solo === true,
        dbA: res.dbA,
        bandsDb: res.bandsDb,
        bandsE: bandEnergies(res.bandsDb),
        arrivalMs: res.arrivalMs,
      },
    ];
  });
}

/** Groups items by a key, keeping first-seen order. */
export function groupBy<T>(items: readonly T[], key: (item: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const item of items) {
    const k = key(item);
    const list = out.get(k);
    if (list) list.push(item);
    else out.set(k, [item]);
  }
  return out;
}

/** Energetic mean level per player of a group (dB): the sum less 10·log10 n. */
export function meanPerPlayerDb(levels: readonly number[]): number {
  return sumLevelsDb(levels) - 10 * Math.log10(levels.length);
}

/** A level difference in words, one decimal. */
export function formatDb(db: number): string {
  return `${Math.abs(db).toFixed(1)} dB`;
}
