// What each balance threshold means, in the words the form shows, with where its default comes from.
export const TARGET_FIELDS = [
  { key: "melodyLeadDb", label: "Melody forward: lead over every other voice", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "pyramidToleranceDb", label: "Bass-up pyramid: a lower register may sit below a higher one by at most", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "depthToleranceDb", label: "Depth support: front players may reach the box louder than back players by at most", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "wideFormWidthM", label: "Wide-form edges: check forms wider than", unit: "m", step: 1, basis: "40 yards; common practice, no source" },
  { key: "edgeToleranceDb", label: "Wide-form edges: end players may be louder than the centre by at most", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "standOutDb", label: "Stand-outs: a player may be above the rest of the section by at most", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "arrivalSpreadMs", label: "Arrival spread: nearest to farthest sounding player at most", unit: "ms", step: 5, basis: "echo threshold for music, from memory" },
  { key: "blendToleranceDb", label: "Balance plan: sections doubling a voice stay within", unit: "dB", step: 0.5, basis: "common practice, no source" },
  { key: "setChangeDb", label: "Set compare: flag a voice that changes from one set to the next by more than", unit: "dB", step: 0.5, basis: "common practice, no source" },
] as const;

export type TargetKey = (typeof TARGET_FIELDS)[number]["key"];
