CREATE TABLE "balance_sweeps" (
	"set_id" uuid NOT NULL,
	"listening_point_id" uuid NOT NULL,
	"inputs_hash" text NOT NULL,
	"model_version" text NOT NULL,
	"result" jsonb NOT NULL,
	"computed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "balance_sweeps_set_id_listening_point_id_pk" PRIMARY KEY("set_id","listening_point_id")
);
--> statement-breakpoint
ALTER TABLE "balance_sweeps" ADD CONSTRAINT "balance_sweeps_set_id_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "balance_sweeps" ADD CONSTRAINT "balance_sweeps_listening_point_id_listening_points_id_fk" FOREIGN KEY ("listening_point_id") REFERENCES "public"."listening_points"("id") ON DELETE cascade ON UPDATE no action;