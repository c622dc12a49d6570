import { deleteReading } from "@/db/queries/readings";
import { requireReadingRemoval } from "@/lib/auth/reading-access";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

/** Removes a reading (its recorder or a director); the next fit leaves it out. */
export const DELETE = route<{ showId: string; readingId: string }>(async (_req, { showId, readingId }) => {
  await requireReadingRemoval(showId, readingId);
  if (!(await deleteReading(showId, readingId))) throw notFound("No such reading.");
  return new Response(null, { status: 204 });
});
