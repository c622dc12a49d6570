// Set compare: two sets' box mixes side by side, what changed per voice and section, and the
// performers whose contribution changed most. Pure.
import { VOICES } from "@/lib/acoustics";

type Level = { dbA: number | null };
type Mix = { totalDbA: number | null; voices: Record<string, Level | undefined>; sections: Record<string, Level | undefined>; performers: { performerId: string; dbA: number | null }[] };

const diff = (a: number | null | undefined, b: number | null | undefined) => (a == null || b == null ? null : b - a);

export function compareMixes(a: Mix, b: Mix, setChangeDb: number, labels: Map<string, { label: string; section: string }>, top = 10) {
  const voices = VOICES.flatMap((v) => {
    const from = a.voices[v]?.dbA ?? null;
    const to = b.voices[v]?.dbA ?? null;
    if (from === null && to === null) return [];
    const changeDb = diff(from, to);
    // A voice entering or leaving is a change too.
    return [{ voice: v, aDbA: from, bDbA: to, changeDb, flagged: changeDb === null || Math.abs(changeDb) > setChangeDb }];
  });
  const sections = [...new Set([...Object.keys(a.sections), ...Object.keys(b.sections)])].map((s) => {
    const from = a.sections[s]?.dbA ?? null;
    const to = b.sections[s]?.dbA ?? null;
    return { section: s, aDbA: from, bDbA: to, changeDb: diff(from, to) };
  });
  const bById = new Map(b.performers.map((p) => [p.performerId, p.dbA]));
  const performers = a.performers
    .map((p) => ({ performerId: p.performerId, ...(labels.get(p.performerId) ?? { label: "?", section: "" }), aDbA: p.dbA, bDbA: bById.get(p.performerId) ?? null }))
    .map((p) => ({ ...p, changeDb: diff(p.aDbA, p.bDbA) }))
    .filter((p) => p.changeDb !== null)
    .sort((x, y) => Math.abs(y.changeDb!) - Math.abs(x.changeDb!))
    .slice(0, top);
  return { totalChangeDb: diff(a.totalDbA, b.totalDbA), voices, sections, performers, setChangeDb };
}
