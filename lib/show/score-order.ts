// Sections in score order, as a director reads down a score: woodwinds, brass, battery, front ensemble,
// each section placed by its highest-scored instrument, then by name. Pure.
import { INSTRUMENT_OPTIONS } from "./instrument-names";

const RANK = new Map(INSTRUMENT_OPTIONS.map((o, i) => [o.key, i]));

/** The sections of a roster in score order, with their player counts. */
export function sectionsInScoreOrder(roster: readonly { section: string; instrument: string }[]): { name: string; players: number }[] {
  const bySection = new Map<string, { name: string; players: number; rank: number }>();
  for (const p of roster) {
    const rank = RANK.get(p.instrument) ?? RANK.size; // an instrument of the program's own after the built-in ones
    const s = bySection.get(p.section) ?? { name: p.section, players: 0, rank };
    s.players++;
    s.rank = Math.min(s.rank, rank);
    bySection.set(p.section, s);
  }
  return [...bySection.values()].sort((a, b) => a.rank - b.rank || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)).map(({ name, players }) => ({ name, players }));
}
