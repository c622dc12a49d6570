ALTER TABLE "analyses" ALTER COLUMN "result" SET DATA TYPE json;--> statement-breakpoint
ALTER TABLE "balance_sweeps" ALTER COLUMN "result" SET DATA TYPE json;--> statement-breakpoint
ALTER TABLE "analyses" ADD COLUMN "show_revision" bigint;--> statement-breakpoint
ALTER TABLE "analyses" ADD COLUMN "set_revision" bigint;--> statement-breakpoint
ALTER TABLE "sets" ADD COLUMN "inputs_revision" bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shows" ADD COLUMN "inputs_revision" bigint DEFAULT 0 NOT NULL;