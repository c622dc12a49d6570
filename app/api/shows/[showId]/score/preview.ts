// A score import planned against the show as it is now: the part map and anchors (the director's or
// the suggested ones), and the preview the page shows before anything is written.
import "server-only";
import { loadScoreContext } from "@/db/queries/score-import";
import { badRequest } from "@/lib/http/errors";
import { segmentsOf, type PartMap, type ScoreAnchor } from "@/lib/score/anchors";
import { ScoreError } from "@/lib/score/errors";
import { suggestSection } from "@/lib/score/part-sections";
import { proposeImport } from "@/lib/score/proposal";
import type { Score } from "@/lib/score/types";
import type { ScoreChoices } from "@/lib/validation/score";

const refuse = (field: string, message: string) => badRequest(message, { [field]: [message] });

/** Runs `read`, answering a ScoreError as 400 on `field` with its message. */
export function scoreOr400<T>(field: string, read: () => T): T {
  try {
    return read();
  } catch (err) {
    if (err instanceof ScoreError) throw refuse(field, err.message);
    throw err;
  }
}

export async function planScoreImport(showId: string, score: Score, choices: ScoreChoices) {
  const ctx = await loadScoreContext(showId);
  if (!ctx.sets.length) throw refuse("file", "The show has no sets yet: bring in or draw the drill first, then the score.");
  const sectionNames = ctx.sections.map((s) => s.name);
  const partIds = new Set(score.parts.map((p) => p.id));
  for (const [id, section] of Object.entries(choices.mapping ?? {})) {
    if (!partIds.has(id)) throw refuse("mapping", `The score has no part with the id ${id}.`);
    if (section !== null && !sectionNames.includes(section)) throw refuse("mapping", `“${section}” is not a section of this show's roster; choose one of ${sectionNames.join(", ")}, or leave the part out.`);
  }
  const suggested = Object.fromEntries(score.parts.map((p) => [p.id, suggestSection(p.name, ctx.sections)]));
  const partMap: PartMap = { ...suggested, ...(choices.mapping ?? {}) };
  // Default: the first set at the first full measure's downbeat (a pickup leads into it).
  const firstMeasure = score.measures.find((m) => m.number === "1") ?? score.measures[0]!;
  const anchors: ScoreAnchor[] = choices.anchors ?? [{ setId: ctx.sets[0]!.id, measure: firstMeasure.number, beat: 1 }];
  const segments = scoreOr400("anchors", () => segmentsOf(score, anchors, ctx.sets));
  const proposal = proposeImport({
    score,
    partMap,
    segments,
    setsInOrder: ctx.sets,
    sections: sectionNames,
    phrases: ctx.music.phrases,
    rows: ctx.music.assignments,
    overrides: ctx.music.overrides,
  });
  const numberOfOrder = new Map(ctx.sets.map((s) => [s.order, s.number]));
  const preview = {
    score: {
      title: score.title,
      measures: score.measures.length,
      firstMeasure: score.measures[0]!.number,
      lastMeasure: score.measures[score.measures.length - 1]!.number,
      counts: score.totalCounts,
      tempo: score.tempo,
      marks: score.boundaries,
      parts: score.parts.map((p) => ({ id: p.id, name: p.name, notes: p.notes.length, hasDynamics: p.marks.length > 0, suggested: suggested[p.id] ?? null })),
    },
    sections: sectionNames,
    sets: ctx.sets.map((s) => ({ id: s.id, number: s.number })),
    mapping: partMap,
    anchors,
    written: proposal.sets,
    phrases: proposal.phrases.map((p) => ({
      name: p.name,
      firstSetNumber: p.firstSetNumber,
      lastSetNumber: p.lastSetNumber,
      written: Object.fromEntries(Object.entries(p.rows).map(([s, r]) => [s, r.writtenDynamic])),
      voices: Object.fromEntries(Object.entries(p.rows).map(([s, r]) => [s, r.voice])),
      keepsOwnSettings: p.keepsFrom !== null,
    })),
    replaces: {
      ...proposal.replaces,
      phrases: proposal.replaces.phrases.map((p) => ({ name: p.name, firstSetNumber: numberOfOrder.get(p.firstOrder) ?? null, lastSetNumber: numberOfOrder.get(p.lastOrder) ?? null })),
    },
    hints: score.parts.flatMap((p) => p.hints.map((h) => ({ part: p.name, section: partMap[p.id] ?? null, measure: h.measure, text: h.text }))),
    notes: proposal.notes,
  };
  return { preview, proposal, partMap, anchors };
}
