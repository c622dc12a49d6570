CREATE TYPE "public"."mail_kind" AS ENUM('invitation', 'sign-up');--> statement-breakpoint
CREATE TABLE "mail_log" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kind" "mail_kind" NOT NULL,
	"program_id" uuid,
	"sender_id" text,
	"recipient" text NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pending_sign_ups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text NOT NULL,
	"program_name" text NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "pending_sign_ups_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "mail_log" ADD CONSTRAINT "mail_log_program_id_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."programs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_log" ADD CONSTRAINT "mail_log_sender_id_users_id_fk" FOREIGN KEY ("sender_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "mail_log_program_idx" ON "mail_log" USING btree ("program_id","sent_at");--> statement-breakpoint
CREATE INDEX "mail_log_sender_idx" ON "mail_log" USING btree ("sender_id","sent_at");--> statement-breakpoint
CREATE INDEX "mail_log_recipient_idx" ON "mail_log" USING btree ("recipient","sent_at");--> statement-breakpoint
CREATE INDEX "pending_sign_ups_email_idx" ON "pending_sign_ups" USING btree ("email");