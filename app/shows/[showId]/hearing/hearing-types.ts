// The hearing route's answer, and the level scale of the map.
export type Exposure = { dose: number; limitMinutes: number | null };
export type HearingPerformer = {
  performerId: string;
  label: string;
  section: string;
  instrument: string;
  playing: boolean;
  x: number;
  y: number;
  facingDeg: number;
  voice: string;
  dbA: number | null;
  loudestSource: string | null;
  niosh: Exposure;
  osha: Exposure;
};
export type Criterion = { levelDbA: number; hours: number; exchangeDb: number; source: string };
export type HearingResponse = {
  set: { id: string; number: string };
  earHeightM: number;
  minDistanceM: number;
  rehearsalMinutes: number;
  criteria: { niosh: Criterion; osha: Criterion };
  performers: HearingPerformer[];
};

/** Level steps of the map (dBA) and their colours: ColorBrewer YlOrRd, light to dark as it gets louder. */
export const LEVEL_STEPS: { from: number; label: string; fill: string; text: string }[] = [
  { from: -Infinity, label: "below 85", fill: "#ffffcc", text: "#1c2430" },
  { from: 85, label: "85–90", fill: "#fed976", text: "#1c2430" },
  { from: 90, label: "90–95", fill: "#fd8d3c", text: "#1c2430" },
  { from: 95, label: "95–100", fill: "#e31a1c", text: "#ffffff" },
  { from: 100, label: "100 and above", fill: "#800026", text: "#ffffff" },
];

export function levelStep(dbA: number | null) {
  const l = dbA ?? -Infinity;
  return [...LEVEL_STEPS].reverse().find((s) => l >= s.from)!;
}
