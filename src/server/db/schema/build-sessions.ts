import { sql } from "drizzle-orm";
import { bigserial, boolean, check, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { PlanRequest } from "@/lib/antenna";
import { antennaDays } from "./antenna-days";
import { antennaPlans } from "./plans";
import { users } from "./users";

export const buildSessionStatusEnum = pgEnum("build_session_status", ["scheduled", "cancelled"]);
export const signupStatusEnum = pgEnum("build_session_signup_status", ["confirmed", "waitlisted"]);

/**
 * A supervised build slot. `taken` counts confirmed places; the check keeps it within the
 * capacity whatever happens concurrently, because sign-ups bump it with
 * `update … where taken < capacity`.
 */
export const buildSessions = pgTable(
  "build_sessions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    title: text("title").notNull(),
    /** The antenna engine's plan request, as its zod schema parsed it (defaults filled in). */
    plan: jsonb("plan").$type<PlanRequest>().notNull(),
    /** The plan library entry it came from; a plan in use cannot be deleted. */
    libraryPlanId: uuid("library_plan_id").references(() => antennaPlans.id, { onDelete: "restrict" }),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
    place: text("place").notNull(),
    /** The antenna day it is part of, if any; deleting a draft day keeps the session. */
    antennaDayId: uuid("antenna_day_id").references(() => antennaDays.id, { onDelete: "set null" }),
    /** Whether the build ends with raising a mast (adds the working-at-height notes). */
    raisesMast: boolean("raises_mast").notNull().default(false),
    capacity: integer("capacity").notNull(),
    taken: integer("taken").notNull().default(0),
    notes: text("notes"),
    status: buildSessionStatusEnum("status").notNull().default("scheduled"),
    /** iCalendar SEQUENCE: goes up on every change, so subscribed calendars update the event. */
    sequence: integer("sequence").notNull().default(0),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check("build_sessions_ends_after_start", sql`${table.endsAt} > ${table.startsAt}`),
    check("build_sessions_capacity_range", sql`${table.capacity} between 1 and 100`),
    check("build_sessions_taken_within_capacity", sql`${table.taken} >= 0 and ${table.taken} <= ${table.capacity}`),
    index("build_sessions_starts_idx").on(table.startsAt),
  ],
);

export const buildSessionMentors = pgTable(
  "build_session_mentors",
  {
    sessionId: uuid("session_id")
      .notNull()
      .references(() => buildSessions.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
  },
  (table) => [primaryKey({ columns: [table.sessionId, table.userId] }), index("build_session_mentors_user_idx").on(table.userId)],
);

/** One row per person per session: a confirmed place or a place in the waitlist (in `queue` order). */
export const buildSessionSignups = pgTable(
  "build_session_signups",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    sessionId: uuid("session_id")
      .notNull()
      .references(() => buildSessions.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    status: signupStatusEnum("status").notNull(),
    /** Strictly increasing in sign-up order: the waitlist is served lowest first. */
    queue: bigserial("queue", { mode: "number" }).notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    uniqueIndex("build_session_signups_once").on(table.sessionId, table.userId),
    index("build_session_signups_queue_idx").on(table.sessionId, table.status, table.queue),
    index("build_session_signups_user_idx").on(table.userId),
  ],
);
