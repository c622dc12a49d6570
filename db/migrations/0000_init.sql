CREATE TYPE "public"."dynamic" AS ENUM('pp', 'p', 'mp', 'mf', 'f', 'ff', 'fff');--> statement-breakpoint
CREATE TYPE "public"."field_rules" AS ENUM('high-school', 'college');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('director', 'designer', 'staff');--> statement-breakpoint
CREATE TYPE "public"."voice" AS ENUM('melody', 'countermelody', 'accompaniment', 'bass', 'percussion', 'tacet');--> statement-breakpoint
CREATE TABLE "analyses" (
	"set_id" uuid NOT NULL,
	"listening_point_id" uuid NOT NULL,
	"inputs_hash" text NOT NULL,
	"model_version" text NOT NULL,
	"result" jsonb NOT NULL,
	"computed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "analyses_set_id_listening_point_id_pk" PRIMARY KEY("set_id","listening_point_id")
);
--> statement-breakpoint
CREATE TABLE "instrument_catalogs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"program_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"instruments" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "listening_points" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"z" double precision NOT NULL,
	"order" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"program_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"role" "role" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_program_id_user_id_pk" PRIMARY KEY("program_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "movements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"name" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "performer_overrides" (
	"phrase_id" uuid NOT NULL,
	"performer_id" uuid NOT NULL,
	"voice" "voice" NOT NULL,
	"written_dynamic" "dynamic" NOT NULL,
	"played_dynamic" "dynamic",
	"note" text DEFAULT '' NOT NULL,
	CONSTRAINT "performer_overrides_phrase_id_performer_id_pk" PRIMARY KEY("phrase_id","performer_id")
);
--> statement-breakpoint
CREATE TABLE "performers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"label" text NOT NULL,
	"instrument" text NOT NULL,
	"section" text NOT NULL,
	"part" text DEFAULT '' NOT NULL,
	"strength_db" double precision DEFAULT 0 NOT NULL,
	"name" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "phrases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"order" integer NOT NULL,
	"first_set_id" uuid NOT NULL,
	"last_set_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "positions" (
	"set_id" uuid NOT NULL,
	"performer_id" uuid NOT NULL,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"facing_deg" double precision DEFAULT 0 NOT NULL,
	CONSTRAINT "positions_set_id_performer_id_pk" PRIMARY KEY("set_id","performer_id")
);
--> statement-breakpoint
CREATE TABLE "programs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"movement_id" uuid,
	"number" text NOT NULL,
	"counts" integer NOT NULL,
	"order" integer NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shows" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"program_id" uuid NOT NULL,
	"name" text NOT NULL,
	"field_rules" "field_rules" DEFAULT 'high-school' NOT NULL,
	"temperature_c" double precision DEFAULT 20 NOT NULL,
	"relative_humidity_pct" double precision DEFAULT 50 NOT NULL,
	"pressure_kpa" double precision DEFAULT 101.325 NOT NULL,
	"ground_factor" double precision,
	"check_targets" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"key" text NOT NULL,
	"attempted_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "voice_assignments" (
	"phrase_id" uuid NOT NULL,
	"section" text NOT NULL,
	"voice" "voice" NOT NULL,
	"written_dynamic" "dynamic" NOT NULL,
	"played_dynamic" "dynamic",
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "voice_assignments_phrase_id_section_pk" PRIMARY KEY("phrase_id","section")
);
--> statement-breakpoint
ALTER TABLE "analyses" ADD CONSTRAINT "analyses_set_id_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "analyses" ADD CONSTRAINT "analyses_listening_point_id_listening_points_id_fk" FOREIGN KEY ("listening_point_id") REFERENCES "public"."listening_points"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "instrument_catalogs" ADD CONSTRAINT "instrument_catalogs_program_id_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."programs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "instrument_catalogs" ADD CONSTRAINT "instrument_catalogs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listening_points" ADD CONSTRAINT "listening_points_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_program_id_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."programs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "movements" ADD CONSTRAINT "movements_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "performer_overrides" ADD CONSTRAINT "performer_overrides_phrase_id_phrases_id_fk" FOREIGN KEY ("phrase_id") REFERENCES "public"."phrases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "performer_overrides" ADD CONSTRAINT "performer_overrides_performer_id_performers_id_fk" FOREIGN KEY ("performer_id") REFERENCES "public"."performers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "performers" ADD CONSTRAINT "performers_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "phrases" ADD CONSTRAINT "phrases_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "phrases" ADD CONSTRAINT "phrases_first_set_id_sets_id_fk" FOREIGN KEY ("first_set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "phrases" ADD CONSTRAINT "phrases_last_set_id_sets_id_fk" FOREIGN KEY ("last_set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positions" ADD CONSTRAINT "positions_set_id_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positions" ADD CONSTRAINT "positions_performer_id_performers_id_fk" FOREIGN KEY ("performer_id") REFERENCES "public"."performers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sets" ADD CONSTRAINT "sets_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sets" ADD CONSTRAINT "sets_movement_id_movements_id_fk" FOREIGN KEY ("movement_id") REFERENCES "public"."movements"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shows" ADD CONSTRAINT "shows_program_id_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."programs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "voice_assignments" ADD CONSTRAINT "voice_assignments_phrase_id_phrases_id_fk" FOREIGN KEY ("phrase_id") REFERENCES "public"."phrases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "instrument_catalogs_program_version_idx" ON "instrument_catalogs" USING btree ("program_id","version");--> statement-breakpoint
CREATE INDEX "listening_points_show_idx" ON "listening_points" USING btree ("show_id");--> statement-breakpoint
CREATE INDEX "memberships_user_idx" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "movements_show_number_idx" ON "movements" USING btree ("show_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "performers_show_label_idx" ON "performers" USING btree ("show_id","label");--> statement-breakpoint
CREATE INDEX "phrases_show_idx" ON "phrases" USING btree ("show_id");--> statement-breakpoint
CREATE INDEX "positions_performer_idx" ON "positions" USING btree ("performer_id");--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "sets_show_number_idx" ON "sets" USING btree ("show_id","number");--> statement-breakpoint
CREATE INDEX "sets_show_order_idx" ON "sets" USING btree ("show_id","order");--> statement-breakpoint
CREATE INDEX "shows_program_idx" ON "shows" USING btree ("program_id");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_key_time_idx" ON "sign_in_attempts" USING btree ("key","attempted_at");