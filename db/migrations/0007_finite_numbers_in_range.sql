-- Every float column an input of the product lands in gets a range CHECK. In PostgreSQL NaN equals
-- NaN and sorts above every number, so a range refuses NaN and ±Infinity as well as values no route
-- accepts; no write path (a CSV import, a show file, a script) can store them any more.
--
-- Rows stored before this migration are repaired first, so it applies on a database that has them
-- (a drill CSV with "0/0 steps" stored NaN coordinates):
-- * positions: a row whose x, y or facing is NaN or ±Infinity is deleted, so the performer is unplaced
--   in that set (the readers already left such rows out); a finite facing is brought into [0, 360);
--   finite coordinates beyond the range are moved onto the edge of the field area the API allows.
-- * listening points, performers' strengths, show conditions: NaN becomes the neutral value (0 m,
--   0 dB, 20 °C, 50 %, 101.325 kPa, no ground term); other values, ±Infinity too, are clamped into range.
-- * box readings: a reading outside the range every entry path checks is deleted; clamping it would
--   invent a measurement.
DELETE FROM "positions" WHERE "x" IN ('NaN', 'Infinity', '-Infinity') OR "y" IN ('NaN', 'Infinity', '-Infinity') OR "facing_deg" IN ('NaN', 'Infinity', '-Infinity');--> statement-breakpoint
UPDATE "positions" SET "facing_deg" = "facing_deg" - 360 * floor("facing_deg" / 360) WHERE "facing_deg" < 0 OR "facing_deg" >= 360;--> statement-breakpoint
UPDATE "positions" SET "facing_deg" = 0 WHERE "facing_deg" >= 360;--> statement-breakpoint
UPDATE "positions" SET "x" = greatest(-64.864, least(64.864, "x")) WHERE "x" NOT BETWEEN -65 AND 65;--> statement-breakpoint
UPDATE "positions" SET "y" = greatest(-10, least(58.768, "y")) WHERE "y" NOT BETWEEN -11 AND 60;--> statement-breakpoint
UPDATE "listening_points" SET "x" = CASE WHEN "x" = 'NaN' THEN 0 ELSE greatest(-1000, least(1000, "x")) END WHERE "x" NOT BETWEEN -1000 AND 1000;--> statement-breakpoint
UPDATE "listening_points" SET "y" = CASE WHEN "y" = 'NaN' THEN 0 ELSE greatest(-1000, least(1000, "y")) END WHERE "y" NOT BETWEEN -1000 AND 1000;--> statement-breakpoint
UPDATE "listening_points" SET "z" = CASE WHEN "z" = 'NaN' THEN 0 ELSE greatest(-100, least(1000, "z")) END WHERE "z" NOT BETWEEN -100 AND 1000;--> statement-breakpoint
UPDATE "performers" SET "strength_db" = CASE WHEN "strength_db" = 'NaN' THEN 0 ELSE greatest(-6, least(6, "strength_db")) END WHERE "strength_db" NOT BETWEEN -6 AND 6;--> statement-breakpoint
UPDATE "shows" SET "temperature_c" = CASE WHEN "temperature_c" = 'NaN' THEN 20 ELSE greatest(-50, least(60, "temperature_c")) END WHERE "temperature_c" NOT BETWEEN -50 AND 60;--> statement-breakpoint
UPDATE "shows" SET "relative_humidity_pct" = CASE WHEN "relative_humidity_pct" = 'NaN' THEN 50 ELSE greatest(0, least(100, "relative_humidity_pct")) END WHERE "relative_humidity_pct" NOT BETWEEN 0 AND 100;--> statement-breakpoint
UPDATE "shows" SET "pressure_kpa" = CASE WHEN "pressure_kpa" = 'NaN' OR "pressure_kpa" <= 0 THEN 101.325 ELSE 200 END WHERE NOT ("pressure_kpa" > 0 AND "pressure_kpa" <= 200);--> statement-breakpoint
UPDATE "shows" SET "ground_factor" = CASE WHEN "ground_factor" = 'NaN' THEN NULL ELSE greatest(0, least(1, "ground_factor")) END WHERE "ground_factor" NOT BETWEEN 0 AND 1;--> statement-breakpoint
DELETE FROM "box_readings" WHERE NOT ("temperature_c" BETWEEN -20 AND 50 AND "relative_humidity_pct" BETWEEN 10 AND 100 AND "measured_db" BETWEEN 30 AND 140 AND coalesce("meter_height_m", 0) BETWEEN 0 AND 100);--> statement-breakpoint
ALTER TABLE "box_readings" ADD CONSTRAINT "box_readings_in_range" CHECK ("box_readings"."temperature_c" between -20 and 50 and "box_readings"."relative_humidity_pct" between 10 and 100 and "box_readings"."measured_db" between 30 and 140 and "box_readings"."meter_height_m" between 0 and 100);--> statement-breakpoint
ALTER TABLE "listening_points" ADD CONSTRAINT "listening_points_in_range" CHECK ("listening_points"."x" between -1000 and 1000 and "listening_points"."y" between -1000 and 1000 and "listening_points"."z" between -100 and 1000);--> statement-breakpoint
ALTER TABLE "performers" ADD CONSTRAINT "performers_strength_in_range" CHECK ("performers"."strength_db" between -6 and 6);--> statement-breakpoint
ALTER TABLE "positions" ADD CONSTRAINT "positions_in_field_area" CHECK ("positions"."x" between -65 and 65 and "positions"."y" between -11 and 60 and "positions"."facing_deg" >= 0 and "positions"."facing_deg" < 360);--> statement-breakpoint
ALTER TABLE "shows" ADD CONSTRAINT "shows_conditions_in_range" CHECK ("shows"."temperature_c" between -50 and 60 and "shows"."relative_humidity_pct" between 0 and 100 and "shows"."pressure_kpa" > 0 and "shows"."pressure_kpa" <= 200 and "shows"."ground_factor" between 0 and 1);
