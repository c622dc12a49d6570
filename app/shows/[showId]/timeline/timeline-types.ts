// The timeline route's answer, as the page reads it.
export type TimelineSample = { showCount: number; setId: string; setNumber: string; count: number; totalDbA: number | null; voices: Record<string, number | null>; totalSone: number | null; voicesSone: Record<string, number | null>; failing: string[]; notApplicable?: string[] };
export type TimelineSet = { setId: string; number: string; order: number; counts: number; startCount: number; showCount: number; failing: string[]; notApplicable?: string[] };
export type TimelineResponse = { listeningPointId: string; sets: TimelineSet[]; samples: TimelineSample[]; recomputed: number; reused: number };
/** What the voice chart plots: A-weighted level or loudness. */
export type Measure = "dba" | "sone";
