// The show timeline at one listening point: every set's sweep laid end to end on one count axis. Pure.
import { CHECK_IDS } from "@/lib/acoustics/types";
import type { SetSweep } from "./show-sweeps";

export function showTimeline(sweeps: SetSweep[], listeningPointId: string) {
  let start = 0;
  const sets = [];
  const samples = [];
  for (const s of sweeps) {
    const list = s.points[listeningPointId] ?? [];
    const first = start;
    for (const sample of list) samples.push({ showCount: start + sample.count, setId: s.setId, setNumber: s.number, ...sample });
    start += list.length && list[0]!.count > 0 ? s.counts : 0;
    const last = list[list.length - 1];
    sets.push({
      setId: s.setId,
      number: s.number,
      order: s.order,
      counts: s.counts,
      startCount: first,
      showCount: start,
      failing: last?.failing ?? [],
      // A set nobody stands in has nothing to judge: every check is not applicable, none passes.
      notApplicable: last ? (last.notApplicable ?? []) : [...CHECK_IDS],
    });
  }
  return { listeningPointId, sets, samples };
}

/** One transition of a timeline, as the sweep endpoint answers it. */
export function transitionOf(sweeps: SetSweep[], setId: string, listeningPointId: string) {
  const i = sweeps.findIndex((s) => s.setId === setId);
  if (i < 0) return null;
  const to = sweeps[i]!;
  const from = i > 0 ? sweeps[i - 1]! : null;
  return {
    listeningPointId,
    fromSet: from ? { id: from.setId, number: from.number } : null,
    toSet: { id: to.setId, number: to.number, counts: to.counts },
    samples: to.points[listeningPointId] ?? [],
  };
}
