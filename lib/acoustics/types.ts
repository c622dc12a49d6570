// Shared types of the acoustic engine. Units: metres in the field frame (origin on the
// front sideline at the 50-yard line, x toward side 2, y toward the back sideline, z up),
// degrees for facing (0 = toward the front sideline, 90 = toward side 2, 180 = toward the
// back sideline, 270 = toward side 1), °C, % RH, kPa, dB, ms.
import type { Background } from "./background";
import type { PointLoudness } from "./point-loudness";

export const DYNAMICS = ["pp", "p", "mp", "mf", "f", "ff", "fff"] as const;
export type Dynamic = (typeof DYNAMICS)[number];

export const VOICES = ["melody", "countermelody", "accompaniment", "bass", "percussion"] as const;
export type Voice = (typeof VOICES)[number];
/** A voice as assigned in a phrase: one of VOICES, or tacet (not playing). */
export type VoiceOrTacet = Voice | "tacet";

export type Family = "woodwind" | "brass" | "percussion" | "keyboard" | "amplified";
export type Register = "soprano" | "alto" | "tenor" | "bass";

/** One band-level table: a number per octave band of OCTAVE_BANDS, in order. */
export type BandLevels = number[];

export interface InstrumentSpec {
  name: string;
  family: Family;
  register: Register;
  /** Overall sound power level (dB re 1 pW) per written dynamic. */
  powerDb: Record<Dynamic, number>;
  /** Spectrum shape relative to the overall level at mf, per band (dB). */
  spectrumDb: BandLevels;
  /** Extra brightening per dynamic step above mf, per band (dB per step; negative below mf). */
  brightnessDbPerStep: BandLevels;
  /** Directivity: attenuation (dB, ≤ 0) per band at the listed angles from the facing direction. */
  directivity: { anglesDeg: number[]; bandsDb: number[][] };
  /** Outdoor carry offset (dB), calibrated from box readings. */
  carryDb: number;
  /** Where the numbers come from ("from memory" where not checked). */
  source: string;
  /** Uncertainty (dB, about one standard deviation) when a source gives one; from memory otherwise (provenance.ts). */
  uncertaintyDb?: number;
  /** Set when the carry was adopted from a fit to box readings: how many, and the fit's standard error (dB). */
  fit?: { readings: number; stdErrorDb: number };
}

export type InstrumentCatalog = Record<string, InstrumentSpec>;

export interface Conditions {
  temperatureC: number;
  relativeHumidityPct: number;
  pressureKPa: number;
  /**
   * ISO 9613-2 ground factor G, 0 (hard) … 1 (porous), of the field surface the performers stand
   * on; null for no ground term at all.
   */
  groundFactor: number | null;
  /** G of the ground between the field and the listening points (track, aprons); the field's when omitted or null. */
  betweenGroundFactor?: number | null;
}

export interface PerformerInput {
  id: string;
  instrument: string;
  section: string;
  voice: VoiceOrTacet;
  dynamic: Dynamic;
  x: number;
  y: number;
  /** Source height in metres; 1.5 unless given. */
  z?: number;
  facingDeg: number;
  strengthDb?: number;
  /** A part marked solo: never a stand-out of its section. */
  solo?: boolean;
}

export interface ListeningPointInput {
  id: string;
  x: number;
  y: number;
  z: number;
  /** G of the ground around the point (e.g. 0 for concrete stands); the between ground when omitted or null. */
  groundFactor?: number | null;
  /** How far (m, on the ground) that ground reaches from the point toward the field; 0 when omitted. */
  surroundingsM?: number;
  /** What the point hears besides the band (none when absent). */
  background?: Background | null;
}

export interface AnalysisInput {
  performers: PerformerInput[];
  listeningPoints: ListeningPointInput[];
  conditions: Conditions;
  instruments?: InstrumentCatalog;
}

export interface LevelSummary {
  dbA: number;
  bandsDb: BandLevels;
}

export interface PerformerResult extends LevelSummary {
  id: string;
  arrivalMs: number;
}

export interface PointResult {
  listeningPointId: string;
  totalDbA: number;
  voices: Partial<Record<Voice, LevelSummary>>;
  sections: Record<string, LevelSummary>;
  performers: PerformerResult[];
  arrivalSpreadMs: number;
  /** Loudness of the band and each voice, with the point's background (analyzeSet only). */
  loudness?: PointLoudness;
}

export interface AnalysisResult {
  points: PointResult[];
}

export interface Position {
  performerId: string;
  x: number;
  y: number;
  facingDeg: number;
}

export const CHECK_IDS = [
  "melody-forward",
  "bass-up-pyramid",
  "depth-support",
  "wide-form-edges",
  "stand-outs",
  "arrival-spread",
  "battery-balance",
  "heard-at-box",
] as const;
export type CheckId = (typeof CHECK_IDS)[number];

/** A check's verdict: "not-applicable" when it has nothing to judge (no melody, nobody sounding, one player). */
export type CheckStatus = "pass" | "fail" | "not-applicable";

export interface CheckResult {
  id: CheckId;
  /** False only when the check fails; true also when it has nothing to judge (read `status`). */
  passed: boolean;
  status: CheckStatus;
  applicable: boolean;
  detail: string;
  performerIds: string[];
}

export interface PlanEntry {
  section: string;
  writtenDynamic: Dynamic;
  playedDynamic: Dynamic;
  changeDb: number;
}
