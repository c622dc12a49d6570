// The answers of the music and phrase-plan routes, as the music page reads them.
export type MusicPhrase = { id: string; name: string; order: number; firstSetId: string; lastSetId: string; firstSetNumber: string | null; lastSetNumber: string | null };
export type Assignment = { phraseId: string; section: string; voice: string; writtenDynamic: string; playedDynamic: string | null };
export type Override = Assignment & { performerId: string; note: string };
export type MusicResponse = {
  phrases: MusicPhrase[];
  sets: { id: string; number: string; order: number }[];
  sections: { name: string; players: number }[];
  performers: { id: string; label: string; section: string; instrument: string }[];
  assignments: Assignment[];
  overrides: Override[];
  canEdit: boolean;
  canAdopt: boolean;
};
export type CheckDto = { id: string; passed: boolean; status?: "pass" | "fail" | "not-applicable"; applicable?: boolean; detail: string; performerIds: string[] };
export type PlanEntryDto = {
  section: string;
  writtenDynamic: string;
  playedDynamic: string;
  changeDb: number;
  voice: string;
  performerIds: string[];
  kind: "winds" | "percussion";
  /** The row's name: the section, or "Trumpets soloist (T1)". */
  who: string;
  /** Why it changes, in a sentence; "" where it plays as written. */
  why: string;
  atLimit?: string;
  unreachable?: string[];
};
export type PlanLimits = { windSteps: number; percussionSteps: number; keepShape: boolean };
export type MixSummary = {
  totalDbA: number | null;
  voices: Record<string, { dbA: number | null }>;
  sections: Record<string, { dbA: number | null }>;
  /** Loudness (ISO 532-1) of the band and each voice. */
  loudness: { totalSone: number; voices: Record<string, { sone: number; phon: number; heard: boolean }> } | null;
  checks: CheckDto[];
};
export type PhrasePlanResponse = {
  phrase: { id: string; name: string };
  listeningPointId: string;
  listeningPointName: string;
  entries: PlanEntryDto[];
  unmet: { kind: string; shortDb: number; detail: string; sections: string[] }[];
  nothingToChange: boolean;
  limits: PlanLimits;
  sets: { setId: string; number: string; before: MixSummary; after: MixSummary }[];
};
