CREATE TYPE "public"."meter_response" AS ENUM('slow', 'fast');--> statement-breakpoint
CREATE TYPE "public"."meter_weighting" AS ENUM('A', 'C');--> statement-breakpoint
CREATE TABLE "box_readings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"set_id" uuid NOT NULL,
	"listening_point_id" uuid NOT NULL,
	"taken_at" timestamp with time zone NOT NULL,
	"temperature_c" double precision NOT NULL,
	"relative_humidity_pct" double precision NOT NULL,
	"sections" jsonb NOT NULL,
	"measured_db" double precision NOT NULL,
	"weighting" "meter_weighting" DEFAULT 'A' NOT NULL,
	"response" "meter_response" DEFAULT 'slow' NOT NULL,
	"meter_height_m" double precision,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "box_readings" ADD CONSTRAINT "box_readings_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "box_readings" ADD CONSTRAINT "box_readings_set_id_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "box_readings" ADD CONSTRAINT "box_readings_listening_point_id_listening_points_id_fk" FOREIGN KEY ("listening_point_id") REFERENCES "public"."listening_points"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "box_readings" ADD CONSTRAINT "box_readings_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "box_readings_show_taken_idx" ON "box_readings" USING btree ("show_id","taken_at");