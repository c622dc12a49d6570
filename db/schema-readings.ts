// Box readings: sound level meter readings at a listening point, recorded by staff, which the
// calibration fits the instrument catalog to. Catalog history itself is instrument_catalogs.
import { sql } from "drizzle-orm";
import { check, doublePrecision, index, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { dynamicEnum, listeningPoints, sets, shows, users } from "./schema";

export const meterWeightingEnum = pgEnum("meter_weighting", ["A", "C"]);
export const meterResponseEnum = pgEnum("meter_response", ["slow", "fast"]);

/** The sections that played, each at a written dynamic, e.g. [{ section: "Trumpets", dynamic: "f" }]. */
export type SectionsPlayed = { section: string; dynamic: (typeof dynamicEnum.enumValues)[number] }[];

export const boxReadings = pgTable(
  "box_readings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    showId: uuid("show_id")
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    setId: uuid("set_id")
      .notNull()
      .references(() => sets.id, { onDelete: "cascade" }),
    listeningPointId: uuid("listening_point_id")
      .notNull()
      .references(() => listeningPoints.id, { onDelete: "cascade" }),
    takenAt: timestamp("taken_at", { withTimezone: true, mode: "date" }).notNull(),
    temperatureC: doublePrecision("temperature_c").notNull(),
    relativeHumidityPct: doublePrecision("relative_humidity_pct").notNull(),
    sections: jsonb("sections").$type<SectionsPlayed>().notNull(),
    measuredDb: doublePrecision("measured_db").notNull(),
    weighting: meterWeightingEnum("weighting").notNull().default("A"),
    response: meterResponseEnum("response").notNull().default("slow"),
    /** Height of the meter above the field (m); the listening point's height when it was not noted. */
    meterHeightM: doublePrecision("meter_height_m"),
    note: text("note").notNull().default(""),
    recordedBy: text("recorded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("box_readings_show_taken_idx").on(t.showId, t.takenAt),
    // The ranges of lib/validation/readings.ts; they refuse NaN and ±Infinity too (migration 0007).
    check(
      "box_readings_in_range",
      sql`${t.temperatureC} between -20 and 50 and ${t.relativeHumidityPct} between 10 and 100 and ${t.measuredDb} between 30 and 140 and ${t.meterHeightM} between 0 and 100`,
    ),
  ],
);
export type BoxReadingRow = typeof boxReadings.$inferSelect;
export type NewBoxReadingRow = typeof boxReadings.$inferInsert;
