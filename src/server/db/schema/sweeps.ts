// Measured sweeps: an analyser's export attached to a station slot or to a plan in the plan
// library, with the points read from it, the raw file (stored_files), where and with what it
// was measured, and the comparison with the plan as it stood at the upload (kept, so the
// history and the plan library's measured offsets do not move when a plan changes later).
// Deleting a sweep deletes its raw file: a trigger in the custom migration
// drizzle/*_sweeps_files.sql, which Drizzle cannot express, so that a slot or plan deleted
// with its sweeps leaves no file behind either.
import { sql } from "drizzle-orm";
import { check, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { PlanRequest } from "@/lib/antenna/plan-schema";
import type { SweepAnalysis } from "@/lib/sweeps/analysis";
import { SWEEP_PLACES } from "@/lib/sweeps/feed-point";
import { SWEEP_LIMITS, SWEEP_QUANTITIES, type MeasuredPoint, type SweepMapping } from "@/lib/sweeps/parse";
import { SWEEP_NOTE_MAX } from "@/validations/sweeps";
import { stationSlots } from "./antenna-days";
import { storedFiles } from "./files";
import { gearItems } from "./gear";
import { antennaPlans } from "./plans";
import { users } from "./users";

export const sweepPlaceEnum = pgEnum("sweep_place", SWEEP_PLACES);
export const sweepQuantityEnum = pgEnum("sweep_quantity", SWEEP_QUANTITIES);

export const measuredSweeps = pgTable(
  "measured_sweeps",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** The station slot measured, or else the library plan (exactly one of the two). */
    slotId: uuid("slot_id").references(() => stationSlots.id, { onDelete: "cascade" }),
    libraryPlanId: uuid("library_plan_id").references(() => antennaPlans.id, { onDelete: "cascade" }),
    /** The raw file as uploaded. */
    fileId: uuid("file_id")
      .notNull()
      .references(() => storedFiles.id, { onDelete: "restrict" }),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    /** An analyser from the gear shelf; null for one of the member's own. */
    analyserId: uuid("analyser_id").references(() => gearItems.id, { onDelete: "restrict" }),
    place: sweepPlaceEnum("place").notNull(),
    quantity: sweepQuantityEnum("quantity").notNull(),
    measuredAt: timestamp("measured_at", { withTimezone: true }).notNull(),
    /** Which column of the file held what. */
    mapping: jsonb("mapping").$type<SweepMapping>().notNull(),
    points: jsonb("points").$type<MeasuredPoint[]>().notNull(),
    pointCount: integer("point_count").notNull(),
    minMhz: doublePrecision("min_mhz").notNull(),
    maxMhz: doublePrecision("max_mhz").notNull(),
    /** Each element's length as built, eye to eye, when the uploader gave it; null means the plan's cut lengths. */
    builtLengthsM: doublePrecision("built_lengths_m").array(),
    /** The engine's plan request the sweep was compared with (the slot's plan and its feedline run at the upload). */
    planRequest: jsonb("plan_request").$type<PlanRequest>().notNull(),
    analysis: jsonb("analysis").$type<SweepAnalysis>().notNull(),
    note: text("note").notNull().default(""),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index("measured_sweeps_slot_idx").on(table.slotId, table.measuredAt),
    index("measured_sweeps_plan_idx").on(table.libraryPlanId, table.measuredAt),
    uniqueIndex("measured_sweeps_file_key").on(table.fileId),
    check("measured_sweeps_one_target", sql`(${table.slotId} is null) <> (${table.libraryPlanId} is null)`),
    check(
      "measured_sweeps_point_count",
      sql`${table.pointCount} between ${sql.raw(String(SWEEP_LIMITS.minPoints))} and ${sql.raw(String(SWEEP_LIMITS.maxPoints))} and jsonb_array_length(${table.points}) = ${table.pointCount}`,
    ),
    check(
      "measured_sweeps_range",
      sql`${table.minMhz} >= ${sql.raw(String(SWEEP_LIMITS.minMHz))} and ${table.maxMhz} <= ${sql.raw(String(SWEEP_LIMITS.maxMHz))} and ${table.minMhz} < ${table.maxMhz}`,
    ),
    check("measured_sweeps_built_lengths", sql`${table.builtLengthsM} is null or (cardinality(${table.builtLengthsM}) between 1 and 3 and 0 < all(${table.builtLengthsM}))`),
    check("measured_sweeps_note_length", sql`length(${table.note}) <= ${sql.raw(String(SWEEP_NOTE_MAX))}`),
  ],
);

export type MeasuredSweepRow = typeof measuredSweeps.$inferSelect;
