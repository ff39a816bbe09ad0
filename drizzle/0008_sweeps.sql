CREATE TYPE "public"."sweep_place" AS ENUM('feed-point', 'radio-end');--> statement-breakpoint
CREATE TYPE "public"."sweep_quantity" AS ENUM('swr', 'impedance', 'return-loss');--> statement-breakpoint
CREATE TABLE "measured_sweeps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slot_id" uuid,
	"library_plan_id" uuid,
	"file_id" uuid NOT NULL,
	"uploaded_by" uuid,
	"analyser_id" uuid,
	"place" "sweep_place" NOT NULL,
	"quantity" "sweep_quantity" NOT NULL,
	"measured_at" timestamp with time zone NOT NULL,
	"mapping" jsonb NOT NULL,
	"points" jsonb NOT NULL,
	"point_count" integer NOT NULL,
	"min_mhz" double precision NOT NULL,
	"max_mhz" double precision NOT NULL,
	"built_lengths_m" double precision[],
	"plan_request" jsonb NOT NULL,
	"analysis" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "measured_sweeps_one_target" CHECK (("measured_sweeps"."slot_id" is null) <> ("measured_sweeps"."library_plan_id" is null)),
	CONSTRAINT "measured_sweeps_point_count" CHECK ("measured_sweeps"."point_count" between 5 and 5000 and jsonb_array_length("measured_sweeps"."points") = "measured_sweeps"."point_count"),
	CONSTRAINT "measured_sweeps_range" CHECK ("measured_sweeps"."min_mhz" >= 1 and "measured_sweeps"."max_mhz" <= 500 and "measured_sweeps"."min_mhz" < "measured_sweeps"."max_mhz"),
	CONSTRAINT "measured_sweeps_built_lengths" CHECK ("measured_sweeps"."built_lengths_m" is null or (cardinality("measured_sweeps"."built_lengths_m") between 1 and 3 and 0 < all("measured_sweeps"."built_lengths_m"))),
	CONSTRAINT "measured_sweeps_note_length" CHECK (length("measured_sweeps"."note") <= 500)
);
--> statement-breakpoint
ALTER TABLE "stored_files" DROP CONSTRAINT "stored_files_content_type";--> statement-breakpoint
ALTER TABLE "measured_sweeps" ADD CONSTRAINT "measured_sweeps_slot_id_station_slots_id_fk" FOREIGN KEY ("slot_id") REFERENCES "public"."station_slots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measured_sweeps" ADD CONSTRAINT "measured_sweeps_library_plan_id_antenna_plans_id_fk" FOREIGN KEY ("library_plan_id") REFERENCES "public"."antenna_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measured_sweeps" ADD CONSTRAINT "measured_sweeps_file_id_stored_files_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_files"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measured_sweeps" ADD CONSTRAINT "measured_sweeps_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measured_sweeps" ADD CONSTRAINT "measured_sweeps_analyser_id_gear_items_id_fk" FOREIGN KEY ("analyser_id") REFERENCES "public"."gear_items"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "measured_sweeps_slot_idx" ON "measured_sweeps" USING btree ("slot_id","measured_at");--> statement-breakpoint
CREATE INDEX "measured_sweeps_plan_idx" ON "measured_sweeps" USING btree ("library_plan_id","measured_at");--> statement-breakpoint
CREATE UNIQUE INDEX "measured_sweeps_file_key" ON "measured_sweeps" USING btree ("file_id");--> statement-breakpoint
ALTER TABLE "stored_files" ADD CONSTRAINT "stored_files_content_type" CHECK ("stored_files"."content_type" in ('image/jpeg', 'image/png', 'image/webp', 'application/pdf', 'text/plain'));