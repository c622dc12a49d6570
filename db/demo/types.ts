// The shape of the demo data, as plain objects the loader turns into rows.
import type { Background } from "@/lib/acoustics/background";
import type { Conditions, Dynamic, VoiceOrTacet } from "@/lib/acoustics/types";
import type { Role } from "@/db/schema";

export interface DemoMember {
  email: string;
  name: string;
  role: Role;
}

export interface DemoPerformer {
  label: string;
  /** A key of the instrument catalog (lib/acoustics DEFAULT_INSTRUMENTS). */
  instrument: string;
  section: string;
  part: string;
  strengthDb: number;
  name?: string;
}

export interface DemoPosition {
  x: number;
  y: number;
  facingDeg: number;
}

export interface DemoSet {
  number: string;
  /** Counts from the previous set (0 for the opening set). */
  counts: number;
  movement: number;
  /** Every performer's dot, by label. */
  positions: Record<string, DemoPosition>;
}

export interface DemoVoice {
  voice: VoiceOrTacet;
  dynamic: Dynamic;
}

export interface DemoOverride extends DemoVoice {
  label: string;
  note: string;
}

export interface DemoPhrase {
  name: string;
  firstSet: string;
  lastSet: string;
  /** Every section's voice and written dynamic. */
  sections: Record<string, DemoVoice>;
  overrides: DemoOverride[];
  /** The director's musical limits for this phrase's balance plan, over the defaults. */
  planLimits?: { windSteps?: number; percussionSteps?: number; keepShape?: boolean };
}

export interface DemoListeningPoint {
  name: string;
  x: number;
  y: number;
  z: number;
  /** What the point hears besides the band (none when absent). */
  background?: Background;
}

export interface DemoShow {
  name: string;
  fieldRules: "high-school" | "college";
  conditions: Conditions;
  listeningPoints: DemoListeningPoint[];
  performers: DemoPerformer[];
  movements: { number: number; name: string }[];
  sets: DemoSet[];
  phrases: DemoPhrase[];
  /** The arrangement, uploaded and confirmed: the file as sent, each part's section, the anchor. */
  score?: { fileName: string; content: Buffer; partMap: Record<string, string | null>; anchor: { set: string; measure: string; beat: number } };
}

export interface DemoProgram {
  name: string;
  members: DemoMember[];
  shows: DemoShow[];
}
