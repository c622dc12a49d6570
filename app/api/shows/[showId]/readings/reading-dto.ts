// A stored reading as the readings routes answer it: the recorder by name, and whether it is the caller's own.
import type { StoredReading } from "@/db/queries/readings";

export function readingDto({ recordedById, ...r }: StoredReading, userId: string) {
  return { ...r, mine: recordedById === userId, takenAt: r.takenAt.toISOString(), createdAt: r.createdAt.toISOString() };
}
