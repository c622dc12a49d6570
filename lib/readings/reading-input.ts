// A stored box reading as the calibration's input: the set's positions, the sections that played
// at their written dynamic (everyone else tacet), the meter where it was, the evening's air.
import type { BoxReading } from "@/lib/acoustics/calibration";
import type { Conditions, PerformerInput } from "@/lib/acoustics/types";
import type { RosterEntry } from "@/lib/music/analysis-input";
import type { ReadingBody } from "@/lib/validation/readings";

type ReadingFacts = Pick<ReadingBody, "listeningPointId" | "temperatureC" | "relativeHumidityPct" | "sections" | "measuredDb" | "weighting" | "meterHeightM">;

/** The engine input of one reading, or null when none of its sections has a player in the set. */
export function readingInput(args: {
  reading: ReadingFacts;
  roster: RosterEntry[];
  positions: { performerId: string; x: number; y: number; facingDeg: number }[];
  listeningPoints: { id: string; x: number; y: number; z: number }[];
  conditions: Conditions;
}): BoxReading | null {
  const { reading } = args;
  const dynamicOf = new Map(reading.sections.map((s) => [s.section, s.dynamic]));
  const byId = new Map(args.roster.map((p) => [p.id, p]));
  const performers: PerformerInput[] = args.positions.flatMap((pos) => {
    const p = byId.get(pos.performerId);
    if (!p) return [];
    const dynamic = dynamicOf.get(p.section);
    return [{ id: p.id, instrument: p.instrument, section: p.section, voice: dynamic ? "melody" : "tacet", dynamic: dynamic ?? "mf", x: pos.x, y: pos.y, facingDeg: pos.facingDeg, strengthDb: p.strengthDb }];
  });
  if (!performers.some((p) => p.voice !== "tacet")) return null;
  const point = args.listeningPoints.find((l) => l.id === reading.listeningPointId);
  if (!point) return null;
  const input = {
    performers,
    listeningPoints: [{ id: point.id, x: point.x, y: point.y, z: reading.meterHeightM ?? point.z }],
    conditions: { ...args.conditions, temperatureC: reading.temperatureC, relativeHumidityPct: reading.relativeHumidityPct },
  };
  return reading.weighting === "C"
    ? { input, listeningPointId: point.id, measuredDbC: reading.measuredDb }
    : { input, listeningPointId: point.id, measuredDbA: reading.measuredDb };
}

/** Sections a reading names that the show's roster does not have. */
export function unknownSections(sections: { section: string }[], roster: { section: string }[]): string[] {
  const known = new Set(roster.map((p) => p.section));
  return sections.map((s) => s.section).filter((s) => !known.has(s));
}
