// Lists keyed by an id must name each key once: the database writes them in one upsert, which
// cannot touch a row twice, and two entries for one key would contradict each other anyway.
import type { z } from "./zod";

/** A superRefine for an array: one issue at each entry whose key an earlier entry already has. */
export function uniqueBy<T>(key: (item: T) => string, message: (item: T) => string) {
  return (list: T[], ctx: z.RefinementCtx) => {
    const seen = new Set<string>();
    list.forEach((item, i) => {
      const k = key(item);
      if (seen.has(k)) ctx.addIssue({ code: "custom", message: message(item), path: [i] });
      seen.add(k);
    });
  };
}
