// JSON-safe copies: levels of silence are -Infinity, which JSON cannot hold.

/** `T` with every number widened to number | null, as toJsonSafe returns it. */
export type JsonSafe<T> = T extends number
  ? number | null
  : T extends readonly (infer U)[]
    ? JsonSafe<U>[]
    : T extends object
      ? { [K in keyof T]: JsonSafe<T[K]> }
      : T;

/** Deep copy with every non-finite number (±Infinity, NaN) replaced by null. */
export function toJsonSafe<T>(value: T): JsonSafe<T> {
  if (typeof value === "number") return (Number.isFinite(value) ? value : null) as JsonSafe<T>;
  if (Array.isArray(value)) return value.map((v) => toJsonSafe(v)) as JsonSafe<T>;
  if (ArrayBuffer.isView(value)) return Array.from(value as unknown as ArrayLike<number>, (v) => toJsonSafe(v)) as JsonSafe<T>;
  if (value !== null && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = toJsonSafe(v);
    return out as JsonSafe<T>;
  }
  return value as JsonSafe<T>;
}
