ALTER TYPE "public"."upload_kind" ADD VALUE 'musicxml';--> statement-breakpoint
CREATE TABLE "show_scores" (
	"show_id" uuid PRIMARY KEY NOT NULL,
	"upload_id" uuid NOT NULL,
	"part_map" jsonb NOT NULL,
	"anchors" jsonb NOT NULL,
	"confirmed_by" text,
	"confirmed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "show_scores" ADD CONSTRAINT "show_scores_show_id_shows_id_fk" FOREIGN KEY ("show_id") REFERENCES "public"."shows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_scores" ADD CONSTRAINT "show_scores_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "show_scores" ADD CONSTRAINT "show_scores_confirmed_by_users_id_fk" FOREIGN KEY ("confirmed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;