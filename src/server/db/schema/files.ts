// Uploaded files (photos, manuals, sweep files), kept in PostgreSQL so that a database backup keeps them and
// every app instance sees them. The bytes sit in their own table, so listing and joining file
// metadata never drags the contents along. See "Stored files" in DEVELOPERS.md.
import { sql } from "drizzle-orm";
import { check, customType, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users } from "./users";

const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => "bytea",
});

export const storedFiles = pgTable(
  "stored_files",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** The name the uploader's file had, for the download's file name only. */
    fileName: text("file_name").notNull(),
    /** Sniffed from the bytes at upload, never taken from the browser's claim. */
    contentType: text("content_type").notNull(),
    byteSize: integer("byte_size").notNull(),
    /** Hex SHA-256 of the bytes: the download's ETag. */
    sha256: text("sha256").notNull(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check("stored_files_byte_size_positive", sql`${table.byteSize} > 0`),
    check("stored_files_content_type", sql`${table.contentType} in ('image/jpeg', 'image/png', 'image/webp', 'application/pdf', 'text/plain')`),
    check("stored_files_sha256_hex", sql`${table.sha256} ~ '^[0-9a-f]{64}$'`),
  ],
);

export const storedFileBytes = pgTable("stored_file_bytes", {
  fileId: uuid("file_id")
    .primaryKey()
    .references(() => storedFiles.id, { onDelete: "cascade" }),
  bytes: bytea("bytes").notNull(),
});

export type StoredFileRow = typeof storedFiles.$inferSelect;
