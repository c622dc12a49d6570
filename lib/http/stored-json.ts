// JSON that is mostly already serialised (a stored json column read as text), so that a large stored
// result goes out without being parsed and serialised again on every read.

/** The text of `{...fields, ...stored}`, where `storedObject` is the text of a JSON object. */
export function jsonWithStoredObject(fields: Record<string, unknown>, storedObject: string): string {
  const stored = storedObject.trim();
  if (!stored.startsWith("{") || !stored.endsWith("}")) throw new Error("The stored value is not a JSON object.");
  const parts = [JSON.stringify(fields).slice(1, -1), stored.slice(1, -1).trim()].filter(Boolean);
  return `{${parts.join(",")}}`;
}
