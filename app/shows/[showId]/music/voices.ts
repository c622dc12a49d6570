// Voice names and colours for the balance pages: the Okabe–Ito palette, distinct for the common colour-vision deficiencies.
export const VOICE_COLORS: Record<string, string> = {
  melody: "#D55E00",
  countermelody: "#0072B2",
  accompaniment: "#009E73",
  bass: "#CC79A7",
  percussion: "#7a6a00",
  tacet: "#8a94a3",
};
export const VOICE_LABELS: Record<string, string> = {
  melody: "Melody",
  countermelody: "Countermelody",
  accompaniment: "Accompaniment",
  bass: "Bass",
  percussion: "Percussion",
  tacet: "Tacet",
};
export { CHECK_LABELS } from "@/lib/music/check-labels";
export const DYNAMIC_ORDER = ["pp", "p", "mp", "mf", "f", "ff", "fff"] as const;
export const VOICE_ORDER = ["melody", "countermelody", "accompaniment", "bass", "percussion", "tacet"] as const;

export function formatDb(db: number | null | undefined, signed = false): string {
  if (db === null || db === undefined || !Number.isFinite(db)) return "—";
  const s = (Math.abs(db) < 0.05 ? 0 : db).toFixed(1);
  return signed && db > 0 ? `+${s}` : s;
}

/** Loudness in sones to one decimal (whole sones from 100 up); "—" for none. */
export function formatSone(sone: number | null | undefined): string {
  if (sone === null || sone === undefined || !Number.isFinite(sone)) return "—";
  return sone >= 100 ? sone.toFixed(0) : sone.toFixed(1);
}
