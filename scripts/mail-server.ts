// The local SMTP server for development, the demo and tests (src/server/mail/capture-server.ts).
//   tsx scripts/mail-server.ts <port>
// Captured messages land in PostgreSQL (DATABASE_URL) and show in the development inbox.
import { pool } from "@/server/db";
import { startCaptureServer } from "@/server/mail/capture-server";

async function main() {
  const port = Number(process.argv[2] ?? process.env.GUYLINE_SMTP_PORT);
  if (!Number.isInteger(port) || port <= 0) throw new Error("usage: tsx scripts/mail-server.ts <port>");
  const server = await startCaptureServer(port, (line) => console.log(line));
  console.log(`Local mail server listening on 127.0.0.1:${port}`);
  const stop = async () => {
    await server.close();
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
