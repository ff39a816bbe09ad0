-- What Drizzle's schema cannot say (src/server/db/schema/sweeps.ts points here).
-- Keep this file when migrations are regenerated.

-- A sweep's raw file lives and dies with the sweep: deleting a sweep (by itself, or with its
-- station slot or library plan) deletes its stored file, and the file's bytes with it.
CREATE FUNCTION measured_sweeps_delete_file() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM stored_files WHERE id = OLD.file_id;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER measured_sweeps_delete_file AFTER DELETE ON measured_sweeps
  FOR EACH ROW EXECUTE FUNCTION measured_sweeps_delete_file();
