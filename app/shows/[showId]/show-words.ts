// Plain words for a show's settings, as the overview prints them.
import type { FieldRules } from "@/components/api-types";

/** ISO 9613-2 clause 7.3.1: G = 0 hard ground, G = 1 porous ground, in between a mix; null leaves the ground term out. */
export function groundWords(g: number | null): { name: string; meaning: string } {
  if (g === null) return { name: "None", meaning: "The ground effect is left out of the prediction." };
  if (g <= 0.05) return { name: "Hard", meaning: "Paving, water or packed earth: the ground reflects sound." };
  if (g >= 0.95) return { name: "Porous", meaning: "Grass or soft soil: the ground absorbs part of the sound." };
  return { name: "Mixed", meaning: `Part hard, part porous (about ${Math.round(g * 100)} % porous).` };
}

// Hash distances from the sidelines: high-school (NFHS) 53 ft 4 in, college (NCAA) 60 ft — from memory.
export const FIELD_RULES_WORDS: Record<FieldRules, { name: string; hashes: string }> = {
  "high-school": { name: "High school", hashes: "Hashes 53 ft 4 in from each sideline (the field in thirds)." },
  college: { name: "College", hashes: "Hashes 60 ft from each sideline (40 ft apart)." },
};

/** Where a listening point is across the field: y < 0 is behind the front sideline. */
export function depthWords(y: number): string {
  const m = Math.abs(Math.round(y * 10) / 10);
  if (m === 0) return "on the front sideline";
  return y < 0 ? `${m} m behind the front sideline` : `${m} m in from the front sideline`;
}
