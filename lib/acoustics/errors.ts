// Input errors of the engine: the message names the offending field so the API layer can
// answer 400 with it.

/** Thrown for bad input; `field` is the path of the offending value, e.g. `performers[3].x`. */
export class AcousticsInputError extends Error {
  readonly field: string;
  constructor(field: string, problem: string) {
    super(`${field} ${problem}`);
    this.name = "AcousticsInputError";
    this.field = field;
  }
}

/** Throws unless `value` is a finite number. */
export function requireFinite(value: unknown, field: string): number {
  // Stryker disable next-line ConditionalExpression: Number.isFinite is false for anything not a number, so the type test only reads clearly
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new AcousticsInputError(field, "must be a finite number");
  }
  return value;
}

/** Throws unless `value` is a finite number within [min, max]. */
export function requireInRange(value: unknown, min: number, max: number, field: string): number {
  const v = requireFinite(value, field);
  if (v < min || v > max) throw new AcousticsInputError(field, `must be between ${min} and ${max}`);
  return v;
}
