// Uploaded files (kept as sent) and the writes a confirmed import makes, each in one transaction.
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import type { DrillPlan } from "@/lib/imports/drill";
import type { RosterPlan } from "@/lib/imports/roster";
import { db, type Tx } from "../client";
import { performers, positions, sets, users } from "../schema";
import { uploads } from "../schema-team";
import { finitePosition } from "./finite-positions";

type Kind = (typeof uploads.kind.enumValues)[number];

const listColumns = {
  id: uploads.id,
  kind: uploads.kind,
  fileName: uploads.fileName,
  sizeBytes: uploads.sizeBytes,
  uploadedAt: uploads.uploadedAt,
  uploadedBy: users.name,
  confirmedAt: uploads.confirmedAt,
  summary: uploads.summary,
};

export async function storeUpload(row: { programId: string; showId: string | null; kind: Kind; fileName: string; content: Buffer; uploadedBy: string }) {
  const [stored] = await db
    .insert(uploads)
    .values({ ...row, sizeBytes: row.content.byteLength })
    .returning({ id: uploads.id, uploadedAt: uploads.uploadedAt });
  return stored!;
}

export async function listUploads(showId: string) {
  return db.select(listColumns).from(uploads).leftJoin(users, eq(users.id, uploads.uploadedBy)).where(eq(uploads.showId, showId)).orderBy(desc(uploads.uploadedAt)).limit(100);
}

export async function findUpload(showId: string, uploadId: string) {
  const rows = await db
    .select({ ...listColumns, content: uploads.content })
    .from(uploads)
    .leftJoin(users, eq(users.id, uploads.uploadedBy))
    .where(and(eq(uploads.id, uploadId), eq(uploads.showId, showId)))
    .limit(1);
  return rows[0] ?? null;
}

/** What the drill and roster plans are made against: the roster, and every set with its positions. */
export async function loadImportContext(showId: string) {
  const [roster, setRows, positionRows] = await Promise.all([
    db.select().from(performers).where(eq(performers.showId, showId)),
    db.select({ id: sets.id, number: sets.number, counts: sets.counts, order: sets.order }).from(sets).where(eq(sets.showId, showId)).orderBy(asc(sets.order)),
    db
      .select({ setId: positions.setId, performerId: positions.performerId, x: positions.x, y: positions.y, facingDeg: positions.facingDeg })
      .from(positions)
      .innerJoin(sets, eq(sets.id, positions.setId))
      .where(and(eq(sets.showId, showId), finitePosition)),
  ]);
  const bySet = new Map(setRows.map((s) => [s.id, new Map<string, { x: number; y: number; facingDeg: number }>()]));
  for (const p of positionRows) bySet.get(p.setId)?.set(p.performerId, { x: p.x, y: p.y, facingDeg: p.facingDeg });
  return { roster, sets: setRows.map((s) => ({ ...s, positions: bySet.get(s.id)! })) };
}

export class AlreadyConfirmed extends Error {}

/** Marks the upload confirmed first, so a second confirm of the same file fails and writes nothing. */
async function claim(tx: Tx, uploadId: string, summary: unknown) {
  const claimed = await tx
    .update(uploads)
    .set({ confirmedAt: new Date(), summary })
    .where(and(eq(uploads.id, uploadId), isNull(uploads.confirmedAt)))
    .returning({ id: uploads.id });
  if (!claimed.length) throw new AlreadyConfirmed();
}

const CHUNK = 2000;

export async function applyRosterPlan(showId: string, uploadId: string, plan: RosterPlan) {
  const summary = { created: plan.creates.length, changed: plan.changes.length, unchanged: plan.unchanged };
  await db.transaction(async (tx) => {
    await claim(tx, uploadId, summary);
    for (let i = 0; i < plan.creates.length; i += CHUNK) {
      await tx.insert(performers).values(
        plan.creates.slice(i, i + CHUNK).map((e) => ({ showId, label: e.label, instrument: e.instrument, section: e.section, part: e.part, strengthDb: e.strengthDb, name: e.name })),
      );
    }
    for (const c of plan.changes) {
      const e = c.entry;
      await tx
        .update(performers)
        .set({ instrument: e.instrument, section: e.section, part: e.part, strengthDb: e.strengthDb, name: e.name })
        .where(and(eq(performers.id, c.performerId), eq(performers.showId, showId)));
    }
  });
  return summary;
}

/** New sets go after the last one in file order; every touched set's version goes up (editors see 409). */
export async function applyDrillPlan(showId: string, uploadId: string, plan: DrillPlan) {
  const summary = {
    setsCreated: plan.sets.filter((s) => !s.setId).length,
    setsChanged: plan.sets.filter((s) => s.setId).length,
    positions: plan.dots.length,
  };
  await db.transaction(async (tx) => {
    await claim(tx, uploadId, summary);
    // One import per show at a time: a row lock on the show orders concurrent confirms.
    await tx.execute(sql`select 1 from shows where id = ${showId} for update`);
    const [last] = await tx.select({ order: sql<number>`coalesce(max(${sets.order}), 0)::int` }).from(sets).where(eq(sets.showId, showId));
    let order = last?.order ?? 0;
    const idOf = new Map<string, string>();
    for (const s of plan.sets) {
      if (s.setId) {
        await tx
          .update(sets)
          .set({ counts: s.counts, version: sql`${sets.version} + 1` })
          .where(and(eq(sets.id, s.setId), eq(sets.showId, showId)));
        idOf.set(s.number, s.setId);
      } else {
        const [created] = await tx.insert(sets).values({ showId, number: s.number, counts: s.counts, order: ++order }).returning({ id: sets.id });
        idOf.set(s.number, created!.id);
      }
    }
    const rows = plan.dots.map((d) => ({ setId: idOf.get(d.set)!, performerId: d.performerId, x: d.x, y: d.y, facingDeg: d.facingDeg }));
    for (let i = 0; i < rows.length; i += CHUNK) {
      await tx
        .insert(positions)
        .values(rows.slice(i, i + CHUNK))
        .onConflictDoUpdate({
          target: [positions.setId, positions.performerId],
          set: { x: sql`excluded.x`, y: sql`excluded.y`, facingDeg: sql`excluded.facing_deg` },
        });
    }
  });
  return summary;
}
