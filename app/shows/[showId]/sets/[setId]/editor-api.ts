"use client";
// What the field editor reads (SWR, one key per resource) and the answers' shapes.
import type { ShowResponse } from "@/components/api-types";
import { apiKeys, useApi } from "@/components/use-api";
import type { CheckConfidence } from "@/lib/acoustics/confidence";
import type { AnalysisInput, CheckResult, Dynamic, PlanEntry } from "@/lib/acoustics/types";
import type { PositionRow } from "@/lib/editor/layout";
import type { MixFigures } from "@/components/field/MixPanel";

export type SetResponse = { set: { id: string; number: string; counts: number; version: number }; positions: PositionRow[] };
export type MixInputResponse = { modelVersion: string; catalogVersion: number; input: AnalysisInput };
export type AnalysisResponse = {
  listeningPointId: string;
  modelVersion: string;
  computedAt: string;
  reused: boolean;
  mix: MixFigures & { performers: { performerId: string; dbA: number | null; arrivalMs: number }[] };
  /** Added with model version 3; absent from older stored answers. */
  loudness?: MixFigures["loudness"];
  /** confidence…turnedBy added with model version 4 (lib/acoustics/confidence.ts). */
  checks: (CheckResult & Partial<Omit<CheckConfidence, "id">>)[];
  plan: (PlanEntry & { atLimit?: Extract<Dynamic, "pp" | "fff">; unreachable?: string[] })[];
};

const setPath = (showId: string, setId: string) => `/api/shows/${encodeURIComponent(showId)}/sets/${encodeURIComponent(setId)}`;

export const editorKeys = {
  show: apiKeys.show,
  sets: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/sets`,
  performers: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/performers`,
  set: setPath,
  positions: (showId: string, setId: string) => `${setPath(showId, setId)}/positions`,
  removeFromSet: (showId: string, setId: string) => `${setPath(showId, setId)}/positions/remove`,
  mixInput: (showId: string, setId: string) => `${setPath(showId, setId)}/mix-input`,
  /** The version is part of the key so a save fetches the new stored analysis. */
  analysis: (showId: string, setId: string, listeningPointId: string, version: number) =>
    `${setPath(showId, setId)}/analysis?listeningPointId=${encodeURIComponent(listeningPointId)}&v=${version}`,
};

export const useShow = (showId: string) => useApi<ShowResponse>(editorKeys.show(showId));
export const useSet = (showId: string, setId: string | null) => useApi<SetResponse>(setId ? editorKeys.set(showId, setId) : null);
