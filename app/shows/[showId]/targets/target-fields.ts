// What each balance threshold means, in the words the form shows, and where its default comes from
// (printed on the "Where the numbers come from" page, not in the form). `perUnit`: stored value per
// unit shown (the wide-form width is stored in metres and shown in yards).
export const TARGET_FIELDS = [
  { key: "melodyLeadDb", label: "Melody forward: loudness lead over every other wind voice", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "batteryOverWindsDb", label: "Battery with the winds: the battery may be louder than the winds by at most", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "pyramidToleranceDb", label: "Bass-up pyramid: a lower register may sound softer than the next one up by at most", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "depthToleranceDb", label: "Depth support: farther players may be thinner than their distance explains by at most", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "wideFormWidthM", label: "Wide-form edges: check forms wider than", unit: "yards", perUnit: 0.9144, step: 1, basis: "40 yards; common practice, no source" },
  { key: "edgeToleranceDb", label: "Wide-form edges: a section's end players may be louder than its centre by at most", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "standOutDb", label: "Stand-outs: a player may be above the rest of the section's part by at most", unit: "phon", step: 0.5, basis: "common practice, no source" },
  { key: "arrivalSpreadMs", label: "Arrival spread: first to last arrival among the players you hear best at most", unit: "ms", step: 5, basis: "echo at 40–50 ms (Truax, Handbook for Acoustic Ecology)" },
  { key: "arrivalWindowDb", label: "Arrival window: compare only the players within this of the loudest", unit: "dB", step: 1, basis: "precedence needs levels within about 10 dB (Burg, Romney, Schwartz, Digital Sound & Music)" },
  { key: "heardMarginDb", label: "Heard at the box: a voice counts as heard down to this far from its masked threshold", unit: "dB", step: 0.5, basis: "ISO/IEC 11172-3 masking, less a few dB for direction (from memory)" },
  { key: "setChangeDb", label: "Set compare: flag a voice that changes from one set to the next by more than", unit: "dB", step: 0.5, basis: "common practice, no source" },
] as const;

export type TargetKey = (typeof TARGET_FIELDS)[number]["key"];

/** Stored value per unit shown: 0.9144 for a width shown in yards, else 1. */
export function perUnit(key: TargetKey): number {
  const f = TARGET_FIELDS.find((t) => t.key === key);
  return f && "perUnit" in f ? f.perUnit : 1;
}
