// The balance checks' names and meanings as people read them (pages, printouts, e-mail): never the check ids.
import type { CheckId } from "@/lib/acoustics/types";

export const CHECK_LABELS: Readonly<Record<CheckId | (string & {}), string>> = {
  "melody-forward": "Melody forward",
  "bass-up-pyramid": "Bass-up pyramid",
  "depth-support": "Depth support",
  "wide-form-edges": "Wide-form edges",
  "stand-outs": "Stand-outs",
  "arrival-spread": "Arrival spread",
  "battery-balance": "Battery with the winds",
  "heard-at-box": "Heard at the box",
};

/** What each check asks, in one sentence. */
export const CHECK_MEANINGS: Readonly<Record<CheckId | (string & {}), string>> = {
  "melody-forward": "The melody sounds louder than every other wind voice by the lead you set.",
  "bass-up-pyramid": "Lower registers sound at least as loud as higher ones, in each choir and across the band.",
  "depth-support": "Players farther from the listening point are not thinner than their distance explains.",
  "wide-form-edges": "In a wide form, a section's players at the ends are not louder than the same section's centre.",
  "stand-outs": "No player sounds far above the rest of their section on the same part; a soloist is never one.",
  "arrival-spread": "The players you hear best arrive close enough together not to sound as an echo.",
  "battery-balance": "The battery does not cover the winds.",
  "heard-at-box": "Every voice that plays can be heard over the rest of the band and the crowd.",
};
