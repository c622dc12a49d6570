// The answers of the route handlers the pages read (shared/API.md), as the browser sees them.
import type { Role } from "@/lib/auth/permissions";

export type UserDto = { id: string; email: string; name: string };
export type Membership = { programId: string; programName: string; role: Role };
export type MeResponse = { user: UserDto; memberships: Membership[] };

export type Member = { userId: string; name: string; email: string; role: Role };
export type ProgramResponse = { program: { id: string; name: string }; role: Role; members: Member[] };
export type ShowsResponse = { shows: { id: string; name: string }[] };

export type FieldRules = "high-school" | "college";
export type Conditions = { temperatureC: number; relativeHumidityPct: number; pressureKPa: number; groundFactor: number | null; betweenGroundFactor?: number | null };
export type ListeningPoint = { id: string; name: string; x: number; y: number; z: number };
export type Performer = { id: string; label: string; instrument: string; section: string; part: string; strengthDb: number; name?: string | null };
export type SetSummary = { id: string; number: string; counts: number; order: number };
export type ShowResponse = {
  show: { id: string; programId: string; name: string; fieldRules: FieldRules; conditions: Conditions };
  role: Role;
  listeningPoints: ListeningPoint[];
  performers: Performer[];
  sets: SetSummary[];
  progress?: { placedPerformers: number; phrases: number };
};
