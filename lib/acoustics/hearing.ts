// The hearing map: the A-weighted level at each performer's ears from every other performer of
// the set (front ensemble and amplification included, as performers), and the daily noise dose
// of a rehearsal at that level under NIOSH 98-126 and OSHA 29 CFR 1910.95. Estimates for
// cautions only; the school's or venue's rules and licensed audiologists decide.
import { createSetEvaluator, MIN_DISTANCE_M } from "./evaluator";
import { AcousticsInputError, requireFinite } from "./errors";
import { dailyDose, exposureLimitMinutes, type ExposureStandard } from "./exposure";
import type { AnalysisInput } from "./types";
import { DEFAULT_SOURCE_HEIGHT_M } from "./validate";

/** Ear height of a standing player (m). */
export const EAR_HEIGHT_M = 1.6;
/** A neighbour closer than this counts as this far: the point-source model does not hold nearer. */
export const HEARING_MIN_DISTANCE_M = 1;

export interface HearingOptions {
  /** Length of the rehearsal at this set's level (minutes). */
  rehearsalMinutes: number;
  earHeightM?: number;
  minDistanceM?: number;
}

export interface ExposureAt {
  /** Daily time allowed at this level (minutes; Infinity when nothing sounds). */
  limitMinutes: number;
  /** Dose of the rehearsal as a fraction of the allowed daily dose (1 = 100 %). */
  dose: number;
}

export interface PerformerHearing {
  id: string;
  /** A-weighted level at the ears from everyone else (dBA; -Infinity when no one else sounds). */
  dbA: number;
  /** The performer heard loudest, or null. */
  loudestSourceId: string | null;
  exposure: Record<ExposureStandard, ExposureAt>;
}

export interface HearingMap {
  earHeightM: number;
  minDistanceM: number;
  rehearsalMinutes: number;
  performers: PerformerHearing[];
}

const STANDARDS: ExposureStandard[] = ["niosh", "osha"];

/**
 * Level at every performer's ears (earHeightM above their spot) from every other performer,
 * through the same engine as the box mix (power, directivity, spreading, air, ground), with
 * distances under minDistanceM counted as minDistanceM; and each player's dose for the rehearsal.
 * The player's own instrument is not counted.
 */
export function hearingMap(input: AnalysisInput, options: HearingOptions): HearingMap {
  const minutes = requireFinite(options?.rehearsalMinutes, "rehearsalMinutes");
  if (minutes < 0) throw new AcousticsInputError("rehearsalMinutes", "must not be negative");
  const earHeightM = requireFinite(options.earHeightM ?? EAR_HEIGHT_M, "earHeightM");
  if (earHeightM < 0) throw new AcousticsInputError("earHeightM", "must not be negative");
  const minDistanceM = requireFinite(options.minDistanceM ?? HEARING_MIN_DISTANCE_M, "minDistanceM");
  if (minDistanceM < MIN_DISTANCE_M) throw new AcousticsInputError("minDistanceM", `must be at least ${MIN_DISTANCE_M}`);
  if (input === null || typeof input !== "object" || !Array.isArray(input.performers)) {
    throw new AcousticsInputError("performers", "must be an array");
  }

  const ears = input.performers.map((p, i) => ({ id: `ears:${i}`, x: p?.x, y: p?.y, z: earHeightM }));
  const evaluator = createSetEvaluator({ ...input, listeningPoints: ears });
  evaluator.evaluate();
  const points = evaluator.result().points;
  const performers = input.performers;

  return {
    earHeightM,
    minDistanceM,
    rehearsalMinutes: minutes,
    performers: performers.map((listener, n) => {
      let energy = 0;
      let loudest = -Infinity;
      let loudestSourceId: string | null = null;
      points[n]!.performers.forEach((source, p) => {
        if (p === n) return;
        // Stryker disable next-line ConditionalExpression,UnaryOperator: a silent source adds 10^(−∞/10) = 0 and never beats loudest, which starts at −∞
        if (source.dbA === -Infinity) return;
        const s = performers[p]!;
        const dz = earHeightM - (s.z ?? DEFAULT_SOURCE_HEIGHT_M);
        const r = Math.hypot(listener.x - s.x, listener.y - s.y, dz);
        // The engine spread to max(r, MIN_DISTANCE_M); move that to max(r, minDistanceM).
        const engineR = Math.max(r, MIN_DISTANCE_M);
        const heardR = Math.max(r, minDistanceM);
        const level = source.dbA - 20 * Math.log10(heardR / engineR);
        energy += 10 ** (level / 10);
        if (level > loudest) {
          loudest = level;
          loudestSourceId = s.id;
        }
      });
      const dbA = 10 * Math.log10(energy);
      const exposure = Object.fromEntries(
        STANDARDS.map((std) => [std, { limitMinutes: exposureLimitMinutes(dbA, std), dose: dailyDose(dbA, minutes, std) }]),
      ) as Record<ExposureStandard, ExposureAt>;
      return { id: listener.id, dbA, loudestSourceId, exposure };
    }),
  };
}
