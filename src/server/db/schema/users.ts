import { sql } from "drizzle-orm";
import { boolean, check, index, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { roles } from "@/lib/roles";

export const roleEnum = pgEnum("user_role", roles);
export const unitsEnum = pgEnum("unit_system", ["metric", "imperial"]);

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    /** Stored lower-case; the unique index makes one account per address. */
    email: text("email").notNull(),
    callSign: text("call_sign"),
    passwordHash: text("password_hash").notNull(),
    role: roleEnum("role").notNull().default("newcomer"),
    isMentor: boolean("is_mentor").notNull().default(false),
    units: unitsEnum("units").notNull().default("metric"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    /** Null until a coordinator confirms a member who joined with the club's join code. */
    confirmedAt: timestamp("confirmed_at", { withTimezone: true }),
  },
  (table) => [
    uniqueIndex("users_email_key").on(table.email),
    index("users_role_idx").on(table.role),
    check("users_email_lower_case", sql`${table.email} = lower(${table.email})`),
  ],
);

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: roleEnum("role").notNull(),
    isMentor: boolean("is_mentor").notNull().default(false),
    /** SHA-256 of the token in the invitation link; the token itself is never stored. */
    tokenHash: text("token_hash").notNull(),
    invitedBy: uuid("invited_by")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
  },
  (table) => [
    uniqueIndex("invitations_token_hash_key").on(table.tokenHash),
    index("invitations_email_idx").on(table.email),
  ],
);

export type UserRow = typeof users.$inferSelect;
