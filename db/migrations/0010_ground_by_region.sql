ALTER TABLE "listening_points" ADD COLUMN "ground_factor" double precision;--> statement-breakpoint
ALTER TABLE "listening_points" ADD COLUMN "surroundings_m" double precision DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shows" ADD COLUMN "between_ground_factor" double precision;--> statement-breakpoint
ALTER TABLE "listening_points" ADD CONSTRAINT "listening_points_ground_factor_range" CHECK ("listening_points"."ground_factor" between 0 and 1);--> statement-breakpoint
ALTER TABLE "listening_points" ADD CONSTRAINT "listening_points_surroundings_range" CHECK ("listening_points"."surroundings_m" between 0 and 1000);--> statement-breakpoint
ALTER TABLE "shows" ADD CONSTRAINT "shows_between_ground_factor_range" CHECK ("shows"."between_ground_factor" between 0 and 1);