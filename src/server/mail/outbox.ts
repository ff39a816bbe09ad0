// Putting a message in the outbox: the one way any part of Guyline sends mail. Call it inside
// the transaction that caused the message; the row and its delivery job commit together, and
// the worker sends it. Example:
//   await enqueueMail(tx, { template: "shiftReminder", to: { userId }, key: `shift-reminder:${shiftId}:${userId}`, data });
import { eq, and } from "drizzle-orm";
import { appUrl, serverEnv } from "@/env";
import { isOptionalCategory } from "@/lib/mail/categories";
import type { MailContext } from "@/lib/mail/layout";
import { mailTemplates, renderTemplate, type TemplateData, type TemplateName } from "@/lib/mail/templates";
import type { MailTemplate } from "@/lib/mail/templates/define";
import { signUnsubscribeToken } from "@/lib/mail/unsubscribe-token";
import type { Executor } from "@/server/db";
import { clubSettings, mailOptOuts, mailOutbox, users, type OutboxAttachment } from "@/server/db/schema";
import { queueNames, sendJob } from "@/server/jobs/queue";

/** A member (their address and name are read from their account), or an address for account messages. */
export type Recipient = { userId: string } | { email: string; name: string };

export interface OutgoingMail<N extends TemplateName> {
  template: N;
  data: TemplateData<N>;
  to: Recipient;
  /** Unique per message, e.g. `build-session-promoted:<sessionId>:<userId>`: enqueuing it again does nothing. */
  key: string;
  attachments?: OutboxAttachment[];
}

export type EnqueueOutcome = "queued" | "already-queued" | "turned-off";

async function resolveRecipient(executor: Executor, to: Recipient) {
  if ("email" in to) return { userId: null, email: to.email, name: to.name };
  const [user] = await executor.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, to.userId));
  if (!user) throw new Error(`No person ${to.userId} to send mail to.`);
  return { userId: to.userId, email: user.email, name: user.name };
}

export async function enqueueMail<N extends TemplateName>(executor: Executor, mail: OutgoingMail<N>): Promise<EnqueueOutcome> {
  const template = mailTemplates[mail.template] as MailTemplate<TemplateData<N>>;
  const recipient = await resolveRecipient(executor, mail.to);
  const category = template.category;
  // Messages the member may turn off carry an unsubscribe link, so they go to members only.
  const unsubscribable = template.alwaysSent === null && isOptionalCategory(category) && recipient.userId ? { userId: recipient.userId, category } : null;
  if (template.alwaysSent === null && !unsubscribable) {
    throw new Error(`The ${mail.template} message goes to members only (it carries an unsubscribe link).`);
  }

  const [club] = await executor.select({ name: clubSettings.clubName, timeZone: clubSettings.timeZone }).from(clubSettings);
  const env = serverEnv();
  const token = unsubscribable ? signUnsubscribeToken(unsubscribable, env.NEXTAUTH_SECRET) : null;
  const context: MailContext = {
    clubName: club.name,
    timeZone: club.timeZone,
    appUrl: appUrl(),
    recipientName: recipient.name,
    unsubscribeUrl: token ? `${appUrl()}/unsubscribe/${token}` : null,
  };
  const content = renderTemplate(template, mail.data, context);
  // RFC 8058: a one-click unsubscribe is a POST to the List-Unsubscribe address.
  const headers: Record<string, string> = token
    ? { "List-Unsubscribe": `<${appUrl()}/api/unsubscribe/${token}>`, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" }
    : {};

  const turnedOff =
    !!unsubscribable &&
    (await executor
      .select({ userId: mailOptOuts.userId })
      .from(mailOptOuts)
      .where(and(eq(mailOptOuts.userId, unsubscribable.userId), eq(mailOptOuts.category, unsubscribable.category)))
      .then((rows) => rows.length > 0));

  const [row] = await executor
    .insert(mailOutbox)
    .values({
      idempotencyKey: mail.key,
      template: mail.template,
      category,
      userId: recipient.userId,
      toAddress: recipient.email,
      toName: recipient.name,
      subject: content.subject,
      textBody: content.text,
      htmlBody: content.html,
      headers,
      attachments: mail.attachments ?? [],
      status: turnedOff ? "skipped" : "pending",
    })
    .onConflictDoNothing({ target: mailOutbox.idempotencyKey })
    .returning({ id: mailOutbox.id });
  if (!row) return "already-queued";
  if (turnedOff) return "turned-off";
  await sendJob(executor, queueNames.deliverMail, { outboxId: row.id }, { id: row.id });
  return "queued";
}
