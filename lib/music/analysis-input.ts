// Builds the engine's input for one set from the show's stored data. Pure: the server and the editor both use it.
import type { AnalysisInput, Conditions, InstrumentCatalog, ListeningPointInput } from "@/lib/acoustics/types";
import { phraseAt, voicingOf, type AssignmentLike, type OverrideLike, type PhraseLike } from "./voicing";

export interface RosterEntry {
  id: string;
  instrument: string;
  section: string;
  strengthDb: number;
}

export interface SetData {
  order: number;
  positions: { performerId: string; x: number; y: number; facingDeg: number }[];
}

export interface ShowMusic {
  phrases: PhraseLike[];
  assignments: AssignmentLike[];
  overrides: OverrideLike[];
}

/** Performers without a position in the set are not on the field and are left out. */
export function buildAnalysisInput(args: {
  roster: RosterEntry[];
  set: SetData;
  music: ShowMusic;
  listeningPoints: ListeningPointInput[];
  conditions: Conditions;
  instruments?: InstrumentCatalog;
}): AnalysisInput {
  const phrase = phraseAt(args.music.phrases, args.set.order);
  const byId = new Map(args.roster.map((p) => [p.id, p]));
  const performers = args.set.positions.flatMap((pos) => {
    const p = byId.get(pos.performerId);
    if (!p) return [];
    const v = voicingOf(p, phrase?.id ?? null, args.music.assignments, args.music.overrides);
    return [
      {
        id: p.id,
        instrument: p.instrument,
        section: p.section,
        voice: v.voice,
        dynamic: v.dynamic,
        x: pos.x,
        y: pos.y,
        facingDeg: pos.facingDeg,
        strengthDb: p.strengthDb,
      },
    ];
  });
  return {
    performers,
    // A point's background only when it has one: inputs (and their stored hashes) of points without stay as they were.
    listeningPoints: args.listeningPoints.map(({ id, x, y, z, groundFactor, surroundingsM, background }) => ({
      id,
      x,
      y,
      z,
      groundFactor,
      surroundingsM,
      ...(background ? { background } : {}),
    })),
    conditions: args.conditions,
    ...(args.instruments ? { instruments: args.instruments } : {}),
  };
}
