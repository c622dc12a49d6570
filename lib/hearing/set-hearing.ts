// The hearing map of a stored set, as the hearing route and page show it.
import "server-only";
import { setAnalysisInput } from "@/lib/analysis/set-input";
import { listPerformers } from "@/db/queries/shows";
import { runHeavy } from "@/lib/heavy/pool";

const round1 = (x: number) => Math.round(x * 10) / 10;
const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);

export async function setHearing(show: Parameters<typeof setAnalysisInput>[0], set: { id: string; number: string; order: number }, rehearsalMinutes: number) {
  const [{ input, catalogVersion }, roster] = await Promise.all([setAnalysisInput(show, set), listPerformers(show.id)]);
  const map = await runHeavy("hearingMap", input, { rehearsalMinutes });
  const byId = new Map(roster.map((p) => [p.id, p]));
  return {
    set: { id: set.id, number: set.number },
    catalogVersion,
    earHeightM: map.earHeightM,
    minDistanceM: map.minDistanceM,
    rehearsalMinutes: map.rehearsalMinutes,
    criteria: {
      niosh: { levelDbA: 85, hours: 8, exchangeDb: 3, source: "NIOSH 98-126 (1998), recommended exposure limit" },
      osha: { levelDbA: 90, hours: 8, exchangeDb: 5, source: "OSHA 29 CFR 1910.95, permissible exposure limit (Table G-16)" },
    },
    performers: map.performers.map((p, i) => {
      const perf = input.performers[i]!;
      const who = byId.get(p.id);
      return {
        performerId: p.id,
        label: who?.label ?? p.id,
        section: perf.section,
        instrument: perf.instrument,
        playing: perf.voice !== "tacet",
        x: perf.x,
        y: perf.y,
        facingDeg: perf.facingDeg,
        voice: perf.voice,
        dbA: finiteOrNull(round1(p.dbA)),
        loudestSource: p.loudestSourceId ? (byId.get(p.loudestSourceId)?.label ?? null) : null,
        niosh: { dose: p.exposure.niosh.dose, limitMinutes: finiteOrNull(p.exposure.niosh.limitMinutes) },
        osha: { dose: p.exposure.osha.dose, limitMinutes: finiteOrNull(p.exposure.osha.limitMinutes) },
      };
    }),
  };
}
