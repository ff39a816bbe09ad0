import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { mailCategories } from "@/lib/mail/categories";
import { users } from "./users";

export const mailCategoryEnum = pgEnum("mail_category", mailCategories);
export const outboxStatusEnum = pgEnum("mail_outbox_status", ["pending", "sent", "failed", "skipped"]);

export interface OutboxAttachment {
  filename: string;
  contentType: string;
  content: string;
}

/**
 * Every message Guyline means to send, written by the service in the transaction that caused
 * it. The idempotency key (e.g. "build-session-promoted:<session>:<user>") makes a second
 * enqueue of the same message a no-op; the worker claims a pending row and marks it sent in
 * one transaction with the SMTP hand-over, so a retry never sends it twice.
 */
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    idempotencyKey: text("idempotency_key").notNull(),
    template: text("template").notNull(),
    category: mailCategoryEnum("category").notNull(),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
    toAddress: text("to_address").notNull(),
    toName: text("to_name").notNull(),
    subject: text("subject").notNull(),
    textBody: text("text_body").notNull(),
    htmlBody: text("html_body").notNull(),
    /** Extra headers, e.g. List-Unsubscribe and List-Unsubscribe-Post (RFC 8058). */
    headers: jsonb("headers").$type<Record<string, string>>().notNull().default({}),
    attachments: jsonb("attachments").$type<OutboxAttachment[]>().notNull().default([]),
    status: outboxStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (table) => [
    uniqueIndex("mail_outbox_idempotency_key").on(table.idempotencyKey),
    index("mail_outbox_user_idx").on(table.userId),
    check("mail_outbox_sent_has_time", sql`(${table.status} = 'sent') = (${table.sentAt} is not null)`),
  ],
);

/** The categories a member turned off; no row means they get it. Account messages cannot be turned off. */
export const mailOptOuts = pgTable(
  "mail_opt_outs",
  {
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    category: mailCategoryEnum("category").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [primaryKey({ columns: [table.userId, table.category] }), check("mail_opt_outs_not_account", sql`${table.category} <> 'account'`)],
);

export interface CapturedAttachment {
  filename: string;
  contentType: string;
  size: number;
}

/**
 * Messages caught by the local SMTP server of development, demo and test deployments
 * (scripts/mail-server.ts), kept in PostgreSQL so every app instance's development inbox
 * sees them. Production sends through a real SMTP service and leaves this table empty.
 */
export const capturedMail = pgTable(
  "captured_mail",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
    envelopeFrom: text("envelope_from").notNull(),
    envelopeTo: text("envelope_to").array().notNull(),
    messageId: text("message_id"),
    subject: text("subject").notNull(),
    textBody: text("text_body"),
    htmlBody: text("html_body"),
    attachments: jsonb("attachments").$type<CapturedAttachment[]>().notNull().default([]),
    /** The message as received, for parsers and tests. */
    raw: text("raw").notNull(),
  },
  (table) => [index("captured_mail_received_idx").on(table.receivedAt)],
);

/** Sign-in help: single-use password reset links. Only the SHA-256 of the token is stored. */
export const passwordResets = pgTable(
  "password_resets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
  },
  (table) => [uniqueIndex("password_resets_token_hash_key").on(table.tokenHash), index("password_resets_user_idx").on(table.userId)],
);

/** One private calendar feed per person; only the SHA-256 of its secret token is stored. */
export const calendarFeeds = pgTable(
  "calendar_feeds",
  {
    userId: uuid("user_id")
      .primaryKey()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex("calendar_feeds_token_hash_key").on(table.tokenHash)],
);
