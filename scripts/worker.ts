// The worker process: sends queued mail and runs reminders (src/server/jobs/worker.ts).
// scripts/start.sh runs it beside the app; stop it with SIGTERM or Ctrl-C.
import { startWorker } from "@/server/jobs/worker";
import { runUntilStopped } from "./lib/long-running";

runUntilStopped(startWorker);
