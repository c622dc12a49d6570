// The two engine inputs of a set: as played (adopted plans in force) and as written (what a plan starts from).
import type { Conditions, InstrumentCatalog, ListeningPointInput } from "@/lib/acoustics/types";
import { buildAnalysisInput, type RosterEntry, type SetData, type ShowMusic } from "@/lib/music/analysis-input";

export interface BalanceContext {
  roster: RosterEntry[];
  music: ShowMusic;
  listeningPoints: ListeningPointInput[];
  conditions: Conditions;
  instruments?: InstrumentCatalog;
}

/** Music with every adopted played dynamic set aside. */
export function writtenMusic(music: ShowMusic): ShowMusic {
  return {
    phrases: music.phrases,
    assignments: music.assignments.map((a) => ({ ...a, playedDynamic: null })),
    overrides: music.overrides.map((o) => ({ ...o, playedDynamic: null })),
  };
}

export function setInputs(ctx: BalanceContext, set: SetData) {
  const args = { roster: ctx.roster, set, listeningPoints: ctx.listeningPoints, conditions: ctx.conditions, ...(ctx.instruments ? { instruments: ctx.instruments } : {}) };
  return {
    played: buildAnalysisInput({ ...args, music: ctx.music }),
    written: buildAnalysisInput({ ...args, music: writtenMusic(ctx.music) }),
  };
}
