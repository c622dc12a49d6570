// The answers of the score routes, as the music page reads them.
export type ScoreAnchorDto = { setId: string; measure: string; beat: number; pass?: number };
export type ScorePreviewDto = {
  score: {
    title: string;
    measures: number;
    firstMeasure: string;
    lastMeasure: string;
    counts: number;
    tempo: { atCount: number; bpm: number }[];
    marks: { atCount: number; kind: "rehearsal" | "double-bar"; label: string; measure: string }[];
    parts: { id: string; name: string; notes: number; hasDynamics: boolean; suggested: string | null }[];
  };
  sections: string[];
  sets: { id: string; number: string }[];
  mapping: Record<string, string | null>;
  anchors: ScoreAnchorDto[];
  written: { setId: string; number: string; showCount: number; at: { measure: string; beat: number } | null; written: Record<string, string | null> }[];
  phrases: { name: string; firstSetNumber: string; lastSetNumber: string; written: Record<string, string>; voices: Record<string, string>; keepsOwnSettings: boolean }[];
  replaces: {
    phrases: { name: string; firstSetNumber: string | null; lastSetNumber: string | null }[];
    limitsLost: string[];
    overridesLost: { phrase: string; count: number }[];
    plansCleared: number;
  };
  hints: { part: string; section: string | null; measure: string; text: string }[];
  notes: string[];
};
export type ShowScoreDto = {
  score: null | {
    uploadId: string;
    fileName: string;
    confirmedAt: string;
    title: string;
    measures: number;
    counts: number;
    tempo: { atCount: number; bpm: number }[];
    parts: { id: string; name: string; section: string | null }[];
    anchors: (ScoreAnchorDto & { setNumber: string | null })[];
  };
};
