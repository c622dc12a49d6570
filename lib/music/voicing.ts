// Which voice and dynamic each performer plays in a set, from the phrase that covers it. Pure.
import type { Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";

export interface PhraseLike {
  id: string;
  order: number;
  firstOrder: number;
  lastOrder: number;
}
export interface AssignmentLike {
  phraseId: string;
  section: string;
  voice: VoiceOrTacet;
  writtenDynamic: Dynamic;
  playedDynamic: Dynamic | null;
}
export interface OverrideLike extends Omit<AssignmentLike, "section"> {
  performerId: string;
}

/** Outside every phrase the band is assumed to play accompaniment at mf. */
export const UNASSIGNED = { voice: "accompaniment", writtenDynamic: "mf", playedDynamic: null } as const;

/** The first phrase (in phrase order) whose span of sets includes the set at `setOrder`. */
export function phraseAt<P extends PhraseLike>(phrasesInOrder: P[], setOrder: number): P | null {
  return phrasesInOrder.find((p) => p.firstOrder <= setOrder && setOrder <= p.lastOrder) ?? null;
}

export interface Voicing {
  voice: VoiceOrTacet;
  writtenDynamic: Dynamic;
  /** What is played: an adopted plan's dynamic, else the written one. */
  dynamic: Dynamic;
}

/** The voicing of one performer: its override in the phrase, else its section's assignment, else UNASSIGNED. */
export function voicingOf(
  performer: { id: string; section: string },
  phraseId: string | null,
  assignments: AssignmentLike[],
  overrides: OverrideLike[],
): Voicing {
  const own = phraseId ? overrides.find((o) => o.phraseId === phraseId && o.performerId === performer.id) : undefined;
  const section = phraseId ? assignments.find((a) => a.phraseId === phraseId && a.section === performer.section) : undefined;
  const chosen = own ?? section ?? (phraseId ? { ...UNASSIGNED, voice: "tacet" as const } : UNASSIGNED);
  return { voice: chosen.voice, writtenDynamic: chosen.writtenDynamic, dynamic: chosen.playedDynamic ?? chosen.writtenDynamic };
}
