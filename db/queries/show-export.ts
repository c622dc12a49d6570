// A whole show as one show file (no ids), and a show file written back as a new show in one transaction.
import { and, asc, eq, inArray } from "drizzle-orm";
import { storedLimits } from "@/lib/analysis/plan-limits";
import { SHOW_FILE_FORMAT, SHOW_FILE_VERSION, type ShowFile } from "@/lib/show-file/schema";
import { db } from "../client";
import { listeningPoints, movements, performerOverrides, performers, phrases, positions, sets, shows, voiceAssignments } from "../schema";
import { uploads } from "../schema-team";
import { finitePosition } from "./finite-positions";

const byText = <T>(key: (t: T) => string) => (a: T, b: T) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0);

/** Stored musical limits as the file keeps them: only valid fields, null for none. */
function limitsOrNull(stored: unknown) {
  const limits = storedLimits(stored);
  return Object.keys(limits).length ? limits : null;
}

export async function loadShowFile(showId: string): Promise<ShowFile | null> {
  const [show] = await db.select().from(shows).where(eq(shows.id, showId));
  if (!show) return null;
  const [points, roster, moves, setRows, phraseRows] = await Promise.all([
    db.select().from(listeningPoints).where(eq(listeningPoints.showId, showId)).orderBy(asc(listeningPoints.order), asc(listeningPoints.name)),
    db.select().from(performers).where(eq(performers.showId, showId)),
    db.select().from(movements).where(eq(movements.showId, showId)).orderBy(asc(movements.number)),
    db.select().from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order)),
    db.select().from(phrases).where(eq(phrases.showId, showId)).orderBy(asc(phrases.order)),
  ]);
  const setIds = setRows.map((s) => s.id);
  const phraseIds = phraseRows.map((p) => p.id);
  const [positionRows, voiceRows, overrideRows] = await Promise.all([
    setIds.length ? db.select().from(positions).where(and(inArray(positions.setId, setIds), finitePosition)) : [],
    phraseIds.length ? db.select().from(voiceAssignments).where(inArray(voiceAssignments.phraseId, phraseIds)) : [],
    phraseIds.length ? db.select().from(performerOverrides).where(inArray(performerOverrides.phraseId, phraseIds)) : [],
  ]);
  const labelOf = new Map(roster.map((p) => [p.id, p.label]));
  const numberOfSet = new Map(setRows.map((s) => [s.id, s.number]));
  const numberOfMovement = new Map(moves.map((m) => [m.id, m.number]));
  return {
    format: SHOW_FILE_FORMAT,
    version: SHOW_FILE_VERSION,
    show: {
      name: show.name,
      fieldRules: show.fieldRules,
      conditions: {
        temperatureC: show.temperatureC,
        relativeHumidityPct: show.relativeHumidityPct,
        pressureKPa: show.pressureKPa,
        groundFactor: show.groundFactor,
        betweenGroundFactor: show.betweenGroundFactor,
      },
      checkTargets: show.checkTargets ?? null,
      planLimits: limitsOrNull(show.planLimits),
    },
    listeningPoints: points.map((l) => ({
      name: l.name,
      x: l.x,
      y: l.y,
      z: l.z,
      order: l.order,
      groundFactor: l.groundFactor,
      surroundingsM: l.surroundingsM,
      background: (l.background ?? null) as ShowFile["listeningPoints"][number]["background"],
    })),
    performers: roster
      .map((p) => ({ label: p.label, instrument: p.instrument, section: p.section, part: p.part, strengthDb: p.strengthDb, name: p.name }))
      .sort(byText((p) => p.label)),
    movements: moves.map((m) => ({ number: m.number, name: m.name })),
    sets: setRows.map((s) => ({
      number: s.number,
      counts: s.counts,
      movement: s.movementId ? (numberOfMovement.get(s.movementId) ?? null) : null,
      positions: positionRows
        .filter((p) => p.setId === s.id)
        .map((p) => ({ label: labelOf.get(p.performerId)!, x: p.x, y: p.y, facingDeg: p.facingDeg }))
        .sort(byText((p) => p.label)),
    })),
    phrases: phraseRows.map((p) => ({
      planLimits: limitsOrNull(p.planLimits),
      name: p.name,
      firstSet: numberOfSet.get(p.firstSetId)!,
      lastSet: numberOfSet.get(p.lastSetId)!,
      voices: voiceRows
        .filter((v) => v.phraseId === p.id)
        .map((v) => ({ section: v.section, voice: v.voice, writtenDynamic: v.writtenDynamic, playedDynamic: v.playedDynamic }))
        .sort(byText((v) => v.section)),
      overrides: overrideRows
        .filter((o) => o.phraseId === p.id)
        .map((o) => ({ label: labelOf.get(o.performerId)!, voice: o.voice, writtenDynamic: o.writtenDynamic, playedDynamic: o.playedDynamic, note: o.note }))
        .sort(byText((o) => o.label)),
    })),
  };
}

const CHUNK = 2000;

/** Writes the file as a new show of the program, keeping the uploaded file beside it (none for a duplicate); returns the show's id. */
export async function importShowFile(
  programId: string,
  file: ShowFile,
  upload: { fileName: string; content: Buffer; uploadedBy: string } | null,
  name = file.show.name,
): Promise<string> {
  return db.transaction(async (tx) => {
    const c = file.show.conditions;
    const [show] = await tx
      .insert(shows)
      .values({
        programId,
        name,
        fieldRules: file.show.fieldRules,
        temperatureC: c.temperatureC,
        relativeHumidityPct: c.relativeHumidityPct,
        pressureKPa: c.pressureKPa,
        groundFactor: c.groundFactor,
        betweenGroundFactor: c.betweenGroundFactor ?? null,
        checkTargets: file.show.checkTargets ?? null,
        planLimits: file.show.planLimits ?? null,
      })
      .returning({ id: shows.id });
    const showId = show!.id;
    if (file.listeningPoints.length) await tx.insert(listeningPoints).values(file.listeningPoints.map((l) => ({ showId, ...l })));
    const performerId = new Map<string, string>();
    for (let i = 0; i < file.performers.length; i += CHUNK) {
      const rows = await tx
        .insert(performers)
        .values(file.performers.slice(i, i + CHUNK).map((p) => ({ showId, ...p })))
        .returning({ id: performers.id, label: performers.label });
      for (const r of rows) performerId.set(r.label, r.id);
    }
    const movementId = new Map<number, string>();
    if (file.movements.length) {
      const rows = await tx.insert(movements).values(file.movements.map((m) => ({ showId, ...m }))).returning({ id: movements.id, number: movements.number });
      for (const r of rows) movementId.set(r.number, r.id);
    }
    const setId = new Map<string, string>();
    if (file.sets.length) {
      const rows = await tx
        .insert(sets)
        .values(file.sets.map((s, i) => ({ showId, number: s.number, counts: s.counts, order: i + 1, movementId: s.movement === null ? null : movementId.get(s.movement)! })))
        .returning({ id: sets.id, number: sets.number });
      for (const r of rows) setId.set(r.number, r.id);
    }
    const positionRows = file.sets.flatMap((s) => s.positions.map((p) => ({ setId: setId.get(s.number)!, performerId: performerId.get(p.label)!, x: p.x, y: p.y, facingDeg: p.facingDeg })));
    for (let i = 0; i < positionRows.length; i += CHUNK) await tx.insert(positions).values(positionRows.slice(i, i + CHUNK));
    for (const [i, p] of file.phrases.entries()) {
      const [phrase] = await tx
        .insert(phrases)
        .values({ showId, name: p.name, order: i + 1, firstSetId: setId.get(p.firstSet)!, lastSetId: setId.get(p.lastSet)!, planLimits: p.planLimits ?? null })
        .returning({ id: phrases.id });
      const phraseId = phrase!.id;
      if (p.voices.length) await tx.insert(voiceAssignments).values(p.voices.map((v) => ({ phraseId, ...v })));
      if (p.overrides.length) {
        await tx.insert(performerOverrides).values(p.overrides.map(({ label, ...o }) => ({ phraseId, performerId: performerId.get(label)!, ...o })));
      }
    }
    if (upload) await tx.insert(uploads).values({ programId, showId, kind: "show-json", fileName: upload.fileName, sizeBytes: upload.content.byteLength, content: upload.content, uploadedBy: upload.uploadedBy, confirmedAt: new Date() });
    return showId;
  });
}
