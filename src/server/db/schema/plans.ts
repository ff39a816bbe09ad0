// The plan library: antenna plans saved under a name to reuse in station slots, antenna days
// and build sessions. `parameters` is the engine's whole plan request (validated with its
// schema, defaults filled in), so a saved plan can be computed on its own, without a slot.
// Station slots point at the plan they came from (station_slots.library_plan_id, restrict:
// a plan in use cannot be deleted).
import { sql } from "drizzle-orm";
import { check, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { FAMILY_IDS, type PlanRequest } from "@/lib/antenna/plan-schema";
import { PLAN_NAME_MAX, PLAN_NOTES_MAX } from "@/validations/plans";
import { users } from "./users";

export const antennaFamilyEnum = pgEnum("antenna_family", FAMILY_IDS);

export const antennaPlans = pgTable(
  "antenna_plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    family: antennaFamilyEnum("family").notNull(),
    parameters: jsonb("parameters").$type<PlanRequest>().notNull(),
    notes: text("notes").notNull().default(""),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    // One plan per name, whatever the letter case.
    uniqueIndex("antenna_plans_name_key").on(sql`lower(${table.name})`),
    check("antenna_plans_name_length", sql`length(btrim(${table.name})) between 1 and ${sql.raw(String(PLAN_NAME_MAX))}`),
    check("antenna_plans_notes_length", sql`length(${table.notes}) <= ${sql.raw(String(PLAN_NOTES_MAX))}`),
    check("antenna_plans_family_matches", sql`${table.parameters} ->> 'family' = ${table.family}::text`),
  ],
);

export type AntennaPlanRow = typeof antennaPlans.$inferSelect;
