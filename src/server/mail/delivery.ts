// Sending one outbox message. The claim and the mark are one step: the row goes from pending
// to sent in a transaction that stays open while the SMTP server takes the message, and
// commits only once it has. A failure rolls the mark back (the job is retried); a second try
// at a message already sent finds nothing pending and sends nothing; a worker killed mid-send
// leaves the row pending for the retry. SMTP has no two-phase commit: the one moment a repeat
// remains possible is a crash between the server's "250 OK" and the commit, and the fixed
// Message-ID lets the receiving side recognise that repeat.
import type { Transporter } from "nodemailer";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/server/db";
import { mailOutbox } from "@/server/db/schema";

export type DeliveryOutcome = "sent" | "not-pending";

export async function deliverOutboxMessage(outboxId: string, transport: Transporter, from: string): Promise<DeliveryOutcome> {
  return db().transaction(async (tx) => {
    const [message] = await tx
      .update(mailOutbox)
      .set({ status: "sent", sentAt: new Date(), attempts: sql`${mailOutbox.attempts} + 1`, lastError: null })
      .where(and(eq(mailOutbox.id, outboxId), eq(mailOutbox.status, "pending")))
      .returning();
    if (!message) return "not-pending";
    const senderDomain = /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "guyline.invalid";
    await transport.sendMail({
      from,
      to: { name: message.toName, address: message.toAddress },
      subject: message.subject,
      text: message.textBody,
      html: message.htmlBody,
      headers: message.headers,
      // The same id on every try lets a receiving server recognise a repeat.
      messageId: `<${message.id}@${senderDomain}>`,
      attachments: message.attachments.map((attachment) => ({ filename: attachment.filename, contentType: attachment.contentType, content: attachment.content })),
    });
    return "sent";
  });
}

/** Counts a failed try; after the last one the message is marked failed for good. */
export async function recordDeliveryFailure(outboxId: string, error: unknown, lastTry: boolean): Promise<void> {
  const reason = error instanceof Error ? error.message : String(error);
  await db()
    .update(mailOutbox)
    .set({ attempts: sql`${mailOutbox.attempts} + 1`, lastError: reason.slice(0, 500), ...(lastTry ? { status: "failed" as const } : {}) })
    .where(and(eq(mailOutbox.id, outboxId), eq(mailOutbox.status, "pending")));
}
