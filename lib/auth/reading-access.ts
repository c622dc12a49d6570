// Who may remove a box reading: the staff member who recorded it, or a director.
import "server-only";
import { readingRecorder } from "@/db/queries/readings";
import { forbidden, notFound } from "@/lib/http/errors";
import { requireShow } from "./access";
import { can } from "./permissions";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export async function requireReadingRemoval(showId: string, readingId: string) {
  const access = await requireShow(showId, "comment");
  if (!UUID.test(readingId)) throw notFound("No such reading.");
  const row = await readingRecorder(showId, readingId);
  if (!row) throw notFound("No such reading.");
  if (row.recordedBy !== access.user.id && !can(access.role, "adopt-plan")) {
    throw forbidden("Only the person who recorded a reading, or a director, may remove it.");
  }
  return access;
}
