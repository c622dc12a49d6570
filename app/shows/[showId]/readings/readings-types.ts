// The answers of the readings and catalog routes, as the readings page reads them.
import type { Role } from "@/lib/auth/permissions";

export type SectionPlayed = { section: string; dynamic: string };

export type Reading = {
  id: string;
  setId: string;
  setNumber: string;
  listeningPointId: string;
  listeningPointName: string;
  takenAt: string;
  temperatureC: number;
  relativeHumidityPct: number;
  sections: SectionPlayed[];
  measuredDb: number;
  weighting: "A" | "C";
  response: "slow" | "fast";
  meterHeightM: number | null;
  note: string;
  recordedBy: string | null;
  mine: boolean;
};
export type ReadingsResponse = { readings: Reading[] };

export type FitReading = { id: string; predictedBeforeDb: number; predictedAfterDb: number; residualDb: number; measuredDb: number };
export type FitInstrument = { key: string; name: string; carryDb: number; offsetDb: number; readings: number; meanShare: number; stdErrorDb: number };
export type FitResponse = {
  baseVersion: number;
  readings: FitReading[];
  skipped: { id: string; reason: string }[];
  instruments: FitInstrument[];
  offsetsDb: Record<string, number>;
  indistinguishable: [string, string][];
  rmsBeforeDb: number | null;
  rmsAfterDb: number | null;
  /** Readings minus fitted offsets; 0 or fewer: the fit matches any readings and checks nothing. */
  degreesOfFreedom?: number | null;
  residualStdDb?: number | null;
  /** The program's shows whose box mixes adopting the fit would change. */
  affectedShows?: { id: string; name: string; performers: number }[];
};

export type Provenance = { kind: "source" | "memory" | "fitted"; text: string; uncertaintyDb: number };
export type CatalogVersion = { version: number; note: string; createdBy: string | null; createdAt: string; carryDb: Record<string, number>; provenance?: Record<string, Provenance> };
export type CatalogResponse = { role: Role; currentVersion: number; versions: CatalogVersion[] };

export const readingKeys = {
  readings: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/readings`,
  fit: (programId: string, showId: string) => `/api/programs/${encodeURIComponent(programId)}/catalog/fit?showId=${encodeURIComponent(showId)}`,
  catalog: (programId: string) => `/api/programs/${encodeURIComponent(programId)}/catalog`,
};
