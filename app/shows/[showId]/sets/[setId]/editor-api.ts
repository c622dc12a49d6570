"use client";
// What the field editor reads (SWR, one key per resource) and the answers' shapes.
import type { ShowResponse } from "@/components/api-types";
import { useApi } from "@/components/use-api";
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

export { editorKeys } from "./editor-keys";
import { editorKeys } from "./editor-keys";

export const useShow = (showId: string) => useApi<ShowResponse>(editorKeys.show(showId));
export const useSet = (showId: string, setId: string | null) => useApi<SetResponse>(setId ? editorKeys.set(showId, setId) : null);
