// A stored reading as the readings routes answer it.
import type { StoredReading } from "@/db/queries/readings";

export function readingDto(r: StoredReading) {
  return { ...r, takenAt: r.takenAt.toISOString(), createdAt: r.createdAt.toISOString() };
}
