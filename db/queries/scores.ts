// The arrangement a show's music was imported from: the link row and the kept file it points to.
import { eq } from "drizzle-orm";
import { db } from "../client";
import { showScores } from "../schema-score";
import { uploads } from "../schema-team";

/** The show's confirmed score with the file as sent, or null when none was imported. */
export async function findShowScore(showId: string) {
  const rows = await db
    .select({
      uploadId: showScores.uploadId,
      partMap: showScores.partMap,
      anchors: showScores.anchors,
      confirmedAt: showScores.confirmedAt,
      fileName: uploads.fileName,
      content: uploads.content,
    })
    .from(showScores)
    .innerJoin(uploads, eq(uploads.id, showScores.uploadId))
    .where(eq(showScores.showId, showId))
    .limit(1);
  return rows[0] ?? null;
}
