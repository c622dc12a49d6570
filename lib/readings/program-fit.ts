// The calibration of a program's catalog against its box readings, as the catalog pages and routes show it.
import "server-only";
import { currentCatalog } from "@/db/queries/catalog";
import { listProgramReadings, type StoredReading } from "@/db/queries/readings";
import { listPositions } from "@/db/queries/sets";
import { findShow, listListeningPoints, listPerformers } from "@/db/queries/shows";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { applyCarryOffsets, fitCarryOffsets, type BoxReading, type CarryFit } from "@/lib/acoustics/calibration";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import { showConditions } from "@/lib/analysis/set-input";
import { readingInput } from "./reading-input";

const round2 = (x: number) => Math.round(x * 100) / 100;

/** The catalog in force, complete (stored over the defaults), and its version (0 when none is stored). */
export async function catalogInForce(programId: string): Promise<{ version: number; instruments: InstrumentCatalog }> {
  const stored = await currentCatalog(programId);
  return { version: stored?.version ?? 0, instruments: { ...DEFAULT_INSTRUMENTS, ...((stored?.instruments as InstrumentCatalog | null) ?? {}) } };
}

/** Engine inputs of stored readings; a reading whose sections have no player in its set is skipped with the reason. */
async function inputsOf(rows: StoredReading[]) {
  const shows = new Map<string, Promise<{ conditions: ReturnType<typeof showConditions>; roster: Awaited<ReturnType<typeof listPerformers>>; points: Awaited<ReturnType<typeof listListeningPoints>> }>>();
  const positions = new Map<string, ReturnType<typeof listPositions>>();
  const showData = (showId: string) => {
    let p = shows.get(showId);
    if (!p) {
      p = Promise.all([findShow(showId), listPerformers(showId), listListeningPoints(showId)]).then(([show, roster, points]) => ({ conditions: showConditions(show!), roster, points }));
      shows.set(showId, p);
    }
    return p;
  };
  const used: { row: StoredReading; reading: BoxReading }[] = [];
  const skipped: { id: string; reason: string }[] = [];
  for (const row of rows) {
    const show = await showData(row.showId);
    if (!positions.has(row.setId)) positions.set(row.setId, listPositions(row.setId));
    const reading = readingInput({ reading: row, roster: show.roster, positions: await positions.get(row.setId)!, listeningPoints: show.points, conditions: show.conditions });
    if (reading) used.push({ row, reading });
    else skipped.push({ id: row.id, reason: "None of its sections has a player on the field in that set." });
  }
  return { used, skipped };
}

export interface ProgramFit {
  baseVersion: number;
  catalog: InstrumentCatalog;
  used: StoredReading[];
  skipped: { id: string; reason: string }[];
  fit: CarryFit | null;
}

/** Fits the catalog in force to every reading of the program's shows (or of one show). */
export async function programFit(programId: string, showId?: string): Promise<ProgramFit> {
  const [catalog, rows] = await Promise.all([catalogInForce(programId), listProgramReadings(programId, showId)]);
  const { used, skipped } = await inputsOf(rows);
  const fit = used.length ? fitCarryOffsets({ readings: used.map((u) => u.reading), instruments: catalog.instruments }) : null;
  return { baseVersion: catalog.version, catalog: catalog.instruments, used: used.map((u) => u.row), skipped, fit };
}

/** Offsets as stored and shown: to 0.01 dB. */
export function roundedOffsets(fit: CarryFit): Record<string, number> {
  return Object.fromEntries(Object.entries(fit.offsetsDb).map(([k, v]) => [k, round2(v)]));
}

/** Instruments whose carry the fit changes by at least 0.05 dB (what adopting it changes). */
export function changedInstruments(pf: ProgramFit): string[] {
  return pf.fit ? Object.entries(roundedOffsets(pf.fit)).filter(([, d]) => Math.abs(d) >= 0.05).map(([k]) => k).sort() : [];
}

/** The catalog a fit would adopt: each fitted instrument says from how many readings, with the fit's standard error. */
export function adoptedCatalog(pf: ProgramFit): InstrumentCatalog {
  if (!pf.fit) return pf.catalog;
  const out = applyCarryOffsets(pf.catalog, roundedOffsets(pf.fit));
  for (const [key, d] of Object.entries(pf.fit.determination)) {
    out[key] = { ...out[key]!, fit: { readings: d.readings, stdErrorDb: round2(d.stdErrorDb) } };
  }
  return out;
}

/** The API's view of a fit: each reading predicted before and after against measured, per instrument the change. */
export function fitView(pf: ProgramFit) {
  const fit = pf.fit;
  return {
    baseVersion: pf.baseVersion,
    readings: pf.used.map((r, i) => ({
      id: r.id,
      showId: r.showId,
      setNumber: r.setNumber,
      listeningPointName: r.listeningPointName,
      takenAt: r.takenAt.toISOString(),
      sections: r.sections,
      weighting: r.weighting,
      measuredDb: r.measuredDb,
      predictedBeforeDb: round2(fit!.predictedBeforeDb[i]!),
      predictedAfterDb: round2(fit!.predictedAfterDb[i]!),
      residualDb: round2(fit!.residualsDb[i]!),
    })),
    skipped: pf.skipped,
    instruments: fit
      ? Object.keys(fit.offsetsDb)
          .sort()
          .map((key) => ({
            key,
            name: pf.catalog[key]!.name,
            carryDb: round2(pf.catalog[key]!.carryDb),
            offsetDb: round2(fit.offsetsDb[key]!),
            readings: fit.determination[key]!.readings,
            meanShare: round2(fit.determination[key]!.meanShare),
            stdErrorDb: round2(fit.determination[key]!.stdErrorDb),
          }))
      : [],
    offsetsDb: fit ? roundedOffsets(fit) : {},
    indistinguishable: fit?.indistinguishable ?? [],
    rmsBeforeDb: fit ? round2(rms(fit.predictedBeforeDb.map((p, i) => p - pf.used[i]!.measuredDb))) : null,
    rmsAfterDb: fit ? round2(rms(fit.residualsDb)) : null,
    degreesOfFreedom: fit ? fit.degreesOfFreedom : null,
    residualStdDb: fit?.residualStdDb != null ? round2(fit.residualStdDb) : null,
  };
}

function rms(v: number[]) {
  return Math.sqrt(v.reduce((a, x) => a + x * x, 0) / v.length);
}
