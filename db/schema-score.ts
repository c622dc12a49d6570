// The arrangement a show's music was imported from: which upload, which part plays in which section
// and where the drill meets the music. Not an analysis input: the written dynamics the import wrote
// live in voice_assignments, which already move the show's inputs revision.
import { jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { ScoreAnchor, PartMap } from "@/lib/score/anchors";
import { shows, users } from "./schema";
import { uploads } from "./schema-team";

export const showScores = pgTable("show_scores", {
  showId: uuid("show_id")
    .primaryKey()
    .references(() => shows.id, { onDelete: "cascade" }),
  uploadId: uuid("upload_id")
    .notNull()
    .references(() => uploads.id, { onDelete: "cascade" }),
  /** Part id → section name, or null for a part left out. */
  partMap: jsonb("part_map").$type<PartMap>().notNull(),
  anchors: jsonb("anchors").$type<ScoreAnchor[]>().notNull(),
  confirmedBy: text("confirmed_by").references(() => users.id, { onDelete: "set null" }),
  confirmedAt: timestamp("confirmed_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});
export type ShowScore = typeof showScores.$inferSelect;
