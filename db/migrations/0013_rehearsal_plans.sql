CREATE TABLE "rehearsal_items_done" (
	"plan_id" uuid NOT NULL,
	"item_key" text NOT NULL,
	"done_by" text,
	"done_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "rehearsal_items_done_plan_id_item_key_pk" PRIMARY KEY("plan_id","item_key")
);
--> statement-breakpoint
CREATE TABLE "rehearsal_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"show_id" uuid NOT NULL,
	"name" text NOT NULL,
	"budget_minutes" integer NOT NULL,
	"choice" jsonb NOT NULL,
	"plan" jsonb NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "rehearsal_plans_budget_range" CHECK ("rehearsal_plans"."budget_minutes" between 1 and 600)
);
--> statement-breakpoint
ALTER TABLE "rehearsal_items_done" ADD CONSTRAINT "rehearsal_items_done_plan_id_rehearsal_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."rehearsal_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rehearsal_items_done" ADD CONSTRAINT "rehearsal_items_done_done_by_users_id_fk" FOREIGN KEY ("done_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rehearsal_plans" ADD CONSTRAINT "rehearsal_plans_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rehearsal_plans" ADD CONSTRAINT "rehearsal_plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rehearsal_plans_show_idx" ON "rehearsal_plans" USING btree ("show_id","created_at");