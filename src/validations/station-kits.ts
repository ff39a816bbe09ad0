// zod schemas of station kits and of requests tied to an antenna day.
import { z } from "zod";
import { note } from "@/validations/lending";

/** Booking an item for a station slot from the kit page (the slot is in the path). */
export const kitBookingSchema = z.object({ itemId: z.uuid("Choose an item.") });

/** A request for an item for an antenna day (and optionally one of its slots): the day gives the times. */
export const dayBookingRequestSchema = z.object({
  itemId: z.uuid("Choose an item."),
  antennaDayId: z.uuid("Choose an antenna day."),
  stationSlotId: z.preprocess((value) => value || undefined, z.uuid("Choose a station slot of the day.").optional()),
  note,
});
export type DayBookingRequestInput = z.output<typeof dayBookingRequestSchema>;
