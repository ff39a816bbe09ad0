// The local SMTP server for development, the demo and tests (src/server/mail/capture-server.ts).
//   tsx scripts/mail-server.ts <port>
// Captured messages land in PostgreSQL (DATABASE_URL) and show in the development inbox.
import { startCaptureServer } from "@/server/mail/capture-server";
import { runUntilStopped } from "./lib/long-running";

runUntilStopped(async () => {
  const port = Number(process.argv[2] ?? process.env.GUYLINE_SMTP_PORT);
  if (!Number.isInteger(port) || port <= 0) throw new Error("usage: tsx scripts/mail-server.ts <port>");
  const server = await startCaptureServer(port, (line) => console.log(line));
  console.log(`Local mail server listening on 127.0.0.1:${port}`);
  return { stop: () => server.close() };
});
