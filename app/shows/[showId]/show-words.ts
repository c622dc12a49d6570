// Plain words for a show's settings, as the overview prints them.

/** ISO 9613-2 clause 7.3.1: G = 0 hard ground, G = 1 porous ground, in between a mix; null leaves the ground term out. */
export function groundWords(g: number | null): { name: string; meaning: string } {
  if (g === null) return { name: "None", meaning: "The ground effect is left out of the prediction." };
  if (g <= 0.05) return { name: "Hard", meaning: "Paving, water or packed earth: the ground reflects sound." };
  if (g >= 0.95) return { name: "Porous", meaning: "Grass or soft soil: the ground absorbs part of the sound." };
  return { name: "Mixed", meaning: `Part hard, part porous (about ${Math.round(g * 100)} % porous).` };
}
