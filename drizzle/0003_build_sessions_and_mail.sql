CREATE TYPE "public"."mail_category" AS ENUM('account', 'antenna-days', 'shifts', 'build-sessions', 'lending');--> statement-breakpoint
CREATE TYPE "public"."mail_outbox_status" AS ENUM('pending', 'sent', 'failed', 'skipped');--> statement-breakpoint
CREATE TYPE "public"."build_session_status" AS ENUM('scheduled', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."build_session_signup_status" AS ENUM('confirmed', 'waitlisted');--> statement-breakpoint
CREATE TABLE "calendar_feeds" (
	"user_id" uuid PRIMARY KEY NOT NULL,
	"token_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "captured_mail" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"envelope_from" text NOT NULL,
	"envelope_to" text[] NOT NULL,
	"message_id" text,
	"subject" text NOT NULL,
	"text_body" text,
	"html_body" text,
	"attachments" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"raw" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mail_opt_outs" (
	"user_id" uuid NOT NULL,
	"category" "mail_category" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "mail_opt_outs_user_id_category_pk" PRIMARY KEY("user_id","category"),
	CONSTRAINT "mail_opt_outs_not_account" CHECK ("mail_opt_outs"."category" <> 'account')
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"idempotency_key" text NOT NULL,
	"template" text NOT NULL,
	"category" "mail_category" NOT NULL,
	"user_id" uuid,
	"to_address" text NOT NULL,
	"to_name" text NOT NULL,
	"subject" text NOT NULL,
	"text_body" text NOT NULL,
	"html_body" text NOT NULL,
	"headers" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"attachments" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"status" "mail_outbox_status" DEFAULT 'pending' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	CONSTRAINT "mail_outbox_sent_has_time" CHECK (("mail_outbox"."status" = 'sent') = ("mail_outbox"."sent_at" is not null))
);
--> statement-breakpoint
CREATE TABLE "password_resets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "build_session_mentors" (
	"session_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	CONSTRAINT "build_session_mentors_session_id_user_id_pk" PRIMARY KEY("session_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "build_session_signups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"session_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"status" "build_session_signup_status" NOT NULL,
	"queue" bigserial NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "build_sessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"title" text NOT NULL,
	"plan" jsonb NOT NULL,
	"library_plan_id" uuid,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"place" text NOT NULL,
	"antenna_day_id" uuid,
	"raises_mast" boolean DEFAULT false NOT NULL,
	"capacity" integer NOT NULL,
	"taken" integer DEFAULT 0 NOT NULL,
	"notes" text,
	"status" "build_session_status" DEFAULT 'scheduled' NOT NULL,
	"sequence" integer DEFAULT 0 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "build_sessions_ends_after_start" CHECK ("build_sessions"."ends_at" > "build_sessions"."starts_at"),
	CONSTRAINT "build_sessions_capacity_range" CHECK ("build_sessions"."capacity" between 1 and 100),
	CONSTRAINT "build_sessions_taken_within_capacity" CHECK ("build_sessions"."taken" >= 0 and "build_sessions"."taken" <= "build_sessions"."capacity")
);
--> statement-breakpoint
ALTER TABLE "calendar_feeds" ADD CONSTRAINT "calendar_feeds_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_opt_outs" ADD CONSTRAINT "mail_opt_outs_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_resets" ADD CONSTRAINT "password_resets_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_session_mentors" ADD CONSTRAINT "build_session_mentors_session_id_build_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."build_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_session_mentors" ADD CONSTRAINT "build_session_mentors_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_session_signups" ADD CONSTRAINT "build_session_signups_session_id_build_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."build_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_session_signups" ADD CONSTRAINT "build_session_signups_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_sessions" ADD CONSTRAINT "build_sessions_library_plan_id_antenna_plans_id_fk" FOREIGN KEY ("library_plan_id") REFERENCES "public"."antenna_plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_sessions" ADD CONSTRAINT "build_sessions_antenna_day_id_antenna_days_id_fk" FOREIGN KEY ("antenna_day_id") REFERENCES "public"."antenna_days"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "build_sessions" ADD CONSTRAINT "build_sessions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "calendar_feeds_token_hash_key" ON "calendar_feeds" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "captured_mail_received_idx" ON "captured_mail" USING btree ("received_at");--> statement-breakpoint
CREATE UNIQUE INDEX "mail_outbox_idempotency_key" ON "mail_outbox" USING btree ("idempotency_key");--> statement-breakpoint
CREATE INDEX "mail_outbox_user_idx" ON "mail_outbox" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "password_resets_token_hash_key" ON "password_resets" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "password_resets_user_idx" ON "password_resets" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "build_session_mentors_user_idx" ON "build_session_mentors" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "build_session_signups_once" ON "build_session_signups" USING btree ("session_id","user_id");--> statement-breakpoint
CREATE INDEX "build_session_signups_queue_idx" ON "build_session_signups" USING btree ("session_id","status","queue");--> statement-breakpoint
CREATE INDEX "build_session_signups_user_idx" ON "build_session_signups" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "build_sessions_starts_idx" ON "build_sessions" USING btree ("starts_at");