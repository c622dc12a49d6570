ALTER TABLE "phrases" ADD COLUMN "plan_limits" jsonb;--> statement-breakpoint
ALTER TABLE "shows" ADD COLUMN "plan_limits" jsonb;