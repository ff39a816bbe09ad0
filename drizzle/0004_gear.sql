CREATE TYPE "public"."gear_approval_rule" AS ENUM('automatic', 'steward');--> statement-breakpoint
CREATE TYPE "public"."booking_state" AS ENUM('requested', 'approved', 'out', 'returned', 'declined', 'cancelled', 'lost');--> statement-breakpoint
CREATE TYPE "public"."feedline_type" AS ENUM('rg58', 'rg8x', 'rg213', 'rg174', 'rg6', 'window450');--> statement-breakpoint
CREATE TYPE "public"."coax_connector" AS ENUM('pl259', 'n', 'bnc', 'sma', 'f', 'bare');--> statement-breakpoint
CREATE TYPE "public"."gear_condition" AS ENUM('good', 'worn', 'needs_repair', 'retired');--> statement-breakpoint
CREATE TYPE "public"."gear_file_purpose" AS ENUM('photo', 'manual', 'return');--> statement-breakpoint
CREATE TYPE "public"."gear_kind" AS ENUM('analyser', 'coax', 'mast', 'balun', 'tuner', 'power', 'radio', 'tools', 'other');--> statement-breakpoint
CREATE TYPE "public"."transformer_ratio" AS ENUM('1:1', '4:1', '9:1', '49:1', '64:1');--> statement-breakpoint
CREATE TYPE "public"."transformer_style" AS ENUM('balun', 'unun');--> statement-breakpoint
CREATE TYPE "public"."waitlist_state" AS ENUM('waiting', 'offered', 'accepted', 'lapsed', 'withdrawn');--> statement-breakpoint
CREATE TABLE "stored_file_bytes" (
	"file_id" uuid PRIMARY KEY NOT NULL,
	"bytes" "bytea" NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stored_files" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"sha256" text NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stored_files_byte_size_positive" CHECK ("stored_files"."byte_size" > 0),
	CONSTRAINT "stored_files_content_type" CHECK ("stored_files"."content_type" in ('image/jpeg', 'image/png', 'image/webp', 'application/pdf')),
	CONSTRAINT "stored_files_sha256_hex" CHECK ("stored_files"."sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "gear_bookings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item_id" uuid NOT NULL,
	"borrower_id" uuid NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"period" "tstzrange" GENERATED ALWAYS AS (tstzrange(starts_at, ends_at, '[)')) STORED NOT NULL,
	"state" "booking_state" NOT NULL,
	"note" text,
	"co_sign_required" boolean DEFAULT false NOT NULL,
	"co_signed_by" uuid,
	"co_signed_at" timestamp with time zone,
	"decided_by" uuid,
	"decided_at" timestamp with time zone,
	"decline_reason" text,
	"handed_out_by" uuid,
	"handed_out_at" timestamp with time zone,
	"hand_out_condition" "gear_condition",
	"returned_at" timestamp with time zone,
	"return_recorded_by" uuid,
	"return_condition" "gear_condition",
	"damage_notes" text,
	"return_photo_id" uuid,
	"antenna_day_id" uuid,
	"station_slot_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "gear_bookings_ends_after_start" CHECK ("gear_bookings"."ends_at" > "gear_bookings"."starts_at"),
	CONSTRAINT "gear_bookings_slot_needs_day" CHECK ("gear_bookings"."station_slot_id" is null or "gear_bookings"."antenna_day_id" is not null),
	CONSTRAINT "gear_bookings_co_sign_before_approval" CHECK (not "gear_bookings"."co_sign_required" or "gear_bookings"."co_signed_by" is not null or "gear_bookings"."state" in ('requested', 'declined', 'cancelled')),
	CONSTRAINT "gear_bookings_declined_has_reason" CHECK ("gear_bookings"."state" <> 'declined' or "gear_bookings"."decline_reason" is not null),
	CONSTRAINT "gear_bookings_handed_out" CHECK ("gear_bookings"."state" not in ('out', 'lost') or "gear_bookings"."handed_out_at" is not null),
	CONSTRAINT "gear_bookings_returned" CHECK ("gear_bookings"."state" <> 'returned' or ("gear_bookings"."returned_at" is not null and "gear_bookings"."return_condition" is not null))
);
--> statement-breakpoint
CREATE TABLE "gear_history" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item_id" uuid NOT NULL,
	"booking_id" uuid,
	"actor_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"event" text NOT NULL,
	"from_state" text,
	"to_state" text,
	"note" text,
	"condition" "gear_condition",
	"file_id" uuid
);
--> statement-breakpoint
CREATE TABLE "gear_item_files" (
	"file_id" uuid PRIMARY KEY NOT NULL,
	"item_id" uuid NOT NULL,
	"purpose" "gear_file_purpose" NOT NULL,
	"booking_id" uuid,
	CONSTRAINT "gear_item_files_return_has_booking" CHECK (("gear_item_files"."purpose" = 'return') = ("gear_item_files"."booking_id" is not null))
);
--> statement-breakpoint
CREATE TABLE "gear_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"label_code" text NOT NULL,
	"name" text NOT NULL,
	"kind" "gear_kind" NOT NULL,
	"condition" "gear_condition" DEFAULT 'good' NOT NULL,
	"location" text NOT NULL,
	"notes" text,
	"approval_rule" "gear_approval_rule" NOT NULL,
	"min_mhz" double precision,
	"max_mhz" double precision,
	"battery_checked_on" date,
	"calibration_checked_on" date,
	"cable_type" "feedline_type",
	"length_m" double precision,
	"connector_a" "coax_connector",
	"connector_b" "coax_connector",
	"height_m" double precision,
	"guy_kit" text,
	"transformer_style" "transformer_style",
	"transformer_ratio" "transformer_ratio",
	"power_rating_w" integer,
	"retired_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "gear_items_label_code_format" CHECK ("gear_items"."label_code" ~ '^[A-Z0-9][A-Z0-9-]{1,11}$'),
	CONSTRAINT "gear_items_retired_at" CHECK (("gear_items"."condition" = 'retired') = ("gear_items"."retired_at" is not null)),
	CONSTRAINT "gear_items_analyser_details" CHECK (case when "gear_items"."kind" = 'analyser'
        then "gear_items"."min_mhz" > 0 and "gear_items"."max_mhz" > "gear_items"."min_mhz"
        else "gear_items"."min_mhz" is null and "gear_items"."max_mhz" is null and "gear_items"."battery_checked_on" is null and "gear_items"."calibration_checked_on" is null end),
	CONSTRAINT "gear_items_coax_details" CHECK (case when "gear_items"."kind" = 'coax'
        then "gear_items"."cable_type" is not null and "gear_items"."length_m" > 0 and "gear_items"."connector_a" is not null and "gear_items"."connector_b" is not null
        else "gear_items"."cable_type" is null and "gear_items"."length_m" is null and "gear_items"."connector_a" is null and "gear_items"."connector_b" is null end),
	CONSTRAINT "gear_items_mast_details" CHECK (case when "gear_items"."kind" = 'mast'
        then "gear_items"."height_m" > 0 and "gear_items"."guy_kit" is not null
        else "gear_items"."height_m" is null and "gear_items"."guy_kit" is null end),
	CONSTRAINT "gear_items_balun_details" CHECK (case when "gear_items"."kind" = 'balun'
        then "gear_items"."transformer_style" is not null and "gear_items"."transformer_ratio" is not null and "gear_items"."power_rating_w" > 0
        else "gear_items"."transformer_style" is null and "gear_items"."transformer_ratio" is null and "gear_items"."power_rating_w" is null end)
);
--> statement-breakpoint
CREATE TABLE "gear_waitlist" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"state" "waitlist_state" DEFAULT 'waiting' NOT NULL,
	"offered_at" timestamp with time zone,
	"offer_expires_at" timestamp with time zone,
	"booking_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "gear_waitlist_ends_after_start" CHECK ("gear_waitlist"."ends_at" > "gear_waitlist"."starts_at"),
	CONSTRAINT "gear_waitlist_offer_times" CHECK ("gear_waitlist"."state" <> 'offered' or ("gear_waitlist"."offered_at" is not null and "gear_waitlist"."offer_expires_at" is not null))
);
--> statement-breakpoint
ALTER TABLE "stored_file_bytes" ADD CONSTRAINT "stored_file_bytes_file_id_stored_files_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_files"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stored_files" ADD CONSTRAINT "stored_files_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_item_id_gear_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."gear_items"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_borrower_id_users_id_fk" FOREIGN KEY ("borrower_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_co_signed_by_users_id_fk" FOREIGN KEY ("co_signed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_handed_out_by_users_id_fk" FOREIGN KEY ("handed_out_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_return_recorded_by_users_id_fk" FOREIGN KEY ("return_recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_return_photo_id_stored_files_id_fk" FOREIGN KEY ("return_photo_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_antenna_day_id_antenna_days_id_fk" FOREIGN KEY ("antenna_day_id") REFERENCES "public"."antenna_days"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_station_slot_id_station_slots_id_fk" FOREIGN KEY ("station_slot_id") REFERENCES "public"."station_slots"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_history" ADD CONSTRAINT "gear_history_item_id_gear_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."gear_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_history" ADD CONSTRAINT "gear_history_booking_id_gear_bookings_id_fk" FOREIGN KEY ("booking_id") REFERENCES "public"."gear_bookings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_history" ADD CONSTRAINT "gear_history_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_history" ADD CONSTRAINT "gear_history_file_id_stored_files_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_item_files" ADD CONSTRAINT "gear_item_files_file_id_stored_files_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_files"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_item_files" ADD CONSTRAINT "gear_item_files_item_id_gear_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."gear_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_item_files" ADD CONSTRAINT "gear_item_files_booking_id_gear_bookings_id_fk" FOREIGN KEY ("booking_id") REFERENCES "public"."gear_bookings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_waitlist" ADD CONSTRAINT "gear_waitlist_item_id_gear_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."gear_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_waitlist" ADD CONSTRAINT "gear_waitlist_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gear_waitlist" ADD CONSTRAINT "gear_waitlist_booking_id_gear_bookings_id_fk" FOREIGN KEY ("booking_id") REFERENCES "public"."gear_bookings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "gear_bookings_item_idx" ON "gear_bookings" USING btree ("item_id","starts_at");--> statement-breakpoint
CREATE INDEX "gear_bookings_borrower_idx" ON "gear_bookings" USING btree ("borrower_id");--> statement-breakpoint
CREATE INDEX "gear_bookings_state_idx" ON "gear_bookings" USING btree ("state","ends_at");--> statement-breakpoint
CREATE INDEX "gear_history_item_idx" ON "gear_history" USING btree ("item_id","at");--> statement-breakpoint
CREATE INDEX "gear_item_files_item_idx" ON "gear_item_files" USING btree ("item_id");--> statement-breakpoint
CREATE UNIQUE INDEX "gear_items_label_code_key" ON "gear_items" USING btree ("label_code");--> statement-breakpoint
CREATE INDEX "gear_items_kind_idx" ON "gear_items" USING btree ("kind");--> statement-breakpoint
CREATE UNIQUE INDEX "gear_waitlist_one_active_key" ON "gear_waitlist" USING btree ("item_id","user_id") WHERE "gear_waitlist"."state" in ('waiting', 'offered');--> statement-breakpoint
CREATE INDEX "gear_waitlist_item_idx" ON "gear_waitlist" USING btree ("item_id","created_at");