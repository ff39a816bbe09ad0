CREATE TYPE "public"."antenna_family" AS ENUM('dipole', 'inverted-v', 'vertical', 'end-fed', 'off-centre-fed', 'fan-dipole');--> statement-breakpoint
CREATE TYPE "public"."antenna_day_status" AS ENUM('draft', 'published', 'done', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."site_ground_class" AS ENUM('very-good', 'average', 'poor', 'sea-water', 'fresh-water', 'custom');--> statement-breakpoint
CREATE TYPE "public"."slot_mode" AS ENUM('ssb', 'cw', 'fm', 'digital', 'am');--> statement-breakpoint
CREATE TABLE "antenna_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"family" "antenna_family" NOT NULL,
	"parameters" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "antenna_plans_name_length" CHECK (length(btrim("antenna_plans"."name")) between 1 and 80),
	CONSTRAINT "antenna_plans_notes_length" CHECK (length("antenna_plans"."notes") <= 2000),
	CONSTRAINT "antenna_plans_family_matches" CHECK ("antenna_plans"."parameters" ->> 'family' = "antenna_plans"."family"::text)
);
--> statement-breakpoint
CREATE TABLE "antenna_days" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"title" text NOT NULL,
	"site_id" uuid NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"meeting_point" text DEFAULT '' NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"safety_lead_id" uuid NOT NULL,
	"status" "antenna_day_status" DEFAULT 'draft' NOT NULL,
	"sequence" integer DEFAULT 0 NOT NULL,
	"copied_from_id" uuid,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "antenna_days_ends_after_start" CHECK ("antenna_days"."ends_at" > "antenna_days"."starts_at"),
	CONSTRAINT "antenna_days_sequence" CHECK ("antenna_days"."sequence" >= 0)
);
--> statement-breakpoint
CREATE TABLE "shift_signups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shift_id" uuid NOT NULL,
	"person_id" uuid NOT NULL,
	"during" "tstzrange" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shifts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slot_id" uuid NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"capacity" integer NOT NULL,
	"taken" integer DEFAULT 0 NOT NULL,
	"sequence" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shifts_ends_after_start" CHECK ("shifts"."ends_at" > "shifts"."starts_at"),
	CONSTRAINT "shifts_capacity" CHECK ("shifts"."capacity" >= 1),
	CONSTRAINT "shifts_taken_within_capacity" CHECK ("shifts"."taken" >= 0 and "shifts"."taken" <= "shifts"."capacity")
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"width_m" double precision NOT NULL,
	"depth_m" double precision NOT NULL,
	"ground_class" "site_ground_class" NOT NULL,
	"ground_conductivity_sm" double precision,
	"ground_relative_permittivity" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"hazards" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sites_size_positive" CHECK ("sites"."width_m" > 0 and "sites"."depth_m" > 0),
	CONSTRAINT "sites_custom_ground" CHECK (("sites"."ground_class" = 'custom') = ("sites"."ground_conductivity_sm" is not null and "sites"."ground_relative_permittivity" is not null))
);
--> statement-breakpoint
CREATE TABLE "station_slots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"day_id" uuid NOT NULL,
	"name" text NOT NULL,
	"bands" text[] NOT NULL,
	"power_w" double precision NOT NULL,
	"mode" "slot_mode" NOT NULL,
	"plan_params" jsonb NOT NULL,
	"library_plan_id" uuid,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"azimuth_deg" double precision DEFAULT 0 NOT NULL,
	"tent_x" double precision NOT NULL,
	"tent_y" double precision NOT NULL,
	"feedline_run_override_m" double precision,
	"summary" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "station_slots_bands" CHECK (cardinality("station_slots"."bands") between 1 and 6),
	CONSTRAINT "station_slots_power" CHECK ("station_slots"."power_w" > 0),
	CONSTRAINT "station_slots_azimuth" CHECK ("station_slots"."azimuth_deg" >= 0 and "station_slots"."azimuth_deg" < 360),
	CONSTRAINT "station_slots_feedline_override" CHECK ("station_slots"."feedline_run_override_m" is null or "station_slots"."feedline_run_override_m" > 0)
);
--> statement-breakpoint
ALTER TABLE "antenna_plans" ADD CONSTRAINT "antenna_plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "antenna_days" ADD CONSTRAINT "antenna_days_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "antenna_days" ADD CONSTRAINT "antenna_days_safety_lead_id_users_id_fk" FOREIGN KEY ("safety_lead_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "antenna_days" ADD CONSTRAINT "antenna_days_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shift_signups" ADD CONSTRAINT "shift_signups_shift_id_shifts_id_fk" FOREIGN KEY ("shift_id") REFERENCES "public"."shifts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shift_signups" ADD CONSTRAINT "shift_signups_person_id_users_id_fk" FOREIGN KEY ("person_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shifts" ADD CONSTRAINT "shifts_slot_id_station_slots_id_fk" FOREIGN KEY ("slot_id") REFERENCES "public"."station_slots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "station_slots" ADD CONSTRAINT "station_slots_day_id_antenna_days_id_fk" FOREIGN KEY ("day_id") REFERENCES "public"."antenna_days"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "station_slots" ADD CONSTRAINT "station_slots_library_plan_id_antenna_plans_id_fk" FOREIGN KEY ("library_plan_id") REFERENCES "public"."antenna_plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "antenna_plans_name_key" ON "antenna_plans" USING btree (lower("name"));--> statement-breakpoint
CREATE INDEX "antenna_days_starts_at_idx" ON "antenna_days" USING btree ("starts_at");--> statement-breakpoint
CREATE UNIQUE INDEX "shift_signups_shift_person_key" ON "shift_signups" USING btree ("shift_id","person_id");--> statement-breakpoint
CREATE INDEX "shift_signups_person_idx" ON "shift_signups" USING btree ("person_id");--> statement-breakpoint
CREATE INDEX "shifts_slot_idx" ON "shifts" USING btree ("slot_id");--> statement-breakpoint
CREATE UNIQUE INDEX "sites_name_key" ON "sites" USING btree ("name");--> statement-breakpoint
CREATE UNIQUE INDEX "station_slots_day_name_key" ON "station_slots" USING btree ("day_id","name");