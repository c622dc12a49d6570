"use client";
// The live box mix in the browser: the engine input the server uses for this set (GET …/mix-input),
// with the editor's positions, evaluated by the same lib/acoustics. One evaluator per set, listening
// point and group of performers, reused across drag frames.
import { useMemo } from "react";
import { createSetEvaluator, type SetEvaluator } from "@/lib/acoustics";
import type { AnalysisInput, Voice } from "@/lib/acoustics/types";
import { VOICES } from "@/lib/acoustics/types";
import type { Layout } from "@/lib/editor/layout";
import type { MixFigures } from "@/components/field/MixPanel";

export interface PreviewMix extends MixFigures {
  performers: Record<string, number>;
}

export interface Preview {
  /** Performers the preview knows (placed when the input was read). */
  has(id: string): boolean;
  /** The mix for a layout, with some performers moved (a drag frame). */
  mixFor(layout: Layout, moved?: readonly { performerId: string; x: number; y: number; facingDeg: number }[]): PreviewMix;
}

function readMix(ev: SetEvaluator): PreviewMix {
  const m = ev.mix;
  const voices: Partial<Record<Voice, { dbA: number }>> = {};
  VOICES.forEach((v, i) => {
    if (m.voiceDbA[i] > -Infinity) voices[v] = { dbA: m.voiceDbA[i] };
  });
  const sections: Record<string, { dbA: number }> = {};
  m.sectionNames.forEach((s, i) => (sections[s] = { dbA: m.sectionDbA[i] }));
  const performers: Record<string, number> = {};
  for (const p of ev.result().points[0].performers) performers[p.id] = p.dbA;
  return { totalDbA: m.totalDbA[0], voices, sections, arrivalSpreadMs: m.arrivalSpreadMs[0], performers };
}

export function usePreview(input: AnalysisInput | undefined, listeningPointId: string | null, layout: Layout): Preview | null {
  // The evaluator covers the performers both in the input and in the layout; rebuilt when that group changes.
  const groupKey = input ? input.performers.filter((p) => layout[p.id]).map((p) => p.id).join(",") : "";
  return useMemo(() => {
    if (!input || !listeningPointId) return null;
    const point = input.listeningPoints.find((l) => l.id === listeningPointId);
    const ids = new Set(groupKey.split(",").filter(Boolean));
    if (!point || ids.size === 0) return null;
    const ev = createSetEvaluator({ ...input, performers: input.performers.filter((p) => ids.has(p.id)), listeningPoints: [point] });
    const place = (l: Layout) => {
      ev.performerIds.forEach((id, i) => {
        const s = l[id];
        if (s) {
          ev.x[i] = s.x;
          ev.y[i] = s.y;
          ev.facingDeg[i] = s.facingDeg;
        }
      });
    };
    return {
      has: (id) => ids.has(id),
      mixFor(l, moved) {
        place(l);
        if (moved) ev.setPositions(moved.filter((m) => ids.has(m.performerId)));
        ev.evaluate();
        return readMix(ev);
      },
    };
  }, [input, listeningPointId, groupKey]);
}
