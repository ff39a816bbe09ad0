import { sql } from "drizzle-orm";
import { check, integer, pgTable, primaryKey, smallint, text, timestamp } from "drizzle-orm/pg-core";
import { unitsEnum } from "./users";

/** The club's settings: one row, id 1. */
export const clubSettings = pgTable(
  "club_settings",
  {
    id: smallint("id").primaryKey().default(1),
    clubName: text("club_name").notNull(),
    ituRegion: smallint("itu_region").notNull(),
    timeZone: text("time_zone").notNull(),
    defaultUnits: unitsEnum("default_units").notNull().default("metric"),
    joinCode: text("join_code").notNull(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check("club_settings_single_row", sql`${table.id} = 1`),
    check("club_settings_itu_region", sql`${table.ituRegion} in (1, 2, 3)`),
    check("club_settings_join_code_length", sql`length(${table.joinCode}) >= 6`),
  ],
);

/**
 * Fixed-window counters for rate limits, shared by every app instance. One row per
 * bucket and key (for example "sign-in-email" and an address).
 */
export const rateLimitCounters = pgTable(
  "rate_limit_counters",
  {
    bucket: text("bucket").notNull(),
    key: text("key").notNull(),
    windowStart: timestamp("window_start", { withTimezone: true }).notNull(),
    hits: integer("hits").notNull(),
  },
  (table) => [primaryKey({ columns: [table.bucket, table.key] })],
);
