// Where a number comes from, in words for the "Where the numbers come from" page: the code's
// markers ("common practice, no source", "from memory") said as a reader understands them. Pure.

const RULE_OF_THUMB = "a rule of thumb of the trade, with no published source";
const UNCHECKED = "an estimate not yet checked against a published source";

/** A provenance note as a person reads it; named sources pass through unchanged. */
export function plainSource(text: string): string {
  return text
    .replace(/common practice,\s*no source/gi, RULE_OF_THUMB)
    .replace(/\bno source\b/gi, "no published source")
    .replace(/\(from memory\)/gi, `(${UNCHECKED})`)
    .replace(/\bfrom memory\b/gi, UNCHECKED);
}
