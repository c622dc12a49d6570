// What importing a score would write: each set's written dynamic per mapped section, and phrases
// over the sets that carry them. Phrases break where a rehearsal mark or double bar falls (at the
// first set at or after it) and wherever any section's row would change from one set to the next;
// voices and what the score does not speak to stay as the phrase covering each set has them. Pure.
import type { Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";
import { phraseAt, UNASSIGNED } from "@/lib/music/voicing";
import { scoreCountAt, showCounts, type PartMap, type Segment, type SetOnLine } from "./anchors";
import { dynamicAt, levelAt } from "./dynamics";
import type { Score, ScoreBoundary } from "./types";

export interface OldPhrase {
  id: string;
  name: string;
  order: number;
  firstOrder: number;
  lastOrder: number;
  planLimits: unknown;
}
export interface OldRow {
  phraseId: string;
  section: string;
  voice: VoiceOrTacet;
  writtenDynamic: Dynamic;
  playedDynamic: Dynamic | null;
}
export interface OldOverride {
  phraseId: string;
  performerId: string;
}

export interface Row {
  voice: VoiceOrTacet;
  writtenDynamic: Dynamic;
  playedDynamic: Dynamic | null;
}

export interface ProposedSet {
  setId: string;
  number: string;
  showCount: number;
  /** Where the set falls in the music, or null (before the first anchor, past the end). */
  at: { measure: string; beat: number } | null;
  /** Each mapped section's written dynamic here (null: the score says nothing, it keeps its own). */
  written: Record<string, Dynamic | null>;
}

export interface ProposedPhrase {
  name: string;
  firstSetId: string;
  lastSetId: string;
  firstSetNumber: string;
  lastSetNumber: string;
  rows: Record<string, Row>;
  /** The old phrase whose musical limits and solo/lay-out overrides it keeps (it lies inside that one). */
  keepsFrom: string | null;
}

export interface Proposal {
  sets: ProposedSet[];
  phrases: ProposedPhrase[];
  replaces: {
    phrases: { name: string; firstOrder: number; lastOrder: number }[];
    /** Old phrases whose own musical limits no new phrase keeps. */
    limitsLost: string[];
    /** Old phrases whose solo and lay-out overrides no new phrase keeps, with how many. */
    overridesLost: { phrase: string; count: number }[];
    /** Adopted plan dynamics that go because the written dynamic under them changes. */
    plansCleared: number;
  };
  notes: string[];
}

export interface ProposalInput {
  score: Score;
  partMap: PartMap;
  segments: Segment[];
  setsInOrder: (SetOnLine & { order: number })[];
  /** Every section of the show's roster. */
  sections: string[];
  phrases: OldPhrase[];
  rows: OldRow[];
  overrides: OldOverride[];
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The preview of an import: what each set gets, the phrases that replace the show's, and what is lost. */
export function proposeImport(input: ProposalInput): Proposal {
  const { score, partMap, segments, setsInOrder, sections } = input;
  const notes: string[] = [];
  const counts = showCounts(setsInOrder);
  const oldPhrases = [...input.phrases].sort((a, b) => a.order - b.order);

  // Sections the score speaks to, with the parts that carry dynamics.
  const partsOf = new Map<string, typeof score.parts>();
  for (const p of score.parts) {
    const s = partMap[p.id];
    if (s) partsOf.set(s, [...(partsOf.get(s) ?? []), p]);
  }
  for (const [section, parts] of partsOf) {
    const dynamicParts = parts.filter((p) => p.marks.length > 0);
    if (!dynamicParts.length) notes.push(`${parts.map((p) => p.name).join(", ")} ${parts.length > 1 ? "have" : "has"} no dynamics: ${section} keep${section.endsWith("s") ? "" : "s"} the written dynamics it has now.`);
    partsOf.set(section, dynamicParts);
  }
  const mapped = [...partsOf.keys()];

  const perSet = setsInOrder.map((set, k) => {
    const at = scoreCountAt(segments, score, counts[k]!);
    const measure = at === null ? undefined : [...score.measures].reverse().find((m) => m.startCount <= at + 1e-9);
    const written: Record<string, Dynamic | null> = {};
    for (const s of mapped) {
      // Several parts in one section: the loudest marking among them is the section's.
      const levels = at === null ? [] : partsOf.get(s)!.map((p) => levelAt(p.marks, p.wedges, at)).filter((l): l is number => l !== null);
      written[s] = levels.length ? dynamicAt(Math.max(...levels)) : null;
    }
    const old = phraseAt(oldPhrases, set.order);
    const rows: Record<string, Row> = {};
    for (const s of sections) {
      const o = old ? input.rows.find((r) => r.phraseId === old.id && r.section === s) : undefined;
      const w = written[s];
      if (w) rows[s] = { voice: o?.voice ?? "accompaniment", writtenDynamic: w, playedDynamic: o && o.writtenDynamic === w ? o.playedDynamic : null };
      else if (o) rows[s] = { voice: o.voice, writtenDynamic: o.writtenDynamic, playedDynamic: o.playedDynamic };
      // Outside every phrase a section plays accompaniment at mf; keep that inside the new phrase.
      else if (!old) rows[s] = { ...UNASSIGNED };
    }
    const speaks = Object.values(written).some((w) => w !== null);
    return {
      set,
      at,
      old,
      rows: speaks || old ? rows : null,
      view: { setId: set.id, number: set.number, showCount: counts[k]!, at: measure && at !== null ? { measure: measure.number, beat: Math.round((at - measure.startCount + 1) * 100) / 100 } : null, written },
    };
  });

  const markBetween = (from: number | null, to: number | null): ScoreBoundary | undefined =>
    to === null ? undefined : score.boundaries.find((b) => (from === null || b.atCount > from + 1e-9) && b.atCount <= to + 1e-9);

  // Group consecutive sets with the same rows and no mark between them.
  const groups: { sets: typeof perSet; mark?: ScoreBoundary }[] = [];
  perSet.forEach((p, k) => {
    const prev = perSet[k - 1];
    // A mark exactly at the first set with music, or any mark since the set before.
    const mark = markBetween(k === 0 || prev!.at === null ? (p.at === null ? null : p.at - 1e-6) : prev!.at, p.at);
    const last = groups[groups.length - 1];
    if (p.rows === null) return;
    if (last && prev && prev.rows !== null && last.sets[last.sets.length - 1] === prev && !mark && same(prev.rows, p.rows)) last.sets.push(p);
    else groups.push({ sets: [p], mark });
  });

  const used = new Set<string>();
  const phrases: ProposedPhrase[] = groups.map((g) => {
    const first = g.sets[0]!;
    const last = g.sets[g.sets.length - 1]!;
    const old = first.old;
    let name =
      old && old.firstOrder === first.set.order
        ? old.name
        : g.mark?.kind === "rehearsal"
          ? `Rehearsal ${g.mark.label}`
          : old
            ? `${old.name}, from set ${first.set.number}`
            : `From set ${first.set.number}`;
    for (let n = 2; used.has(name); n++) name = `${name.replace(/ \(\d+\)$/, "")} (${n})`;
    used.add(name);
    const keepsFrom = old && g.sets.every((s) => s.old?.id === old.id) ? old.id : null;
    return { name, firstSetId: first.set.id, lastSetId: last.set.id, firstSetNumber: first.set.number, lastSetNumber: last.set.number, rows: first.rows!, keepsFrom };
  });

  const kept = new Set(phrases.map((p) => p.keepsFrom).filter(Boolean));
  const oldPlayed = input.rows.filter((r) => r.playedDynamic).length;
  const newPlayed = new Set<string>();
  for (const g of groups) for (const [s, r] of Object.entries(g.sets[0]!.rows!)) if (r.playedDynamic && g.sets[0]!.old) newPlayed.add(`${g.sets[0]!.old.id}|${s}`);
  const sectionsWithout = sections.filter((s) => !mapped.includes(s));
  if (sectionsWithout.length) notes.push(`No part is mapped to ${sectionsWithout.join(", ")}: ${sectionsWithout.length > 1 ? "they keep" : "it keeps"} the voices and dynamics ${sectionsWithout.length > 1 ? "they have" : "it has"} now.`);
  const silent = perSet.filter((p) => p.at === null).map((p) => p.set.number);
  if (silent.length) notes.push(`Set${silent.length > 1 ? "s" : ""} ${silent.join(", ")} fall${silent.length > 1 ? "" : "s"} before the first anchor or past the end of the music: ${silent.length > 1 ? "they keep" : "it keeps"} the dynamics ${silent.length > 1 ? "they have" : "it has"} now.`);

  return {
    sets: perSet.map((p) => p.view),
    phrases,
    replaces: {
      phrases: oldPhrases.map((p) => ({ name: p.name, firstOrder: p.firstOrder, lastOrder: p.lastOrder })),
      limitsLost: oldPhrases.filter((p) => p.planLimits && !kept.has(p.id)).map((p) => p.name),
      overridesLost: oldPhrases
        .filter((p) => !kept.has(p.id))
        .map((p) => ({ phrase: p.name, count: input.overrides.filter((o) => o.phraseId === p.id).length }))
        .filter((x) => x.count > 0),
      plansCleared: Math.max(0, oldPlayed - newPlayed.size),
    },
    notes,
  };
}
