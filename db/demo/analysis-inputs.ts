// The demo show as engine inputs, one per set, without a database: the same voicing rules the
// server applies (lib/music), with labels as ids. Pure; for tests and scripts that judge the demo.
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import type { AnalysisInput } from "@/lib/acoustics/types";
import { buildAnalysisInput } from "@/lib/music/analysis-input";
import type { DemoShow } from "./types";

export interface DemoSetInput {
  number: string;
  phrase: string | null;
  /** The phrase's musical limits, as the director stored them. */
  planLimits: DemoShow["phrases"][number]["planLimits"] | null;
  input: AnalysisInput;
}

/** One input per set of a demo show, in set order; listening points are named by their names. */
export function demoSetInputs(show: DemoShow): DemoSetInput[] {
  const order = new Map(show.sets.map((s, i) => [s.number, i + 1]));
  const phrases = show.phrases.map((p, i) => ({ id: p.name, order: i + 1, firstOrder: order.get(p.firstSet)!, lastOrder: order.get(p.lastSet)! }));
  const assignments = show.phrases.flatMap((p) => Object.entries(p.sections).map(([section, v]) => ({ phraseId: p.name, section, voice: v.voice, writtenDynamic: v.dynamic, playedDynamic: null })));
  const overrides = show.phrases.flatMap((p) => p.overrides.map((o) => ({ phraseId: p.name, performerId: o.label, voice: o.voice, writtenDynamic: o.dynamic, playedDynamic: null })));
  const roster = show.performers.map((p) => ({ id: p.label, instrument: p.instrument, section: p.section, strengthDb: p.strengthDb }));
  return show.sets.map((s, i) => {
    const phrase = phrases.find((p) => p.firstOrder <= i + 1 && i + 1 <= p.lastOrder) ?? null;
    const input = buildAnalysisInput({
      roster,
      set: { order: i + 1, positions: Object.entries(s.positions).map(([label, pos]) => ({ performerId: label, ...pos })) },
      music: { phrases, assignments, overrides },
      listeningPoints: show.listeningPoints.map((lp) => ({ id: lp.name, x: lp.x, y: lp.y, z: lp.z, background: lp.background ?? null })),
      conditions: show.conditions,
      instruments: DEFAULT_INSTRUMENTS,
    });
    return { number: s.number, phrase: phrase?.id ?? null, planLimits: show.phrases.find((p) => p.name === phrase?.id)?.planLimits ?? null, input };
  });
}
