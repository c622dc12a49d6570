// The balance checks' names as people read them (pages, printouts, e-mail): never the check ids.
import type { CheckId } from "@/lib/acoustics/types";

export const CHECK_LABELS: Readonly<Record<CheckId | (string & {}), string>> = {
  "melody-forward": "Melody forward",
  "bass-up-pyramid": "Bass-up pyramid",
  "depth-support": "Depth support",
  "wide-form-edges": "Wide-form edges",
  "stand-outs": "Stand-outs",
  "arrival-spread": "Arrival spread",
};
