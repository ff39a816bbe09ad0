// Antenna days, sites, station slots, shifts and sign-ups. The rules that matter are
// constraints too: shift capacity (taken ≤ capacity), one sign-up per person and shift, and
// one shift at a time per person (an exclusion constraint over the sign-up's time range, in
// the custom migration drizzle/*_antenna_days_constraints.sql, which Drizzle cannot express).
import { sql } from "drizzle-orm";
import { check, customType, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { GROUND_CLASS_IDS } from "@/lib/antenna/ground-classes";
import { DAY_STATUSES } from "@/lib/antenna-days/status";
import { SLOT_MODES, type SlotPlanParams } from "@/lib/antenna-days/slot-plan";
import type { AntennaSummary } from "@/lib/site-plan/footprint";
import type { Hazard } from "@/lib/site-plan/hazards";
import { antennaPlans } from "./plans";
import { users } from "./users";

export const siteGroundClassEnum = pgEnum("site_ground_class", [...GROUND_CLASS_IDS, "custom"]);
export const dayStatusEnum = pgEnum("antenna_day_status", DAY_STATUSES);
export const slotModeEnum = pgEnum("slot_mode", SLOT_MODES);

/** PostgreSQL's range of timestamptz, as its text form ("[2027-05-15 09:00:00+00,...)"). */
const tstzrange = customType<{ data: string }>({ dataType: () => "tstzrange" });

const timestamps = {
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
};

/** A reusable place: size in metres (x east, y north from the south-west corner), ground, hazards. */
export const sites = pgTable(
  "sites",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    widthM: doublePrecision("width_m").notNull(),
    depthM: doublePrecision("depth_m").notNull(),
    groundClass: siteGroundClassEnum("ground_class").notNull(),
    /** Only for the custom ground class. */
    groundConductivitySm: doublePrecision("ground_conductivity_sm"),
    groundRelativePermittivity: doublePrecision("ground_relative_permittivity"),
    notes: text("notes").notNull().default(""),
    hazards: jsonb("hazards").$type<Hazard[]>().notNull().default([]),
    ...timestamps,
  },
  (table) => [
    uniqueIndex("sites_name_key").on(table.name),
    check("sites_size_positive", sql`${table.widthM} > 0 and ${table.depthM} > 0`),
    check(
      "sites_custom_ground",
      sql`(${table.groundClass} = 'custom') = (${table.groundConductivitySm} is not null and ${table.groundRelativePermittivity} is not null)`,
    ),
  ],
);

export const antennaDays = pgTable(
  "antenna_days",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    title: text("title").notNull(),
    siteId: uuid("site_id")
      .notNull()
      .references(() => sites.id, { onDelete: "restrict" }),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
    meetingPoint: text("meeting_point").notNull().default(""),
    description: text("description").notNull().default(""),
    safetyLeadId: uuid("safety_lead_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    status: dayStatusEnum("status").notNull().default("draft"),
    /** Rises on every change of the day (iCalendar SEQUENCE for calendar feeds). */
    sequence: integer("sequence").notNull().default(0),
    copiedFromId: uuid("copied_from_id"),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    ...timestamps,
  },
  (table) => [
    index("antenna_days_starts_at_idx").on(table.startsAt),
    check("antenna_days_ends_after_start", sql`${table.endsAt} > ${table.startsAt}`),
    check("antenna_days_sequence", sql`${table.sequence} >= 0`),
  ],
);

export const stationSlots = pgTable(
  "station_slots",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    dayId: uuid("day_id")
      .notNull()
      .references(() => antennaDays.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    /** The engine's band names for the club's ITU Region, e.g. {"40m","20m"}. */
    bands: text("bands").array().notNull(),
    powerW: doublePrecision("power_w").notNull(),
    mode: slotModeEnum("mode").notNull(),
    /** The antenna plan's own parameters (family, height, wire, ...): see slot-plan.ts. */
    planParams: jsonb("plan_params").$type<SlotPlanParams>().notNull(),
    /** The plan library entry the plan came from, if any; a plan in use cannot be deleted. */
    libraryPlanId: uuid("library_plan_id").references(() => antennaPlans.id, { onDelete: "restrict" }),
    /** The mast (feed point) on the site plan, metres. */
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    /** Compass bearing of the wire, degrees from north. */
    azimuthDeg: doublePrecision("azimuth_deg").notNull().default(0),
    tentX: doublePrecision("tent_x").notNull(),
    tentY: doublePrecision("tent_y").notNull(),
    /** The coordinator's own feedline run; null uses the computed one. */
    feedlineRunOverrideM: doublePrecision("feedline_run_override_m"),
    /** Computed from the plan when it is saved: the antenna's outline and its safety circles. */
    summary: jsonb("summary").$type<AntennaSummary>().notNull(),
    ...timestamps,
  },
  (table) => [
    uniqueIndex("station_slots_day_name_key").on(table.dayId, table.name),
    check("station_slots_bands", sql`cardinality(${table.bands}) between 1 and 6`),
    check("station_slots_power", sql`${table.powerW} > 0`),
    check("station_slots_azimuth", sql`${table.azimuthDeg} >= 0 and ${table.azimuthDeg} < 360`),
    check("station_slots_feedline_override", sql`${table.feedlineRunOverrideM} is null or ${table.feedlineRunOverrideM} > 0`),
  ],
);

export const shifts = pgTable(
  "shifts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    slotId: uuid("slot_id")
      .notNull()
      .references(() => stationSlots.id, { onDelete: "cascade" }),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
    capacity: integer("capacity").notNull(),
    /** Sign-ups so far; bumped with `where taken < capacity` in the sign-up transaction. */
    taken: integer("taken").notNull().default(0),
    sequence: integer("sequence").notNull().default(0),
    ...timestamps,
  },
  (table) => [
    index("shifts_slot_idx").on(table.slotId),
    check("shifts_ends_after_start", sql`${table.endsAt} > ${table.startsAt}`),
    check("shifts_capacity", sql`${table.capacity} >= 1`),
    check("shifts_taken_within_capacity", sql`${table.taken} >= 0 and ${table.taken} <= ${table.capacity}`),
  ],
);

export const shiftSignups = pgTable(
  "shift_signups",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    shiftId: uuid("shift_id")
      .notNull()
      .references(() => shifts.id, { onDelete: "cascade" }),
    personId: uuid("person_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** The shift's time range, copied here for the one-shift-at-a-time exclusion constraint. */
    during: tstzrange("during").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex("shift_signups_shift_person_key").on(table.shiftId, table.personId), index("shift_signups_person_idx").on(table.personId)],
);

export type SiteRow = typeof sites.$inferSelect;
export type AntennaDayRow = typeof antennaDays.$inferSelect;
export type StationSlotRow = typeof stationSlots.$inferSelect;
export type ShiftRow = typeof shifts.$inferSelect;
