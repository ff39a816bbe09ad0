// Runs a long-lived service in its own process until SIGTERM or Ctrl-C: then stops it once,
// closes the database pool and exits. A failure to start prints the reason and exits 1.
import { pool } from "@/server/db";

export function runUntilStopped(start: () => Promise<{ stop(): Promise<void> }>): void {
  start()
    .then((service) => {
      let stopping = false;
      const stop = async () => {
        if (stopping) return;
        stopping = true;
        await service.stop();
        await pool().end();
        process.exit(0);
      };
      process.on("SIGTERM", stop);
      process.on("SIGINT", stop);
    })
    .catch((error: unknown) => {
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
