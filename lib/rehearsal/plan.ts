// The stadium rehearsal plan: the chosen phrases (or sets) ordered by how badly their balance
// fails at the listening point, each with its build-up order, failing checks, the dynamics to play
// and where to listen from. Pure: the route hands it the stored analyses of every set involved.
import type { CheckId, Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";

export interface SetAnalysis {
  setNumber: string;
  checks: { id: CheckId; passed: boolean; detail: string }[];
  /** Numbers are null where the stored JSON had no finite value. */
  plan: { section: string; writtenDynamic: Dynamic; playedDynamic: Dynamic; changeDb: number | null }[];
  planUnmet: { shortDb: number | null; detail: string }[];
}

export interface RehearsalItemInput {
  kind: "phrase" | "set";
  name: string;
  /** Sets the item spans, in show order. */
  sets: SetAnalysis[];
  /** Each section's voice in the item (its phrase), with the adopted played dynamic if any. */
  sections: { section: string; voice: VoiceOrTacet; writtenDynamic: Dynamic; playedDynamic: Dynamic | null }[];
  /** The phrase's balance plan in the director's words (lib/analysis/phrase-plan.ts), rows in score order; items outside any phrase have none. */
  plan?: { entries: PlannedRow[]; unmet: string[] };
}

export interface PlannedRow {
  section: string;
  who: string;
  why: string;
  writtenDynamic: Dynamic;
  playedDynamic: Dynamic;
  /** Null where the stored JSON had no finite value. */
  changeDb: number | null;
  /** One player of a section that otherwise rests or plays something else: a soloist. */
  solo?: boolean;
}

export interface BuildUpStep {
  step: number;
  /** "The soloist alone", "Melody alone", "Add the countermelody", "Add accompaniment and bass". */
  title: string;
  sections: string[];
}

export interface DynamicLine {
  section: string;
  /** The row's name: the section, or "Trumpets soloist (T1)". */
  who: string;
  /** Why the plan changes it, in a sentence; "" where it plays as written. */
  why: string;
  voice: VoiceOrTacet;
  written: Dynamic;
  play: Dynamic;
  /** adopted: the director's adopted plan; proposed: the balance plan of the worst set; written: no change needed. */
  source: "adopted" | "proposed" | "written";
  changeDb: number | null;
}

export interface RehearsalItem {
  kind: "phrase" | "set";
  name: string;
  sets: string[];
  severity: number;
  failing: { id: CheckId; sets: string[]; detail: string }[];
  buildUp: BuildUpStep[];
  dynamics: DynamicLine[];
  unmet: string[];
}

const STEPS: { title: string; voices: VoiceOrTacet[] }[] = [
  { title: "Melody alone", voices: ["melody"] },
  { title: "Add the countermelody", voices: ["countermelody"] },
  { title: "Add accompaniment and bass", voices: ["accompaniment", "bass"] },
  { title: "Add percussion: full ensemble", voices: ["percussion"] },
];

/**
 * How badly an item fails: every failed check in every set counts 1, every dB a section must move
 * counts 1/6 (about one dynamic step), every dB a target stays short counts 1/3. Per set, so long
 * phrases do not win by length alone. (Our own weighting: common practice, no source.)
 */
export function severityOf(sets: SetAnalysis[]): number {
  if (!sets.length) return 0;
  const total = sets.reduce(
    (sum, s) =>
      sum +
      s.checks.filter((c) => !c.passed).length +
      s.plan.reduce((a, p) => a + Math.abs(p.changeDb ?? 0), 0) / 6 +
      s.planUnmet.reduce((a, u) => a + (u.shortDb ?? 0), 0) / 3,
    0,
  );
  return Math.round((total / sets.length) * 100) / 100;
}

function worstSet(sets: SetAnalysis[]): SetAnalysis | undefined {
  return [...sets].sort((a, b) => severityOf([b]) - severityOf([a]))[0];
}

export function buildItem(input: RehearsalItemInput): RehearsalItem {
  const failing = new Map<CheckId, { id: CheckId; sets: string[]; detail: string }>();
  for (const s of input.sets) {
    for (const c of s.checks) {
      if (c.passed) continue;
      const f = failing.get(c.id) ?? { id: c.id, sets: [], detail: c.detail };
      f.sets.push(s.setNumber);
      failing.set(c.id, f);
    }
  }
  const sounding = input.sections.filter((s) => s.voice !== "tacet");
  // A soloist is heard alone first, so the staff hear what the band must leave room for.
  const soloists = (input.plan?.entries ?? []).filter((e) => e.solo).map((e) => e.who);
  const soloStep = soloists.length ? [{ title: soloists.length === 1 ? "The soloist alone" : "The soloists alone", sections: soloists }] : [];
  const buildUp = [...soloStep, ...STEPS.map((st) => ({ title: soloists.length && st.voices.includes("melody") ? "Add the melody" : st.title, sections: sounding.filter((s) => st.voices.includes(s.voice)).map((s) => s.section).sort() }))]
    .filter((st) => st.sections.length)
    .map((st, i) => ({ step: i + 1, ...st }));
  // The phrase's plan; a set outside any phrase falls back to its own set's plan.
  const planned = new Map<string, Partial<PlannedRow> & Pick<PlannedRow, "playedDynamic">>(
    (input.plan?.entries ?? worstSet(input.sets)?.plan ?? []).map((p) => [p.section, p]),
  );
  const line = (s: (typeof sounding)[number], play: Dynamic, source: DynamicLine["source"], changeDb: number | null, why: string): DynamicLine => ({
    section: s.section,
    who: planned.get(s.section)?.who ?? s.section,
    why,
    voice: s.voice,
    written: s.writtenDynamic,
    play,
    source,
    changeDb,
  });
  const dynamics = sounding.map((s): DynamicLine => {
    const p = planned.get(s.section);
    if (s.playedDynamic) return line(s, s.playedDynamic, "adopted", null, p?.playedDynamic === s.playedDynamic ? (p.why ?? "") : "");
    if (p && p.playedDynamic !== s.writtenDynamic) return line(s, p.playedDynamic, "proposed", p.changeDb ?? null, p.why ?? "");
    return line(s, s.writtenDynamic, "written", null, "");
  });
  // Score order: the plan's rows come in it (woodwinds, brass, battery, front ensemble); others after, by name.
  const rank = new Map([...planned.keys()].map((section, i) => [section, i]));
  dynamics.sort((a, b) => (rank.get(a.section) ?? rank.size) - (rank.get(b.section) ?? rank.size) || a.section.localeCompare(b.section));
  return {
    kind: input.kind,
    name: input.name,
    sets: input.sets.map((s) => s.setNumber),
    severity: severityOf(input.sets),
    failing: [...failing.values()],
    buildUp,
    dynamics,
    unmet: input.plan ? input.plan.unmet : [...new Set(input.sets.flatMap((s) => s.planUnmet.map((u) => u.detail)))],
  };
}

/** The items, worst first; ties keep the order they were chosen in. */
export function buildRehearsalPlan(items: RehearsalItemInput[]): RehearsalItem[] {
  return items
    .map((it, i) => ({ it: buildItem(it), i }))
    .sort((a, b) => b.it.severity - a.it.severity || a.i - b.i)
    .map((x) => x.it);
}
