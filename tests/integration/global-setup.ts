// Integration tests run against the real PostgreSQL (scripts/test.sh points DATABASE_URL at
// a fresh test database); the committed migrations and the job queue are installed once before the files run.
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import { installJobQueues } from "@/server/jobs/queue";

export default async function setup() {
  const url = process.env.DATABASE_URL;
  if (!url || !/_test$/.test(new URL(url).pathname)) {
    throw new Error("Integration tests need DATABASE_URL pointing at a *_test database (scripts/test.sh sets it).");
  }
  process.env.NEXTAUTH_SECRET ??= "test-secret-for-guyline-only";
  process.env.NEXTAUTH_URL ??= "http://localhost:3100";
  const pool = new Pool({ connectionString: url });
  await migrate(drizzle(pool), { migrationsFolder: "drizzle" });
  await installJobQueues();
  await pool.query(
    `insert into club_settings (id, club_name, itu_region, time_zone, default_units, join_code)
     values (1, 'Test club', 1, 'Europe/London', 'metric', 'TEST-JOIN-CODE') on conflict (id) do nothing`,
  );
  await pool.end();
}
