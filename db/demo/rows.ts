// Turns the demo programs into table rows with their ids chosen here, so each table is one bulk insert. Pure.
import { randomUUID } from "node:crypto";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import type * as t from "@/db/schema";
import type { showScores } from "@/db/schema-score";
import type { uploads } from "@/db/schema-team";
import type { DemoProgram } from "./types";

type Insert<T extends { $inferInsert: unknown }> = T["$inferInsert"];

export interface DemoRows {
  users: Insert<typeof t.users>[];
  programs: Insert<typeof t.programs>[];
  memberships: Insert<typeof t.memberships>[];
  instrumentCatalogs: Insert<typeof t.instrumentCatalogs>[];
  shows: Insert<typeof t.shows>[];
  listeningPoints: Insert<typeof t.listeningPoints>[];
  performers: Insert<typeof t.performers>[];
  movements: Insert<typeof t.movements>[];
  sets: Insert<typeof t.sets>[];
  positions: Insert<typeof t.positions>[];
  phrases: Insert<typeof t.phrases>[];
  voiceAssignments: Insert<typeof t.voiceAssignments>[];
  performerOverrides: Insert<typeof t.performerOverrides>[];
  uploads: Insert<typeof uploads>[];
  showScores: Insert<typeof showScores>[];
}

function lookup<V>(map: Map<string, V>, key: string, what: string): V {
  const v = map.get(key);
  if (v === undefined) throw new Error(`demo data: unknown ${what} "${key}"`);
  return v;
}

/**
 * @param newUsers  e-mail → password hash for the members to create
 * @param existingUsers e-mail → id of members already in the database (kept as they are)
 */
export function demoRows(
  programs: DemoProgram[],
  catalog: InstrumentCatalog,
  newUsers: Map<string, string>,
  existingUsers: Map<string, string>,
): DemoRows {
  const rows: DemoRows = {
    users: [], programs: [], memberships: [], instrumentCatalogs: [], shows: [], listeningPoints: [],
    performers: [], movements: [], sets: [], positions: [], phrases: [], voiceAssignments: [], performerOverrides: [],
    uploads: [], showScores: [],
  };
  const userIds = new Map(existingUsers);

  for (const program of programs) {
    const programId = randomUUID();
    rows.programs.push({ id: programId, name: program.name });
    for (const m of program.members) {
      let userId = userIds.get(m.email);
      if (!userId) {
        userId = randomUUID();
        userIds.set(m.email, userId);
        rows.users.push({ id: userId, email: m.email, name: m.name, passwordHash: lookup(newUsers, m.email, "member") });
      }
      rows.memberships.push({ programId, userId, role: m.role });
    }
    const director = program.members.find((m) => m.role === "director");
    rows.instrumentCatalogs.push({
      programId,
      version: 1,
      instruments: catalog,
      note: "Default catalog",
      createdBy: director ? userIds.get(director.email) : null,
    });

    for (const show of program.shows) {
      const showId = randomUUID();
      rows.shows.push({ id: showId, programId, name: show.name, fieldRules: show.fieldRules, ...show.conditions });
      show.listeningPoints.forEach((lp, i) => rows.listeningPoints.push({ showId, ...lp, background: lp.background ?? null, order: i + 1 }));

      const performerIds = new Map<string, string>();
      for (const p of show.performers) {
        if (performerIds.has(p.label)) throw new Error(`demo data: label ${p.label} twice in ${show.name}`);
        const id = randomUUID();
        performerIds.set(p.label, id);
        rows.performers.push({ id, showId, label: p.label, instrument: p.instrument, section: p.section, part: p.part, strengthDb: p.strengthDb, name: p.name ?? null });
      }
      const movementIds = new Map<string, string>();
      for (const mv of show.movements) {
        const id = randomUUID();
        movementIds.set(String(mv.number), id);
        rows.movements.push({ id, showId, number: mv.number, name: mv.name });
      }
      const setIds = new Map<string, string>();
      show.sets.forEach((s, i) => {
        const id = randomUUID();
        setIds.set(s.number, id);
        rows.sets.push({ id, showId, movementId: lookup(movementIds, String(s.movement), "movement"), number: s.number, counts: s.counts, order: i + 1 });
        for (const [label, pos] of Object.entries(s.positions))
          rows.positions.push({ setId: id, performerId: lookup(performerIds, label, "performer"), ...pos });
      });
      show.phrases.forEach((ph, i) => {
        const id = randomUUID();
        rows.phrases.push({ id, showId, name: ph.name, order: i + 1, firstSetId: lookup(setIds, ph.firstSet, "set"), lastSetId: lookup(setIds, ph.lastSet, "set"), planLimits: ph.planLimits ?? null });
        for (const [section, v] of Object.entries(ph.sections))
          rows.voiceAssignments.push({ phraseId: id, section, voice: v.voice, writtenDynamic: v.dynamic });
        for (const o of ph.overrides)
          rows.performerOverrides.push({ phraseId: id, performerId: lookup(performerIds, o.label, "performer"), voice: o.voice, writtenDynamic: o.dynamic, note: o.note });
      });
      if (show.score) {
        const uploadId = randomUUID();
        const by = director ? userIds.get(director.email) : null;
        const { fileName, content, partMap, anchor } = show.score;
        rows.uploads.push({ id: uploadId, programId, showId, kind: "musicxml", fileName, sizeBytes: content.byteLength, content, uploadedBy: by, confirmedAt: new Date(), summary: { phrases: show.phrases.length } });
        rows.showScores.push({ showId, uploadId, partMap, anchors: [{ setId: lookup(setIds, anchor.set, "set"), measure: anchor.measure, beat: anchor.beat }], confirmedBy: by });
      }
    }
  }
  return rows;
}
