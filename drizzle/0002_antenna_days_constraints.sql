-- One shift at a time per person: no two sign-ups of one person whose shifts overlap in time.
-- Drizzle cannot express exclusion constraints, so this migration is written by hand.
-- btree_gist lets the GiST index compare the person's uuid with "=" beside the range's "&&".
CREATE EXTENSION IF NOT EXISTS btree_gist;--> statement-breakpoint
ALTER TABLE "shift_signups" ADD CONSTRAINT "shift_signups_one_at_a_time" EXCLUDE USING gist ("person_id" WITH =, "during" WITH &&);--> statement-breakpoint
-- The range copies its shift's times; an empty or inverted range would slip past the rule.
ALTER TABLE "shift_signups" ADD CONSTRAINT "shift_signups_during_not_empty" CHECK (NOT isempty("during") AND lower_inf("during") = false AND upper_inf("during") = false);
