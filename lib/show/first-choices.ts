// What a show page opens on before the person picks anything. The views and the pages that preload
// their data both read these, so the preloaded answer is the one the view asks for.

/** The press box when the show has a point by that name (the demo's and a new show's), else the first point. */
export function firstListeningPointId(points: { id: string; name: string }[]): string | null {
  return (points.find((p) => p.name === "Press box") ?? points[0])?.id ?? null;
}

/** Set compare: the chosen first set (or the show's first) and the chosen second (or the set after the first). */
export function comparedSets(sets: { id: string }[], a: string | null, b: string | null): { aId: string | null; bId: string | null } {
  const aId = a ?? sets[0]?.id ?? null;
  const bId = b ?? sets[sets.findIndex((s) => s.id === aId) + 1]?.id ?? null;
  return { aId, bId };
}

/** The rehearsal length the hearing map opens on (minutes). */
export const FIRST_REHEARSAL_MINUTES = 120;
