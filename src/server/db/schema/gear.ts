// The gear shelf and the lending desk: items, their files, bookings, the waitlist and history.
//
// Kind-specific details are typed columns, not a jsonb blob: station kits select coax runs by
// cable type and length in SQL, PostgreSQL checks each value with ordinary CHECKs and enums
// (the cable type is an enum of the engine's feedline table), and the CSV import and export map
// one column to one field. The checks below keep each kind's details on its own kind only.
//
// The rule that matters most, "an item is never approved or out twice at once", is an exclusion
// constraint over (item_id, period) that Drizzle cannot express: it lives in the custom
// migration drizzle/*_gear_constraints.sql, with the btree_gist extension it needs.
import { sql } from "drizzle-orm";
import { boolean, check, customType, date, doublePrecision, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { approvalRules, cableTypeIds, coaxConnectors, gearConditions, gearKinds, transformerRatios, transformerStyles } from "@/lib/gear/kinds";
import { bookingStates } from "@/lib/lending/states";
import { antennaDays, stationSlots } from "./antenna-days";
import { storedFiles } from "./files";
import { users } from "./users";

export const gearKindEnum = pgEnum("gear_kind", gearKinds);
export const gearConditionEnum = pgEnum("gear_condition", gearConditions);
export const approvalRuleEnum = pgEnum("gear_approval_rule", approvalRules);
export const cableTypeEnum = pgEnum("feedline_type", cableTypeIds);
export const coaxConnectorEnum = pgEnum("coax_connector", coaxConnectors);
export const transformerStyleEnum = pgEnum("transformer_style", transformerStyles);
export const transformerRatioEnum = pgEnum("transformer_ratio", transformerRatios);
export const bookingStateEnum = pgEnum("booking_state", bookingStates);
export const gearFilePurposeEnum = pgEnum("gear_file_purpose", ["photo", "manual", "return"]);
export const waitlistStateEnum = pgEnum("waitlist_state", ["waiting", "offered", "accepted", "lapsed", "withdrawn"]);

/** PostgreSQL's range of timestamptz; Guyline writes starts_at and ends_at, the range is generated. */
const tstzrange = customType<{ data: string }>({ dataType: () => "tstzrange" });

export const gearItems = pgTable(
  "gear_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    labelCode: text("label_code").notNull(),
    name: text("name").notNull(),
    kind: gearKindEnum("kind").notNull(),
    condition: gearConditionEnum("condition").notNull().default("good"),
    location: text("location").notNull(),
    notes: text("notes"),
    approvalRule: approvalRuleEnum("approval_rule").notNull(),
    // analyser
    minMhz: doublePrecision("min_mhz"),
    maxMhz: doublePrecision("max_mhz"),
    batteryCheckedOn: date("battery_checked_on"),
    calibrationCheckedOn: date("calibration_checked_on"),
    // coax run
    cableType: cableTypeEnum("cable_type"),
    lengthM: doublePrecision("length_m"),
    connectorA: coaxConnectorEnum("connector_a"),
    connectorB: coaxConnectorEnum("connector_b"),
    // mast and guy kit
    heightM: doublePrecision("height_m"),
    guyKit: text("guy_kit"),
    // balun or unun
    transformerStyle: transformerStyleEnum("transformer_style"),
    transformerRatio: transformerRatioEnum("transformer_ratio"),
    powerRatingW: integer("power_rating_w"),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    uniqueIndex("gear_items_label_code_key").on(table.labelCode),
    index("gear_items_kind_idx").on(table.kind),
    check("gear_items_label_code_format", sql`${table.labelCode} ~ '^[A-Z0-9][A-Z0-9-]{1,11}$'`),
    check("gear_items_retired_at", sql`(${table.condition} = 'retired') = (${table.retiredAt} is not null)`),
    check(
      "gear_items_analyser_details",
      sql`case when ${table.kind} = 'analyser'
        then ${table.minMhz} > 0 and ${table.maxMhz} > ${table.minMhz}
        else ${table.minMhz} is null and ${table.maxMhz} is null and ${table.batteryCheckedOn} is null and ${table.calibrationCheckedOn} is null end`,
    ),
    check(
      "gear_items_coax_details",
      sql`case when ${table.kind} = 'coax'
        then ${table.cableType} is not null and ${table.lengthM} > 0 and ${table.connectorA} is not null and ${table.connectorB} is not null
        else ${table.cableType} is null and ${table.lengthM} is null and ${table.connectorA} is null and ${table.connectorB} is null end`,
    ),
    check(
      "gear_items_mast_details",
      sql`case when ${table.kind} = 'mast'
        then ${table.heightM} > 0 and ${table.guyKit} is not null
        else ${table.heightM} is null and ${table.guyKit} is null end`,
    ),
    check(
      "gear_items_balun_details",
      sql`case when ${table.kind} = 'balun'
        then ${table.transformerStyle} is not null and ${table.transformerRatio} is not null and ${table.powerRatingW} > 0
        else ${table.transformerStyle} is null and ${table.transformerRatio} is null and ${table.powerRatingW} is null end`,
    ),
  ],
);

export const gearBookings = pgTable(
  "gear_bookings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    itemId: uuid("item_id")
      .notNull()
      .references(() => gearItems.id, { onDelete: "restrict" }),
    borrowerId: uuid("borrower_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
    period: tstzrange("period")
      .notNull()
      .generatedAlwaysAs(sql`tstzrange(starts_at, ends_at, '[)')`),
    state: bookingStateEnum("state").notNull(),
    note: text("note"),
    coSignRequired: boolean("co_sign_required").notNull().default(false),
    coSignedBy: uuid("co_signed_by").references(() => users.id, { onDelete: "set null" }),
    coSignedAt: timestamp("co_signed_at", { withTimezone: true }),
    decidedBy: uuid("decided_by").references(() => users.id, { onDelete: "set null" }),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    declineReason: text("decline_reason"),
    handedOutBy: uuid("handed_out_by").references(() => users.id, { onDelete: "set null" }),
    handedOutAt: timestamp("handed_out_at", { withTimezone: true }),
    handOutCondition: gearConditionEnum("hand_out_condition"),
    returnedAt: timestamp("returned_at", { withTimezone: true }),
    returnRecordedBy: uuid("return_recorded_by").references(() => users.id, { onDelete: "set null" }),
    returnCondition: gearConditionEnum("return_condition"),
    damageNotes: text("damage_notes"),
    returnPhotoId: uuid("return_photo_id").references(() => storedFiles.id, { onDelete: "set null" }),
    /** The antenna day the booking serves: a day with bookings is cancelled, never deleted. */
    antennaDayId: uuid("antenna_day_id").references(() => antennaDays.id, { onDelete: "restrict" }),
    /** The station slot it serves; a removed slot leaves the booking with its day. */
    stationSlotId: uuid("station_slot_id").references(() => stationSlots.id, { onDelete: "set null" }),
    /** Rises on every step of the booking (iCalendar SEQUENCE of its due date in calendar feeds). */
    sequence: integer("sequence").notNull().default(0),
    /** A coax run booked as the slot's feedline: the slot's plan is computed with this run. */
    slotFeedline: boolean("slot_feedline").notNull().default(false),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index("gear_bookings_item_idx").on(table.itemId, table.startsAt),
    index("gear_bookings_borrower_idx").on(table.borrowerId),
    index("gear_bookings_state_idx").on(table.state, table.endsAt),
    check("gear_bookings_ends_after_start", sql`${table.endsAt} > ${table.startsAt}`),
    check("gear_bookings_sequence", sql`${table.sequence} >= 0`),
    check("gear_bookings_slot_needs_day", sql`${table.stationSlotId} is null or ${table.antennaDayId} is not null`),
    check("gear_bookings_feedline_needs_slot", sql`not ${table.slotFeedline} or ${table.stationSlotId} is not null`),
    // One feedline per station slot at a time: two keepers booking two runs for one slot, one wins.
    uniqueIndex("gear_bookings_one_feedline_per_slot")
      .on(table.stationSlotId)
      .where(sql`${table.slotFeedline} and ${table.state} in ('approved', 'out')`),
    check(
      "gear_bookings_co_sign_before_approval",
      sql`not ${table.coSignRequired} or ${table.coSignedBy} is not null or ${table.state} in ('requested', 'declined', 'cancelled')`,
    ),
    check("gear_bookings_declined_has_reason", sql`${table.state} <> 'declined' or ${table.declineReason} is not null`),
    check("gear_bookings_handed_out", sql`${table.state} not in ('out', 'lost') or ${table.handedOutAt} is not null`),
    check("gear_bookings_returned", sql`${table.state} <> 'returned' or (${table.returnedAt} is not null and ${table.returnCondition} is not null)`),
  ],
);

/** Photos and manuals of an item, and the photos taken at a return (tied to their booking). */
export const gearItemFiles = pgTable(
  "gear_item_files",
  {
    fileId: uuid("file_id")
      .primaryKey()
      .references(() => storedFiles.id, { onDelete: "cascade" }),
    itemId: uuid("item_id")
      .notNull()
      .references(() => gearItems.id, { onDelete: "cascade" }),
    purpose: gearFilePurposeEnum("purpose").notNull(),
    bookingId: uuid("booking_id").references(() => gearBookings.id, { onDelete: "cascade" }),
  },
  (table) => [
    index("gear_item_files_item_idx").on(table.itemId),
    check("gear_item_files_return_has_booking", sql`(${table.purpose} = 'return') = (${table.bookingId} is not null)`),
  ],
);

export const gearWaitlist = pgTable(
  "gear_waitlist",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    itemId: uuid("item_id")
      .notNull()
      .references(() => gearItems.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    endsAt: timestamp("ends_at", { withTimezone: true }).notNull(),
    state: waitlistStateEnum("state").notNull().default("waiting"),
    offeredAt: timestamp("offered_at", { withTimezone: true }),
    offerExpiresAt: timestamp("offer_expires_at", { withTimezone: true }),
    bookingId: uuid("booking_id").references(() => gearBookings.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    // One place in the line per person and item.
    uniqueIndex("gear_waitlist_one_active_key").on(table.itemId, table.userId).where(sql`${table.state} in ('waiting', 'offered')`),
    index("gear_waitlist_item_idx").on(table.itemId, table.createdAt),
    check("gear_waitlist_ends_after_start", sql`${table.endsAt} > ${table.startsAt}`),
    check("gear_waitlist_offer_times", sql`${table.state} <> 'offered' or (${table.offeredAt} is not null and ${table.offerExpiresAt} is not null)`),
  ],
);

/** Everything that happened to an item: edits, and every step of every booking and waitlist entry. */
export const gearHistory = pgTable(
  "gear_history",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    itemId: uuid("item_id")
      .notNull()
      .references(() => gearItems.id, { onDelete: "cascade" }),
    bookingId: uuid("booking_id").references(() => gearBookings.id, { onDelete: "cascade" }),
    /** Null for steps Guyline takes by itself, such as an offer that lapses. */
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    /** What happened, e.g. "item-added", "approve", "hand-out", "waitlist-offered". */
    event: text("event").notNull(),
    fromState: text("from_state"),
    toState: text("to_state"),
    note: text("note"),
    condition: gearConditionEnum("condition"),
    fileId: uuid("file_id").references(() => storedFiles.id, { onDelete: "set null" }),
  },
  (table) => [index("gear_history_item_idx").on(table.itemId, table.at)],
);

export type GearItemRow = typeof gearItems.$inferSelect;
export type GearBookingRow = typeof gearBookings.$inferSelect;
export type GearWaitlistRow = typeof gearWaitlist.$inferSelect;
export type GearHistoryRow = typeof gearHistory.$inferSelect;
