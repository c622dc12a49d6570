// What to tell a person when a write is refused: the field problems (they say what to change), else the API's message.
import { ApiError } from "./fetcher";

export function errorText(e: unknown, fallback = "Could not save. Try again."): string {
  if (!(e instanceof ApiError)) return e instanceof Error && e.message ? e.message : fallback;
  const problems = [...new Set(Object.values(e.issues).flat())];
  return problems.length ? problems.slice(0, 3).join(" ") : e.message;
}
