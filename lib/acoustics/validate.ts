// Checks of analysis input; every error names its field, e.g. `performers[3].x`.
import { validateAir } from "./atmosphere";
import { AcousticsInputError, requireFinite, requireInRange } from "./errors";
import { DYNAMICS, VOICES, type Conditions, type ListeningPointInput, type PerformerInput } from "./types";

/** Source height when a performer gives none: a wind player's bell, about 1.5 m. */
export const DEFAULT_SOURCE_HEIGHT_M = 1.5;

function requireId(value: unknown, field: string): string {
  if (typeof value !== "string" || value.length === 0) throw new AcousticsInputError(field, "must be a non-empty string");
  return value;
}

function requireUnique(ids: string[], field: string): void {
  const seen = new Set<string>();
  ids.forEach((id, i) => {
    if (seen.has(id)) throw new AcousticsInputError(`${field}[${i}].id`, `"${id}" is used twice`);
    seen.add(id);
  });
}

/** Throws unless conditions are usable (air within range, ground factor 0…1 or null). */
export function validateConditions(conditions: Conditions): void {
  validateAir(conditions, "conditions.");
  if (conditions.groundFactor !== null) requireInRange(conditions.groundFactor, 0, 1, "conditions.groundFactor");
}

/** Throws unless every performer is complete; instrument keys are checked against the catalog. */
export function validatePerformers(performers: readonly PerformerInput[], hasInstrument: (key: string) => boolean): void {
  if (!Array.isArray(performers)) throw new AcousticsInputError("performers", "must be an array");
  performers.forEach((p, i) => {
    const f = `performers[${i}]`;
    if (p === null || typeof p !== "object") throw new AcousticsInputError(f, "must be an object");
    requireId(p.id, `${f}.id`);
    requireId(p.section, `${f}.section`);
    if (typeof p.instrument !== "string" || !hasInstrument(p.instrument)) {
      throw new AcousticsInputError(`${f}.instrument`, `"${String(p.instrument)}" is not in the instrument catalog`);
    }
    if (p.voice !== "tacet" && !(VOICES as readonly string[]).includes(p.voice)) {
      throw new AcousticsInputError(`${f}.voice`, `must be one of ${VOICES.join(", ")}, tacet`);
    }
    if (!(DYNAMICS as readonly string[]).includes(p.dynamic)) {
      throw new AcousticsInputError(`${f}.dynamic`, `must be one of ${DYNAMICS.join(", ")}`);
    }
    requireFinite(p.x, `${f}.x`);
    requireFinite(p.y, `${f}.y`);
    if (p.z !== undefined && requireFinite(p.z, `${f}.z`) < 0) throw new AcousticsInputError(`${f}.z`, "must not be negative");
    requireFinite(p.facingDeg, `${f}.facingDeg`);
    if (p.strengthDb !== undefined) requireFinite(p.strengthDb, `${f}.strengthDb`);
  });
  requireUnique(performers.map((p) => p.id), "performers");
}

/** Throws unless every listening point has an id and finite coordinates at or above the ground. */
export function validateListeningPoints(points: readonly ListeningPointInput[]): void {
  if (!Array.isArray(points)) throw new AcousticsInputError("listeningPoints", "must be an array");
  points.forEach((pt, i) => {
    const f = `listeningPoints[${i}]`;
    if (pt === null || typeof pt !== "object") throw new AcousticsInputError(f, "must be an object");
    requireId(pt.id, `${f}.id`);
    requireFinite(pt.x, `${f}.x`);
    requireFinite(pt.y, `${f}.y`);
    if (requireFinite(pt.z, `${f}.z`) < 0) throw new AcousticsInputError(`${f}.z`, "must not be negative");
  });
  requireUnique(points.map((p) => p.id), "listeningPoints");
}
