// Applies the committed migrations under drizzle/. Several app instances may start at once,
// so the run holds a PostgreSQL advisory lock: one migrates, the others wait and find nothing to do.
// The same run installs the job queue (pg-boss), which services write to inside their transactions.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { db, pool } from "@/server/db";
import { installJobQueues } from "@/server/jobs/queue";

const MIGRATION_LOCK_ID = 7_142_001;

async function main() {
  const client = await pool().connect();
  try {
    await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK_ID]);
    await migrate(db(), { migrationsFolder: "drizzle" });
    // The job queue's own tables (pg-boss keeps and upgrades them) and Guyline's queues.
    await installJobQueues();
    await client.query("select pg_advisory_unlock($1)", [MIGRATION_LOCK_ID]);
  } finally {
    client.release();
    await pool().end();
  }
  console.log("Migrations applied.");
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
