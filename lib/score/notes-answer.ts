// What the Listen control plays: each mapped section's notes and the tempo, on the show's count line
// (the first set at count 0). Notes the anchors leave out (before the first, or skipped by a cut) are
// left out. Pure.
import type { PartMap, Segment } from "./anchors";
import type { Score, ScoreNote, TempoMark } from "./types";

export interface ScoreNotes {
  tempo: TempoMark[];
  sections: Record<string, { notes: ScoreNote[] }>;
}

const round4 = (x: number) => Math.round(x * 1e4) / 1e4;

/** The score count range each segment plays and the shift that puts it on the show's line. */
function windows(segments: readonly Segment[]) {
  return segments.map((s) => ({ from: s.scoreStart, to: s.scoreStart + (s.showEnd - s.showStart), shift: s.showStart - s.scoreStart, showStart: s.showStart }));
}

/** The notes and tempo of the parts `partMap` maps to a section, on the show's count line. */
export function notesOnShowLine(score: Score, partMap: PartMap, segments: readonly Segment[]): ScoreNotes {
  const win = windows(segments);
  const sections: ScoreNotes["sections"] = {};
  for (const part of score.parts) {
    const section = partMap[part.id];
    if (!section) continue;
    const out = (sections[section] ??= { notes: [] }).notes;
    for (const w of win)
      for (const n of part.notes)
        if (n.atCount >= w.from - 1e-9 && n.atCount < w.to - 1e-9 && n.atCount + w.shift >= 0)
          out.push({ atCount: round4(n.atCount + w.shift), lengthCounts: round4(n.lengthCounts), midi: n.midi });
  }
  for (const s of Object.values(sections)) s.notes.sort((a, b) => a.atCount - b.atCount || a.midi - b.midi);

  const tempo: TempoMark[] = [];
  for (const w of win) {
    // The tempo in force where the segment starts, then each change inside it.
    const before = [...score.tempo].reverse().find((t) => t.atCount <= w.from + 1e-9) ?? score.tempo[0];
    if (before) tempo.push({ atCount: round4(w.showStart), bpm: before.bpm });
    for (const t of score.tempo) if (t.atCount > w.from + 1e-9 && t.atCount < w.to - 1e-9) tempo.push({ atCount: round4(t.atCount + w.shift), bpm: t.bpm });
  }
  return { tempo: tempo.filter((t, i) => i === 0 || t.bpm !== tempo[i - 1]!.bpm), sections };
}
