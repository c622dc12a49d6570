// The ground and background choices the settings page offers, with where each value comes from.
import { BACKGROUND_PRESET_SPECS, BACKGROUND_PRESETS } from "@/lib/acoustics/background";

export interface GroundChoice {
  key: string;
  label: string;
  /** ISO 9613-2 G; null for no ground term. */
  g: number | null;
  source: string;
}

// ISO 9613-2 §7.3.1: G = 1 porous (grass, farmland), G = 0 hard (paving, water, concrete) — the
// standard's wording from memory; synthetic turf and a running track are not in the standard: from memory.
export const FIELD_SURFACES: GroundChoice[] = [
  { key: "grass", label: "Natural grass", g: 1, source: "porous ground, G = 1 (ISO 9613-2 §7.3.1)" },
  { key: "turf", label: "Synthetic turf", g: 0.5, source: "G = 0.5, from memory (turf over a shock pad is partly porous)" },
  { key: "none", label: "Leave the ground out", g: null, source: "no ground term" },
];

export const BETWEEN_SURFACES: GroundChoice[] = [
  { key: "same", label: "The same as the field", g: null, source: "the field's G" },
  { key: "hard", label: "Running track, concrete or paving", g: 0, source: "hard ground, G = 0 (ISO 9613-2 §7.3.1; a track's rubber over asphalt as hard: from memory)" },
  { key: "grass", label: "Grass", g: 1, source: "porous ground, G = 1 (ISO 9613-2 §7.3.1)" },
];

export const POINT_SURROUNDINGS: GroundChoice[] = [
  { key: "between", label: "The ground between", g: null, source: "the ground between field and stands" },
  { key: "stands", label: "Concrete stands", g: 0, source: "hard ground, G = 0 (ISO 9613-2 §7.3.1)" },
  { key: "grass", label: "Grass", g: 1, source: "porous ground, G = 1 (ISO 9613-2 §7.3.1)" },
];

/** The choice a stored G matches, or "custom". */
export function choiceOf(choices: GroundChoice[], g: number | null | undefined): string {
  return choices.find((c) => c.g === (g ?? null))?.key ?? "custom";
}

export const BACKGROUND_CHOICES = [
  { key: "none", label: "None (the band alone)", source: "" },
  ...BACKGROUND_PRESETS.map((p) => ({ key: p, label: `${BACKGROUND_PRESET_SPECS[p].label} (about ${Math.round(BACKGROUND_PRESET_SPECS[p].dbA)} dBA)`, source: BACKGROUND_PRESET_SPECS[p].source })),
  { key: "custom", label: "Custom octave levels", source: "your own measurement, in dB SPL per octave band" },
];

export const OCTAVE_LABELS = ["63", "125", "250", "500", "1k", "2k", "4k", "8k"];
