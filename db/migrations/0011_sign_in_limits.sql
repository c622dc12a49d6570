CREATE TABLE "known_devices" (
	"token_hash" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_limits" (
	"key" text PRIMARY KEY NOT NULL,
	"failures" integer NOT NULL,
	"window_started_at" timestamp with time zone NOT NULL,
	"next_allowed_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
DROP TABLE "sign_in_attempts" CASCADE;--> statement-breakpoint
CREATE INDEX "known_devices_created_idx" ON "known_devices" USING btree ("created_at");