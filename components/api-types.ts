// The answers of the route handlers the pages read (shared/API.md), as the browser sees them.
import type { Role } from "@/lib/auth/permissions";

export type UserDto = { id: string; email: string; name: string };
export type Membership = { programId: string; programName: string; role: Role };
export type MeResponse = { user: UserDto; memberships: Membership[] };

export type Member = { userId: string; name: string; email: string; role: Role };
export type ProgramResponse = { program: { id: string; name: string }; role: Role; members: Member[] };
export type ShowsResponse = {
  shows: { id: string; name: string; archivedAt?: string | null }[];
  deletedShows?: { id: string; name: string; deletedAt: string; purgeAt: string }[];
};

export type FieldRules = "high-school" | "college";
export type Conditions = { temperatureC: number; relativeHumidityPct: number; pressureKPa: number; groundFactor: number | null; betweenGroundFactor?: number | null };
export type Background = { preset: "quiet-field" | "stadium-between-bands" | "crowd-during-performance" } | { octaveDb: number[] } | { thirdOctaveDb: number[] };
export type ListeningPoint = { id: string; name: string; x: number; y: number; z: number; groundFactor?: number | null; surroundingsM?: number; background?: Background | null };
export type Movement = { id: string; number: number; name: string; firstSetId: string | null; lastSetId: string | null };
export type Performer = { id: string; label: string; instrument: string; section: string; part: string; strengthDb: number; name?: string | null };
export type SetSummary = { id: string; number: string; counts: number; order: number; movementId?: string | null };
export type ShowResponse = {
  show: { id: string; programId: string; name: string; fieldRules: FieldRules; conditions: Conditions; archivedAt?: string | null };
  role: Role;
  listeningPoints: ListeningPoint[];
  performers: Performer[];
  sets: SetSummary[];
  progress?: { placedPerformers: number; phrases: number };
  movements?: Movement[];
};
