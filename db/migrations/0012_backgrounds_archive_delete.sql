ALTER TABLE "listening_points" ADD COLUMN "background" jsonb;--> statement-breakpoint
ALTER TABLE "shows" ADD COLUMN "archived_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "shows" ADD COLUMN "deleted_at" timestamp with time zone;