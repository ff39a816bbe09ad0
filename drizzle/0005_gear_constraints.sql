-- What Drizzle's schema cannot say (src/server/db/schema/gear.ts and files.ts point here).
-- Keep this file when migrations are regenerated.

-- btree_gist lets one GiST index compare the item id (=) and the booking period (&&).
CREATE EXTENSION IF NOT EXISTS btree_gist;
--> statement-breakpoint
-- No double-booking, by the database: two approved or out bookings of one item never overlap.
ALTER TABLE "gear_bookings" ADD CONSTRAINT "gear_bookings_no_overlap"
  EXCLUDE USING gist ("item_id" WITH =, "period" WITH &&) WHERE ("state" IN ('approved', 'out'));
--> statement-breakpoint
-- Photos and PDFs are already compressed; store them uncompressed out of line so that the
-- download route's substring() reads only the chunk it streams.
ALTER TABLE "stored_file_bytes" ALTER COLUMN "bytes" SET STORAGE EXTERNAL;
