// Archiving, deleting (undoable for SHOW_UNDO_DAYS) and restoring shows.
import { and, desc, eq, isNotNull, lt } from "drizzle-orm";
import { SHOW_UNDO_DAYS } from "@/lib/limits";
import { db } from "../client";
import { shows } from "../schema";

const DAY_MS = 86_400_000;

/** When a show deleted at `deletedAt` is removed for good. */
export const purgeAt = (deletedAt: Date) => new Date(deletedAt.getTime() + SHOW_UNDO_DAYS * DAY_MS);

export async function setArchived(showId: string, archived: boolean) {
  const [row] = await db
    .update(shows)
    .set({ archivedAt: archived ? new Date() : null })
    .where(eq(shows.id, showId))
    .returning({ id: shows.id, name: shows.name, archivedAt: shows.archivedAt });
  return row!;
}

/** Marks the show deleted; it can be restored until purgeAt. */
export async function markDeleted(showId: string) {
  const [row] = await db.update(shows).set({ deletedAt: new Date() }).where(eq(shows.id, showId)).returning({ id: shows.id, name: shows.name, deletedAt: shows.deletedAt });
  return { ...row!, purgeAt: purgeAt(row!.deletedAt!) };
}

/** Undoes a deletion; false when the show was not deleted. */
export async function restoreDeleted(showId: string) {
  const rows = await db.update(shows).set({ deletedAt: null }).where(and(eq(shows.id, showId), isNotNull(shows.deletedAt))).returning({ id: shows.id, name: shows.name });
  return rows[0] ?? null;
}

/** Removes for good the program's shows deleted more than SHOW_UNDO_DAYS ago (cascading to all they hold). */
export async function purgeDeleted(programId: string, now = new Date()) {
  await db.delete(shows).where(and(eq(shows.programId, programId), lt(shows.deletedAt, new Date(now.getTime() - SHOW_UNDO_DAYS * DAY_MS))));
}

/** The program's deleted shows that can still be restored, newest first. */
export async function listDeleted(programId: string) {
  const rows = await db
    .select({ id: shows.id, name: shows.name, deletedAt: shows.deletedAt })
    .from(shows)
    .where(and(eq(shows.programId, programId), isNotNull(shows.deletedAt)))
    .orderBy(desc(shows.deletedAt));
  return rows.map((r) => ({ ...r, purgeAt: purgeAt(r.deletedAt!) }));
}
