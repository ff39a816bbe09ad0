CREATE TYPE "public"."user_role" AS ENUM('coordinator', 'steward', 'member', 'newcomer');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" "user_role" NOT NULL,
	"is_mentor" boolean DEFAULT false NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"call_sign" text,
	"password_hash" text NOT NULL,
	"role" "user_role" DEFAULT 'newcomer' NOT NULL,
	"is_mentor" boolean DEFAULT false NOT NULL,
	"units" "unit_system" DEFAULT 'metric' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"confirmed_at" timestamp with time zone,
	CONSTRAINT "users_email_lower_case" CHECK ("users"."email" = lower("users"."email"))
);
--> statement-breakpoint
CREATE TABLE "club_settings" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"club_name" text NOT NULL,
	"itu_region" smallint NOT NULL,
	"time_zone" text NOT NULL,
	"default_units" "unit_system" DEFAULT 'metric' NOT NULL,
	"join_code" text NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "club_settings_single_row" CHECK ("club_settings"."id" = 1),
	CONSTRAINT "club_settings_itu_region" CHECK ("club_settings"."itu_region" in (1, 2, 3)),
	CONSTRAINT "club_settings_join_code_length" CHECK (length("club_settings"."join_code") >= 6)
);
--> statement-breakpoint
CREATE TABLE "rate_limit_counters" (
	"bucket" text NOT NULL,
	"key" text NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"hits" integer NOT NULL,
	CONSTRAINT "rate_limit_counters_bucket_key_pk" PRIMARY KEY("bucket","key")
);
--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_users_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "invitations_token_hash_key" ON "invitations" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "invitations_email_idx" ON "invitations" USING btree ("email");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE INDEX "users_role_idx" ON "users" USING btree ("role");