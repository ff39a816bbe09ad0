// The local SMTP server of development, demo and test deployments: it takes every message
// and keeps it in PostgreSQL (captured_mail) instead of delivering it, so the development
// inbox of every app instance shows it. Never used in production.
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { db } from "@/server/db";
import { capturedMail } from "@/server/db/schema";

export interface CaptureServer {
  port: number;
  close(): Promise<void>;
}

export async function startCaptureServer(port: number, log: (line: string) => void = () => {}): Promise<CaptureServer> {
  const server = new SMTPServer({
    banner: "Guyline local mail capture",
    // Loopback only and no real delivery: no TLS or sign-in to set up.
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    size: 10 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", callback);
      stream.on("end", async () => {
        try {
          const raw = Buffer.concat(chunks).toString("utf8");
          const parsed = await simpleParser(raw);
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
          const envelopeTo = session.envelope.rcptTo.map((recipient) => recipient.address);
          await db()
            .insert(capturedMail)
            .values({
              envelopeFrom,
              envelopeTo,
              messageId: parsed.messageId ?? null,
              subject: parsed.subject ?? "(no subject)",
              textBody: parsed.text ?? null,
              htmlBody: typeof parsed.html === "string" ? parsed.html : null,
              attachments: parsed.attachments.map((attachment) => ({
                filename: attachment.filename ?? "attachment",
                contentType: attachment.contentType,
                size: attachment.size,
              })),
              raw,
            });
          log(`captured "${parsed.subject}" for ${envelopeTo.join(", ")}`);
          callback();
        } catch (error) {
          callback(error instanceof Error ? error : new Error(String(error)));
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", reject);
      resolve();
    });
  });
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
