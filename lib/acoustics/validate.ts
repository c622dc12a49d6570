// Checks of analysis input; every error names its field, e.g. `performers[3].x`.
import { validateAir } from "./atmosphere";
import { validateBackground } from "./background";
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
  const between = conditions.betweenGroundFactor;
  if (between !== undefined && between !== null) requireInRange(between, 0, 1, "conditions.betweenGroundFactor");
}

const VOICE_SET: ReadonlySet<string> = new Set<string>([...VOICES, "tacet"]);
const DYNAMIC_SET: ReadonlySet<string> = new Set<string>(DYNAMICS);
// Stryker disable next-line ConditionalExpression: Number.isFinite is false for every non-number (it does not convert), so the typeof test alone changes nothing
const isFiniteNumber = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

/** Throws unless every performer is complete; instrument keys are checked against the catalog. */
export function validatePerformers(performers: readonly PerformerInput[], hasInstrument: (key: string) => boolean): void {
  if (!Array.isArray(performers)) throw new AcousticsInputError("performers", "must be an array");
  const ids = new Set<string>();
  // Field names are built only on failure: this runs for every performer of every set.
  const fail = (i: number, field: string, problem: string) => new AcousticsInputError(`performers[${i}]${field}`, problem);
  for (let i = 0; i < performers.length; i++) {
    const p = performers[i];
    if (p === null || typeof p !== "object") throw fail(i, "", "must be an object");
    if (typeof p.id !== "string" || p.id.length === 0) throw fail(i, ".id", "must be a non-empty string");
    if (typeof p.section !== "string" || p.section.length === 0) throw fail(i, ".section", "must be a non-empty string");
    if (typeof p.instrument !== "string" || !hasInstrument(p.instrument)) {
      throw fail(i, ".instrument", `"${String(p.instrument)}" is not in the instrument catalog`);
    }
    if (!VOICE_SET.has(p.voice)) throw fail(i, ".voice", `must be one of ${VOICES.join(", ")}, tacet`);
    if (!DYNAMIC_SET.has(p.dynamic)) throw fail(i, ".dynamic", `must be one of ${DYNAMICS.join(", ")}`);
    if (!isFiniteNumber(p.x)) throw fail(i, ".x", "must be a finite number");
    if (!isFiniteNumber(p.y)) throw fail(i, ".y", "must be a finite number");
    if (p.z !== undefined) {
      if (!isFiniteNumber(p.z)) throw fail(i, ".z", "must be a finite number");
      if (p.z < 0) throw fail(i, ".z", "must not be negative");
    }
    if (!isFiniteNumber(p.facingDeg)) throw fail(i, ".facingDeg", "must be a finite number");
    if (p.strengthDb !== undefined && !isFiniteNumber(p.strengthDb)) throw fail(i, ".strengthDb", "must be a finite number");
    if (ids.has(p.id)) throw fail(i, ".id", `"${p.id}" is used twice`);
    ids.add(p.id);
  }
}

/** Throws unless every listening point has an id, finite coordinates at or above the ground and a valid background. */
export function validateListeningPoints(points: readonly ListeningPointInput[]): void {
  if (!Array.isArray(points)) throw new AcousticsInputError("listeningPoints", "must be an array");
  points.forEach((pt, i) => {
    const f = `listeningPoints[${i}]`;
    if (pt === null || typeof pt !== "object") throw new AcousticsInputError(f, "must be an object");
    requireId(pt.id, `${f}.id`);
    requireFinite(pt.x, `${f}.x`);
    requireFinite(pt.y, `${f}.y`);
    if (requireFinite(pt.z, `${f}.z`) < 0) throw new AcousticsInputError(`${f}.z`, "must not be negative");
    if (pt.groundFactor !== undefined && pt.groundFactor !== null) requireInRange(pt.groundFactor, 0, 1, `${f}.groundFactor`);
    if (pt.surroundingsM !== undefined && requireFinite(pt.surroundingsM, `${f}.surroundingsM`) < 0) {
      throw new AcousticsInputError(`${f}.surroundingsM`, "must not be negative");
    }
    validateBackground(pt.background, `${f}.background`);
  });
  requireUnique(points.map((p) => p.id), "listeningPoints");
}
