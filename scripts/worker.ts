// The worker process: sends queued mail and runs reminders (src/server/jobs/worker.ts).
// scripts/start.sh runs it beside the app; stop it with SIGTERM or Ctrl-C.
import { pool } from "@/server/db";
import { startWorker } from "@/server/jobs/worker";

async function main() {
  const worker = await startWorker();
  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    await worker.stop();
    await pool().end();
    process.exit(0);
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
